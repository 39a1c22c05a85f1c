import { DataTypes, type QueryInterface } from 'sequelize';

const timestamps = {
  created_at: { type: DataTypes.DATE, allowNull: false },
  updated_at: { type: DataTypes.DATE, allowNull: false },
};

export async function up({ context: queryInterface }: { context: QueryInterface }): Promise<void> {
  await queryInterface.createTable('users', {
    id: { type: DataTypes.UUID, primaryKey: true },
    email: { type: DataTypes.STRING(320), allowNull: false, unique: true },
    name: { type: DataTypes.STRING(120), allowNull: false },
    password_hash: { type: DataTypes.STRING(255), allowNull: false },
    unit_system: { type: DataTypes.STRING(16), allowNull: false, defaultValue: 'si' },
    ...timestamps,
  });
  await queryInterface.createTable('teams', {
    id: { type: DataTypes.UUID, primaryKey: true },
    name: { type: DataTypes.STRING(120), allowNull: false },
    ...timestamps,
  });
  await queryInterface.createTable('memberships', {
    id: { type: DataTypes.UUID, primaryKey: true },
    user_id: { type: DataTypes.UUID, allowNull: false, references: { model: 'users', key: 'id' }, onDelete: 'CASCADE' },
    team_id: { type: DataTypes.UUID, allowNull: false, references: { model: 'teams', key: 'id' }, onDelete: 'CASCADE' },
    role: { type: DataTypes.STRING(20), allowNull: false },
    ...timestamps,
  });
  await queryInterface.addConstraint('memberships', {
    type: 'unique', fields: ['user_id', 'team_id'], name: 'memberships_user_team_unique',
  });
  await queryInterface.addConstraint('memberships', {
    type: 'check', fields: ['role'], name: 'memberships_role_known',
    where: { role: ['admin', 'acoustician', 'engineer', 'architect', 'viewer'] },
  });
  await queryInterface.addIndex('memberships', ['team_id']);
}

export async function down({ context: queryInterface }: { context: QueryInterface }): Promise<void> {
  await queryInterface.dropTable('memberships');
  await queryInterface.dropTable('teams');
  await queryInterface.dropTable('users');
}
