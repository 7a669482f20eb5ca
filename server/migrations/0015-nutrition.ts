import { DataTypes, type QueryInterface } from 'sequelize';

import { LABEL_NUTRIENT_FIELDS } from '@/lib/ingredients';

const column = (field: string) => field.replace(/[A-Z]/g, (c) => `_${c.toLowerCase()}`);

/**
 * The nutrients a Nutrition Facts panel needs beyond sugar, fat and protein, on every ingredient (null: not
 * measured), and the lab values owners enter per 100 mL for a recipe version, kept as a history: the newest row of a
 * version is the one in force, and clearing writes an empty row.
 */
export async function up({ context: qi }: { context: QueryInterface }): Promise<void> {
  for (const field of LABEL_NUTRIENT_FIELDS)
    await qi.addColumn('ingredients', column(field), { type: DataTypes.FLOAT, allowNull: true });
  await qi.createTable('nutrition_lab_values', {
    id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
    recipe_id: {
      type: DataTypes.INTEGER,
      allowNull: false,
      references: { model: 'recipes', key: 'id' },
      onDelete: 'CASCADE',
    },
    version_number: { type: DataTypes.INTEGER, allowNull: false },
    per_100_ml: { type: DataTypes.TEXT, allowNull: false },
    reference: { type: DataTypes.STRING(200), allowNull: false, defaultValue: '' },
    entered_by_id: {
      type: DataTypes.INTEGER,
      allowNull: true,
      references: { model: 'users', key: 'id' },
      onDelete: 'SET NULL',
    },
    created_at: { type: DataTypes.DATE, allowNull: false },
    updated_at: { type: DataTypes.DATE, allowNull: false },
  });
  await qi.addIndex('nutrition_lab_values', ['recipe_id', 'version_number']);
}

export async function down({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.dropTable('nutrition_lab_values');
  for (const field of LABEL_NUTRIENT_FIELDS) await qi.removeColumn('ingredients', column(field));
}
