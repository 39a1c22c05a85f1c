import { DataTypes, type QueryInterface } from 'sequelize';

export async function up({ context: queryInterface }: { context: QueryInterface }): Promise<void> {
  await queryInterface.createTable('sessions', {
    id: { type: DataTypes.STRING(64), primaryKey: true },
    user_id: { type: DataTypes.UUID, allowNull: false, references: { model: 'users', key: 'id' }, onDelete: 'CASCADE' },
    expires_at: { type: DataTypes.DATE, allowNull: false },
    active_team_id: { type: DataTypes.UUID, allowNull: true, references: { model: 'teams', key: 'id' }, onDelete: 'SET NULL' },
  });
  await queryInterface.addIndex('sessions', ['user_id']);
  await queryInterface.createTable('sign_in_throttles', {
    key: { type: DataTypes.STRING(400), primaryKey: true },
    failures: { type: DataTypes.INTEGER, allowNull: false },
    window_started_at: { type: DataTypes.DATE, allowNull: false },
    locked_until: { type: DataTypes.DATE, allowNull: true },
  });
}

export async function down({ context: queryInterface }: { context: QueryInterface }): Promise<void> {
  await queryInterface.dropTable('sign_in_throttles');
  await queryInterface.dropTable('sessions');
}
