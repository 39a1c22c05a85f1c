import { DataTypes, type QueryInterface } from 'sequelize';

// Accounts that hold up against abuse: sign-ups wait for their e-mail to be confirmed
// (sign_up_requests) and accounts record when their address was confirmed (existing accounts
// count as confirmed when they were made); browsers that signed in before are remembered
// (known_devices) so failed sign-ins by others slow them down less; sign-in failures move to the
// shared rate_limits counters (sign_in_throttles goes); refused webhook deliveries are counted
// per kind and hour (billing_refusals) instead of one row each; projects carry a version so a
// rename based on an old copy is refused.
export async function up({ context: queryInterface }: { context: QueryInterface }): Promise<void> {
  await queryInterface.addColumn('users', 'email_verified_at', { type: DataTypes.DATE, allowNull: true });
  await queryInterface.sequelize.query('update users set email_verified_at = created_at');

  await queryInterface.createTable('sign_up_requests', {
    id: { type: DataTypes.UUID, primaryKey: true },
    email: { type: DataTypes.STRING(320), allowNull: false },
    name: { type: DataTypes.STRING(120), allowNull: false },
    team_name: { type: DataTypes.STRING(120), allowNull: false },
    password_hash: { type: DataTypes.STRING(255), allowNull: false },
    token_hash: { type: DataTypes.STRING(64), allowNull: false, unique: true },
    expires_at: { type: DataTypes.DATE, allowNull: false },
    used_at: { type: DataTypes.DATE, allowNull: true },
    created_at: { type: DataTypes.DATE, allowNull: false },
  });
  await queryInterface.addIndex('sign_up_requests', ['email']);

  await queryInterface.createTable('known_devices', {
    token_hash: { type: DataTypes.STRING(64), primaryKey: true },
    user_id: { type: DataTypes.UUID, allowNull: false, references: { model: 'users', key: 'id' }, onDelete: 'CASCADE' },
    created_at: { type: DataTypes.DATE, allowNull: false },
    last_used_at: { type: DataTypes.DATE, allowNull: false },
  });
  await queryInterface.addIndex('known_devices', ['user_id', 'last_used_at']);

  await queryInterface.dropTable('sign_in_throttles');

  await queryInterface.createTable('billing_refusals', {
    kind: { type: DataTypes.STRING(40), primaryKey: true },
    window_start: { type: DataTypes.DATE, primaryKey: true },
    count: { type: DataTypes.INTEGER, allowNull: false },
    last_reason: { type: DataTypes.STRING(500), allowNull: false },
    last_at: { type: DataTypes.DATE, allowNull: false },
  });

  await queryInterface.addColumn('projects', 'version', { type: DataTypes.INTEGER, allowNull: false, defaultValue: 1 });
}

export async function down({ context: queryInterface }: { context: QueryInterface }): Promise<void> {
  await queryInterface.removeColumn('projects', 'version');
  await queryInterface.dropTable('billing_refusals');
  await queryInterface.createTable('sign_in_throttles', {
    key: { type: DataTypes.STRING(400), primaryKey: true },
    failures: { type: DataTypes.INTEGER, allowNull: false },
    window_started_at: { type: DataTypes.DATE, allowNull: false },
    locked_until: { type: DataTypes.DATE, allowNull: true },
  });
  await queryInterface.dropTable('known_devices');
  await queryInterface.dropTable('sign_up_requests');
  await queryInterface.removeColumn('users', 'email_verified_at');
}
