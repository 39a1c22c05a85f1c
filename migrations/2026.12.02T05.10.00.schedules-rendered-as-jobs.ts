import { DataTypes, type QueryInterface } from 'sequelize';

// A treatment schedule is rendered by the job worker: its row exists from the moment it is asked
// for ("rendering"), and gets its stored file and checksum when rendered ("issued"), or says why
// it could not be ("failed"). Schedules issued before this were rendered in the request: issued.
export async function up({ context: queryInterface }: { context: QueryInterface }): Promise<void> {
  await queryInterface.addColumn('schedules', 'status', { type: DataTypes.STRING(20), allowNull: false, defaultValue: 'issued' });
  await queryInterface.addColumn('schedules', 'failure', { type: DataTypes.TEXT, allowNull: true });
  await queryInterface.addColumn('schedules', 'issued_at', { type: DataTypes.DATE, allowNull: true });
  await queryInterface.sequelize.query('update schedules set issued_at = created_at');
  await queryInterface.changeColumn('schedules', 'storage_key', { type: DataTypes.STRING(300), allowNull: true });
  await queryInterface.changeColumn('schedules', 'sha256', { type: DataTypes.STRING(64), allowNull: true });
  await queryInterface.changeColumn('schedules', 'bytes', { type: DataTypes.INTEGER, allowNull: true });
}

export async function down({ context: queryInterface }: { context: QueryInterface }): Promise<void> {
  await queryInterface.sequelize.query("delete from schedules where status <> 'issued'");
  await queryInterface.changeColumn('schedules', 'bytes', { type: DataTypes.INTEGER, allowNull: false });
  await queryInterface.changeColumn('schedules', 'sha256', { type: DataTypes.STRING(64), allowNull: false });
  await queryInterface.changeColumn('schedules', 'storage_key', { type: DataTypes.STRING(300), allowNull: false });
  await queryInterface.removeColumn('schedules', 'issued_at');
  await queryInterface.removeColumn('schedules', 'failure');
  await queryInterface.removeColumn('schedules', 'status');
}
