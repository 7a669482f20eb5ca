import { DataTypes, type QueryInterface } from 'sequelize';

/** The brewery's margin: the share of a bottle's rating the most sugar may reach at the warm check, %. */
export async function up({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.addColumn('organisations', 'rating_share_percent', {
    type: DataTypes.FLOAT,
    allowNull: false,
    defaultValue: 80,
  });
}

export async function down({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.removeColumn('organisations', 'rating_share_percent');
}
