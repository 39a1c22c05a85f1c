import { DataTypes, type QueryInterface } from 'sequelize';

// The stored analysis of each plan version (keyed by the content's hash and the analysis format),
// with the candidate treatments of its flags as they are evaluated; and the counters of the
// per-person rate limits on analysis routes, shared by every app instance.
export async function up({ context: queryInterface }: { context: QueryInterface }): Promise<void> {
  await queryInterface.createTable('plan_analyses', {
    id: { type: DataTypes.UUID, primaryKey: true },
    plan_id: { type: DataTypes.UUID, allowNull: false, references: { model: 'plans', key: 'id' }, onDelete: 'CASCADE' },
    content_hash: { type: DataTypes.STRING(64), allowNull: false },
    format: { type: DataTypes.INTEGER, allowNull: false },
    analysis: { type: DataTypes.JSONB, allowNull: false },
    candidates: { type: DataTypes.JSONB, allowNull: false, defaultValue: {} },
    created_at: { type: DataTypes.DATE, allowNull: false },
    updated_at: { type: DataTypes.DATE, allowNull: false },
  });
  await queryInterface.addIndex('plan_analyses', ['plan_id', 'content_hash', 'format'], { unique: true, name: 'plan_analyses_plan_content_format' });
  await queryInterface.addIndex('plan_analyses', ['plan_id', 'updated_at']);
  await queryInterface.createTable('rate_limits', {
    key: { type: DataTypes.STRING(255), primaryKey: true },
    points: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
    expire: { type: DataTypes.BIGINT, allowNull: true },
  });
}

export async function down({ context: queryInterface }: { context: QueryInterface }): Promise<void> {
  await queryInterface.dropTable('rate_limits');
  await queryInterface.dropTable('plan_analyses');
}
