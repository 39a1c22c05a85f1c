import { DataTypes, type QueryInterface } from 'sequelize';

// Comments on a plan: pinned at a point of the plan (plan pixels) or on a table row, with
// answers (parent) and a resolved mark. The author's name is kept as written at the time.
export async function up({ context: queryInterface }: { context: QueryInterface }): Promise<void> {
  await queryInterface.createTable('comments', {
    id: { type: DataTypes.UUID, primaryKey: true },
    team_id: { type: DataTypes.UUID, allowNull: false, references: { model: 'teams', key: 'id' }, onDelete: 'CASCADE' },
    plan_id: { type: DataTypes.UUID, allowNull: false, references: { model: 'plans', key: 'id' }, onDelete: 'CASCADE' },
    revision_id: { type: DataTypes.UUID, allowNull: true, references: { model: 'revisions', key: 'id' }, onDelete: 'CASCADE' },
    parent_id: { type: DataTypes.UUID, allowNull: true, references: { model: 'comments', key: 'id' }, onDelete: 'CASCADE' },
    x_px: { type: DataTypes.DOUBLE, allowNull: true },
    y_px: { type: DataTypes.DOUBLE, allowNull: true },
    target: { type: DataTypes.STRING(200), allowNull: true },
    body: { type: DataTypes.TEXT, allowNull: false },
    author_id: { type: DataTypes.UUID, allowNull: true, references: { model: 'users', key: 'id' }, onDelete: 'SET NULL' },
    author_name: { type: DataTypes.STRING(200), allowNull: false },
    resolved_at: { type: DataTypes.DATE, allowNull: true },
    resolved_by_name: { type: DataTypes.STRING(200), allowNull: true },
    created_at: { type: DataTypes.DATE, allowNull: false },
    updated_at: { type: DataTypes.DATE, allowNull: false },
  });
  await queryInterface.addIndex('comments', ['plan_id', 'created_at']);
}

export async function down({ context: queryInterface }: { context: QueryInterface }): Promise<void> {
  await queryInterface.dropTable('comments');
}
