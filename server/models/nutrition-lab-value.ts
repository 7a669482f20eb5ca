import {
  type CreationOptional,
  DataTypes,
  type ForeignKey,
  type InferAttributes,
  type InferCreationAttributes,
  Model,
  type NonAttribute,
  type Sequelize,
} from 'sequelize';

import type { LabValues } from '@/lib/nutrition/panel';

import { jsonColumn } from './json-column';
import type { Recipe } from './recipe';
import type { User } from './user';

/** An owner's lab values per 100 mL for one recipe version; the newest row of a version is in force. */
export class NutritionLabValue extends Model<
  InferAttributes<NutritionLabValue>,
  InferCreationAttributes<NutritionLabValue>
> {
  declare id: CreationOptional<number>;
  declare recipeId: ForeignKey<Recipe['id']>;
  declare versionNumber: number;
  declare per100Ml: LabValues;
  declare reference: string;
  declare enteredById: number | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  declare enteredBy?: NonAttribute<User | null>;

  static initModel(sequelize: Sequelize): void {
    NutritionLabValue.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        versionNumber: { type: DataTypes.INTEGER, allowNull: false },
        per100Ml: { ...jsonColumn<LabValues>('per100Ml', { empty: '{}' }), field: 'per_100_ml' },
        reference: { type: DataTypes.STRING(200), allowNull: false, defaultValue: '' },
        enteredById: { type: DataTypes.INTEGER, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'nutrition_lab_values', underscored: true },
    );
  }
}
