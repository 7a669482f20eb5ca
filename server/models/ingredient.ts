import {
  type CreationOptional,
  DataTypes,
  type ForeignKey,
  type InferAttributes,
  type InferCreationAttributes,
  Model,
  type Sequelize,
} from 'sequelize';

import {
  type Allergen,
  type Category,
  LABEL_NUTRIENT_FIELDS,
  type LabelNutrientField,
  type Measure,
} from '@/lib/ingredients';

import { jsonColumn } from './json-column';
import type { Organisation } from './organisation';

/**
 * An ingredient with its composition per 100 g. Dataset rows (organisationId null) come from an open dataset and
 * are read-only to breweries; house rows belong to one brewery.
 */
export class Ingredient extends Model<InferAttributes<Ingredient>, InferCreationAttributes<Ingredient>> {
  declare id: CreationOptional<number>;
  declare organisationId: ForeignKey<Organisation['id']> | null;
  declare name: string;
  declare category: Category;
  declare energyKcal: number | null;
  declare carbohydrateG: number | null;
  declare sugarsG: number | null;
  declare fibreG: number | null;
  declare fatG: number | null;
  declare proteinG: number | null;
  declare saturatedFatG: number | null;
  declare transFatG: number | null;
  declare cholesterolMg: number | null;
  declare sodiumMg: number | null;
  /** Only house ingredients carry it (from their label); dataset foods are judged by `addedSugarShare`. */
  declare addedSugarsG: number | null;
  declare vitaminDMcg: number | null;
  declare calciumMg: number | null;
  declare ironMg: number | null;
  declare potassiumMg: number | null;
  /** Share (0–1) of the sugars that yeast can ferment. */
  declare fermentableShare: number;
  /** Default share (0–1) of the sugars that reach the liquid when steeped and strained. */
  declare steepShare: number;
  declare allergens: Allergen[];
  declare measures: Measure[];
  declare costPerKg: number | null;
  declare notes: string | null;
  declare sourceDataset: string | null;
  declare sourceRecord: string | null;
  declare archivedAt: CreationOptional<Date | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    Ingredient.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        name: { type: DataTypes.STRING(200), allowNull: false },
        category: { type: DataTypes.STRING(20), allowNull: false },
        energyKcal: { type: DataTypes.FLOAT, allowNull: true },
        carbohydrateG: { type: DataTypes.FLOAT, allowNull: true },
        sugarsG: { type: DataTypes.FLOAT, allowNull: true },
        fibreG: { type: DataTypes.FLOAT, allowNull: true },
        fatG: { type: DataTypes.FLOAT, allowNull: true },
        proteinG: { type: DataTypes.FLOAT, allowNull: true },
        ...(Object.fromEntries(
          LABEL_NUTRIENT_FIELDS.map((field) => [field, { type: DataTypes.FLOAT, allowNull: true }]),
        ) as Record<LabelNutrientField, { type: typeof DataTypes.FLOAT; allowNull: true }>),
        fermentableShare: { type: DataTypes.FLOAT, allowNull: false },
        steepShare: { type: DataTypes.FLOAT, allowNull: false },
        allergens: jsonColumn<Allergen[]>('allergens', { empty: '[]' }),
        measures: jsonColumn<Measure[]>('measures', { empty: '[]' }),
        costPerKg: { type: DataTypes.FLOAT, allowNull: true },
        notes: { type: DataTypes.TEXT, allowNull: true },
        sourceDataset: { type: DataTypes.STRING(60), allowNull: true },
        sourceRecord: { type: DataTypes.STRING(20), allowNull: true },
        archivedAt: { type: DataTypes.DATE, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'ingredients', underscored: true },
    );
  }
}
