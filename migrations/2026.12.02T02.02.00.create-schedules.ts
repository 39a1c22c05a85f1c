import { DataTypes, type QueryInterface } from 'sequelize';

// Issued treatment schedules: the PDF of a revision, stored through the S3 client, with its
// SHA-256 so a download can be checked against what was issued.
export async function up({ context: queryInterface }: { context: QueryInterface }): Promise<void> {
  await queryInterface.createTable('schedules', {
    id: { type: DataTypes.UUID, primaryKey: true },
    team_id: { type: DataTypes.UUID, allowNull: false, references: { model: 'teams', key: 'id' }, onDelete: 'CASCADE' },
    revision_id: { type: DataTypes.UUID, allowNull: false, references: { model: 'revisions', key: 'id' }, onDelete: 'CASCADE' },
    storage_key: { type: DataTypes.STRING(300), allowNull: false },
    sha256: { type: DataTypes.STRING(64), allowNull: false },
    bytes: { type: DataTypes.INTEGER, allowNull: false },
    issued_by_id: { type: DataTypes.UUID, allowNull: true, references: { model: 'users', key: 'id' }, onDelete: 'SET NULL' },
    issued_by_name: { type: DataTypes.STRING(200), allowNull: false },
    created_at: { type: DataTypes.DATE, allowNull: false },
  });
  await queryInterface.addIndex('schedules', ['revision_id', 'created_at']);
}

export async function down({ context: queryInterface }: { context: QueryInterface }): Promise<void> {
  await queryInterface.dropTable('schedules');
}
