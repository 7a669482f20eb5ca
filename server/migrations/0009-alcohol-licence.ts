import { DataTypes, type QueryInterface } from 'sequelize';

/** Whether the brewery is licensed to make alcoholic beverages, and who declared it when (recorded, owners only). */
export async function up({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.addColumn('organisations', 'licensed_for_alcohol', {
    type: DataTypes.BOOLEAN,
    allowNull: false,
    defaultValue: false,
  });
  await qi.addColumn('organisations', 'licence_declared_by_id', {
    type: DataTypes.INTEGER,
    allowNull: true,
    references: { model: 'users', key: 'id' },
    onDelete: 'SET NULL',
  });
  await qi.addColumn('organisations', 'licence_declared_at', { type: DataTypes.DATE, allowNull: true });
}

export async function down({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.removeColumn('organisations', 'licence_declared_at');
  await qi.removeColumn('organisations', 'licence_declared_by_id');
  await qi.removeColumn('organisations', 'licensed_for_alcohol');
}
