import { DataTypes, type QueryInterface } from 'sequelize';

/**
 * `recipes.status` was always 'draft': where a recipe stands comes from its archive date and its review columns. A
 * plain DROP COLUMN (SQLite 3.35 and later, PostgreSQL) rather than Sequelize's SQLite removeColumn, which rebuilds
 * the table and, with foreign keys on, would cascade the drop to every version, tasting and review.
 */
export async function up({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.sequelize.query('ALTER TABLE recipes DROP COLUMN status');
}

export async function down({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.addColumn('recipes', 'status', { type: DataTypes.STRING(20), allowNull: false, defaultValue: 'draft' });
}
