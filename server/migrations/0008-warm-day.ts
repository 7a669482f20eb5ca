import { DataTypes, type QueryInterface } from 'sequelize';

/** The warmest the brewery's bottles may meet (a car, a shop window, a summer delivery), °C: every check includes it. */
export async function up({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.addColumn('organisations', 'warmest_temp_c', { type: DataTypes.FLOAT, allowNull: false, defaultValue: 35 });
}

export async function down({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.removeColumn('organisations', 'warmest_temp_c');
}
