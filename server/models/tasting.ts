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

import type { TastingInput } from '@/lib/schemas/recipes';

import { jsonColumn } from './json-column';
import type { Recipe } from './recipe';
import type { User } from './user';

/** A tasting of one version: scores, notes, and sugar added at the tasting. */
export class Tasting extends Model<InferAttributes<Tasting>, InferCreationAttributes<Tasting>> {
  declare id: CreationOptional<number>;
  declare recipeId: ForeignKey<Recipe['id']>;
  /** The version that was tasted. */
  declare versionNumber: number;
  /** The version its sugar addition created, if it made one. */
  declare createdVersion: CreationOptional<number | null>;
  declare userId: number | null;
  declare tastedOn: string;
  declare notes: string;
  declare sweetness: number;
  declare sourness: number;
  declare fizz: number;
  declare flavour: number;
  declare sugarAddition: TastingInput['sugarAddition'];
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  declare user?: NonAttribute<User | null>;

  static initModel(sequelize: Sequelize): void {
    Tasting.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        versionNumber: { type: DataTypes.INTEGER, allowNull: false },
        createdVersion: { type: DataTypes.INTEGER, allowNull: true },
        userId: { type: DataTypes.INTEGER, allowNull: true },
        tastedOn: { type: DataTypes.STRING(10), allowNull: false },
        notes: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
        sweetness: { type: DataTypes.INTEGER, allowNull: false },
        sourness: { type: DataTypes.INTEGER, allowNull: false },
        fizz: { type: DataTypes.INTEGER, allowNull: false },
        flavour: { type: DataTypes.INTEGER, allowNull: false },
        sugarAddition: jsonColumn<TastingInput['sugarAddition']>('sugarAddition', { allowNull: true }),
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'tastings', underscored: true },
    );
  }
}
