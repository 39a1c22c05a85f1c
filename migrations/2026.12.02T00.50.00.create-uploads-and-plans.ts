import { DataTypes, type QueryInterface } from 'sequelize';

export async function up({ context: queryInterface }: { context: QueryInterface }): Promise<void> {
  await queryInterface.createTable('uploads', {
    id: { type: DataTypes.UUID, primaryKey: true },
    team_id: { type: DataTypes.UUID, allowNull: false, references: { model: 'teams', key: 'id' }, onDelete: 'CASCADE' },
    uploaded_by_id: { type: DataTypes.UUID, allowNull: true, references: { model: 'users', key: 'id' }, onDelete: 'SET NULL' },
    storage_key: { type: DataTypes.STRING(300), allowNull: false, unique: true },
    file_name: { type: DataTypes.STRING(255), allowNull: false },
    content_type: { type: DataTypes.STRING(100), allowNull: false },
    bytes: { type: DataTypes.INTEGER, allowNull: false },
    sha256: { type: DataTypes.STRING(64), allowNull: false },
    width_px: { type: DataTypes.INTEGER, allowNull: true },
    height_px: { type: DataTypes.INTEGER, allowNull: true },
    created_at: { type: DataTypes.DATE, allowNull: false },
  });
  await queryInterface.addIndex('uploads', ['team_id']);
  await queryInterface.createTable('plans', {
    id: { type: DataTypes.UUID, primaryKey: true },
    project_id: { type: DataTypes.UUID, allowNull: false, references: { model: 'projects', key: 'id' }, onDelete: 'CASCADE' },
    name: { type: DataTypes.STRING(160), allowNull: false },
    background_upload_id: { type: DataTypes.UUID, allowNull: true, references: { model: 'uploads', key: 'id' }, onDelete: 'SET NULL' },
    metres_per_pixel: { type: DataTypes.DOUBLE, allowNull: false, defaultValue: 0.01 },
    version: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 1 },
    document: { type: DataTypes.JSONB, allowNull: false },
    archived: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
    updated_by_id: { type: DataTypes.UUID, allowNull: true, references: { model: 'users', key: 'id' }, onDelete: 'SET NULL' },
    created_at: { type: DataTypes.DATE, allowNull: false },
    updated_at: { type: DataTypes.DATE, allowNull: false },
  });
  await queryInterface.addIndex('plans', ['project_id', 'archived']);
}

export async function down({ context: queryInterface }: { context: QueryInterface }): Promise<void> {
  await queryInterface.dropTable('plans');
  await queryInterface.dropTable('uploads');
}
