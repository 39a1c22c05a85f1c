import { DataTypes, type QueryInterface } from 'sequelize';

// A team's standing with the payment service, and every webhook event received (the
// provider's event id is unique, so a replayed event cannot be applied twice).
export async function up({ context: queryInterface }: { context: QueryInterface }): Promise<void> {
  await queryInterface.createTable('team_billing', {
    team_id: { type: DataTypes.UUID, primaryKey: true, references: { model: 'teams', key: 'id' }, onDelete: 'CASCADE' },
    customer_id: { type: DataTypes.STRING(255), allowNull: true, unique: true },
    subscription_id: { type: DataTypes.STRING(255), allowNull: true, unique: true },
    paid_seats: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
    requested_seats: { type: DataTypes.INTEGER, allowNull: true },
    state: { type: DataTypes.STRING(20), allowNull: false, defaultValue: 'included' },
    payment_failed_at: { type: DataTypes.DATE, allowNull: true },
    last_event_at: { type: DataTypes.DATE, allowNull: true },
    created_at: { type: DataTypes.DATE, allowNull: false },
    updated_at: { type: DataTypes.DATE, allowNull: false },
  });
  await queryInterface.addConstraint('team_billing', {
    type: 'check', fields: ['state'], name: 'team_billing_state_known',
    where: { state: ['included', 'active', 'past_due', 'canceled'] },
  });
  await queryInterface.createTable('billing_events', {
    id: { type: DataTypes.UUID, primaryKey: true },
    provider_event_id: { type: DataTypes.STRING(255), allowNull: true, unique: true },
    type: { type: DataTypes.STRING(120), allowNull: true },
    team_id: { type: DataTypes.UUID, allowNull: true, references: { model: 'teams', key: 'id' }, onDelete: 'SET NULL' },
    outcome: { type: DataTypes.STRING(20), allowNull: false },
    reason: { type: DataTypes.STRING(500), allowNull: false, defaultValue: '' },
    created_at: { type: DataTypes.DATE, allowNull: false },
  });
  await queryInterface.addIndex('billing_events', ['created_at']);
}

export async function down({ context: queryInterface }: { context: QueryInterface }): Promise<void> {
  await queryInterface.dropTable('billing_events');
  await queryInterface.dropTable('team_billing');
}
