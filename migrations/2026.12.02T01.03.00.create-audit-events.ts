import { DataTypes, type QueryInterface } from 'sequelize';

// The team's audit log: who did what to what, and when. The actor's name is kept as written
// at the time, so the log still reads right after a member leaves.
export async function up({ context: queryInterface }: { context: QueryInterface }): Promise<void> {
  await queryInterface.createTable('audit_events', {
    id: { type: DataTypes.UUID, primaryKey: true },
    team_id: { type: DataTypes.UUID, allowNull: false, references: { model: 'teams', key: 'id' }, onDelete: 'CASCADE' },
    actor_id: { type: DataTypes.UUID, allowNull: true, references: { model: 'users', key: 'id' }, onDelete: 'SET NULL' },
    actor_name: { type: DataTypes.STRING(200), allowNull: false },
    action: { type: DataTypes.STRING(60), allowNull: false },
    subject: { type: DataTypes.STRING(500), allowNull: false, defaultValue: '' },
    created_at: { type: DataTypes.DATE, allowNull: false },
  });
  await queryInterface.addIndex('audit_events', ['team_id', 'created_at']);
}

export async function down({ context: queryInterface }: { context: QueryInterface }): Promise<void> {
  await queryInterface.dropTable('audit_events');
}
