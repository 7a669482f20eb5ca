import type { QueryInterface } from 'sequelize';

/** Every column holding JSON, with the value an empty one has. SQLite keeps them as TEXT. */
const JSON_COLUMNS: { table: string; column: string; empty?: string }[] = [
  { table: 'ingredients', column: 'allergens', empty: '[]' },
  { table: 'ingredients', column: 'measures', empty: '[]' },
  { table: 'ingredient_changes', column: 'changes' },
  { table: 'recipe_versions', column: 'content' },
  { table: 'tastings', column: 'sugar_addition' },
  { table: 'batches', column: 'frozen' },
  { table: 'nutrition_lab_values', column: 'per_100_ml' },
];

/** On PostgreSQL, JSON columns become JSONB (checked on write, readable in SQL). Nothing changes on SQLite. */
export async function up({ context: qi }: { context: QueryInterface }): Promise<void> {
  if (qi.sequelize.getDialect() !== 'postgres') return;
  for (const { table, column, empty } of JSON_COLUMNS) {
    await qi.sequelize.query(`ALTER TABLE "${table}" ALTER COLUMN "${column}" DROP DEFAULT`);
    await qi.sequelize.query(`ALTER TABLE "${table}" ALTER COLUMN "${column}" TYPE jsonb USING "${column}"::jsonb`);
    if (empty)
      await qi.sequelize.query(`ALTER TABLE "${table}" ALTER COLUMN "${column}" SET DEFAULT '${empty}'::jsonb`);
  }
}

export async function down({ context: qi }: { context: QueryInterface }): Promise<void> {
  if (qi.sequelize.getDialect() !== 'postgres') return;
  for (const { table, column, empty } of JSON_COLUMNS) {
    await qi.sequelize.query(`ALTER TABLE "${table}" ALTER COLUMN "${column}" DROP DEFAULT`);
    await qi.sequelize.query(`ALTER TABLE "${table}" ALTER COLUMN "${column}" TYPE text USING "${column}"::text`);
    if (empty) await qi.sequelize.query(`ALTER TABLE "${table}" ALTER COLUMN "${column}" SET DEFAULT '${empty}'`);
  }
}
