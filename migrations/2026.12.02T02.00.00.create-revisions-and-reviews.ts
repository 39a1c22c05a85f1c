import { DataTypes, type QueryInterface } from 'sequelize';

// Revisions freeze a plan's document and its full analysis, numbered per plan; review
// decisions settle each row of a revision (a resonance or a risk flag) with a note.
export async function up({ context: queryInterface }: { context: QueryInterface }): Promise<void> {
  await queryInterface.createTable('revisions', {
    id: { type: DataTypes.UUID, primaryKey: true },
    team_id: { type: DataTypes.UUID, allowNull: false, references: { model: 'teams', key: 'id' }, onDelete: 'CASCADE' },
    plan_id: { type: DataTypes.UUID, allowNull: false, references: { model: 'plans', key: 'id' }, onDelete: 'CASCADE' },
    number: { type: DataTypes.INTEGER, allowNull: false },
    plan_version: { type: DataTypes.INTEGER, allowNull: false },
    plan_name: { type: DataTypes.STRING(160), allowNull: false },
    metres_per_pixel: { type: DataTypes.DOUBLE, allowNull: false },
    document: { type: DataTypes.JSONB, allowNull: false },
    analysis: { type: DataTypes.JSONB, allowNull: false },
    extras: { type: DataTypes.JSONB, allowNull: false, defaultValue: {} },
    background_upload_id: { type: DataTypes.UUID, allowNull: true, references: { model: 'uploads', key: 'id' }, onDelete: 'SET NULL' },
    state: { type: DataTypes.STRING(30), allowNull: false },
    note: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
    submitted_by_id: { type: DataTypes.UUID, allowNull: true, references: { model: 'users', key: 'id' }, onDelete: 'SET NULL' },
    submitted_by_name: { type: DataTypes.STRING(200), allowNull: false },
    reviewed_by_id: { type: DataTypes.UUID, allowNull: true, references: { model: 'users', key: 'id' }, onDelete: 'SET NULL' },
    reviewed_by_name: { type: DataTypes.STRING(200), allowNull: true },
    reviewed_at: { type: DataTypes.DATE, allowNull: true },
    created_at: { type: DataTypes.DATE, allowNull: false },
  });
  await queryInterface.addIndex('revisions', ['plan_id', 'number'], { unique: true });
  await queryInterface.addIndex('revisions', ['team_id']);

  await queryInterface.createTable('review_decisions', {
    id: { type: DataTypes.UUID, primaryKey: true },
    revision_id: { type: DataTypes.UUID, allowNull: false, references: { model: 'revisions', key: 'id' }, onDelete: 'CASCADE' },
    target: { type: DataTypes.STRING(200), allowNull: false },
    decision: { type: DataTypes.STRING(20), allowNull: false },
    note: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
    reviewer_id: { type: DataTypes.UUID, allowNull: true, references: { model: 'users', key: 'id' }, onDelete: 'SET NULL' },
    reviewer_name: { type: DataTypes.STRING(200), allowNull: false },
    created_at: { type: DataTypes.DATE, allowNull: false },
    updated_at: { type: DataTypes.DATE, allowNull: false },
  });
  await queryInterface.addIndex('review_decisions', ['revision_id', 'target'], { unique: true });
}

export async function down({ context: queryInterface }: { context: QueryInterface }): Promise<void> {
  await queryInterface.dropTable('review_decisions');
  await queryInterface.dropTable('revisions');
}
