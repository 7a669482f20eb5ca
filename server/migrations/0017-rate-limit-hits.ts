import { DataTypes, type QueryInterface } from 'sequelize';

/**
 * Hits counted by the rate limits when instances share PostgreSQL (one row per limit and key, its window's end).
 * A single SQLite instance counts in memory and never reads this table, but has it too, so both schemas match.
 */
export async function up({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.createTable('rate_limit_hits', {
    key: { type: DataTypes.STRING(300), primaryKey: true },
    hits: { type: DataTypes.INTEGER, allowNull: false },
    reset_at: { type: DataTypes.DATE, allowNull: false },
  });
  await qi.addIndex('rate_limit_hits', ['reset_at']);
}

export async function down({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.dropTable('rate_limit_hits');
}
