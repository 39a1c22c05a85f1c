import { DataTypes, type QueryInterface } from 'sequelize';

// Reviews speak the trade's words: rows are checked or queried, and a finished review stamps an
// outcome (accepted; accepted with the notes made; revise and resubmit; rejected) with the
// engineer's overall note. Earlier reviews keep their meaning: approved is accepted, returned is
// revise and resubmit, accepted rows are checked and flagged rows are queries.
export async function up({ context: queryInterface }: { context: QueryInterface }): Promise<void> {
  await queryInterface.addColumn('revisions', 'review_note', { type: DataTypes.TEXT, allowNull: false, defaultValue: '' });
  await queryInterface.sequelize.query(`update revisions set state = case state when 'approved' then 'accepted' when 'returned' then 'revise_resubmit' else state end`);
  await queryInterface.sequelize.query(`update review_decisions set decision = case decision when 'accepted' then 'checked' when 'flagged' then 'query' else decision end`);
  await queryInterface.addIndex('revisions', ['team_id', 'state']);
  await queryInterface.addIndex('audit_events', ['team_id', 'actor_id']);
}

export async function down({ context: queryInterface }: { context: QueryInterface }): Promise<void> {
  await queryInterface.removeIndex('audit_events', ['team_id', 'actor_id']);
  await queryInterface.removeIndex('revisions', ['team_id', 'state']);
  await queryInterface.sequelize.query(`update review_decisions set decision = case decision when 'checked' then 'accepted' when 'query' then 'flagged' else decision end`);
  await queryInterface.sequelize.query(`update revisions set state = case when state in ('accepted', 'accepted_with_notes') then 'approved' when state in ('revise_resubmit', 'rejected') then 'returned' else state end`);
  await queryInterface.removeColumn('revisions', 'review_note');
}
