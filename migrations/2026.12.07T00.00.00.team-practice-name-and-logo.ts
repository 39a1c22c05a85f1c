import { DataTypes, type QueryInterface } from 'sequelize';

// The practice a team works as, printed on every page of its treatment schedules: a name (the team's
// own name when empty) and a logo stored as an upload (PNG or JPEG).
export async function up({ context: queryInterface }: { context: QueryInterface }): Promise<void> {
  await queryInterface.addColumn('teams', 'practice_name', { type: DataTypes.STRING(120), allowNull: true });
  await queryInterface.addColumn('teams', 'logo_upload_id', { type: DataTypes.UUID, allowNull: true, references: { model: 'uploads', key: 'id' }, onDelete: 'SET NULL' });
}

export async function down({ context: queryInterface }: { context: QueryInterface }): Promise<void> {
  await queryInterface.removeColumn('teams', 'logo_upload_id');
  await queryInterface.removeColumn('teams', 'practice_name');
}
