import { DataTypes, type QueryInterface } from 'sequelize';

// A plan's name and archive state carry their own version, so a rename or archive made from an
// older copy is refused (409) rather than silently undoing someone else's; separate from the
// drawing's version, so renaming a plan never makes an open editor's next save a conflict.
export async function up({ context: queryInterface }: { context: QueryInterface }): Promise<void> {
  await queryInterface.addColumn('plans', 'details_version', { type: DataTypes.INTEGER, allowNull: false, defaultValue: 1 });
}

export async function down({ context: queryInterface }: { context: QueryInterface }): Promise<void> {
  await queryInterface.removeColumn('plans', 'details_version');
}
