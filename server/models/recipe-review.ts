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

import type { Recipe } from './recipe';
import type { User } from './user';

export type ReviewAction = 'submitted' | 'approved' | 'returned' | 'withdrawn';

/** One step of a recipe's review: who did what to which version, when, and why. */
export class RecipeReview extends Model<InferAttributes<RecipeReview>, InferCreationAttributes<RecipeReview>> {
  declare id: CreationOptional<number>;
  declare recipeId: ForeignKey<Recipe['id']>;
  declare versionNumber: number;
  declare action: ReviewAction;
  declare userId: number | null;
  declare comment: string;
  declare overrideReason: string | null;
  declare selfApproved: CreationOptional<boolean>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  declare user?: NonAttribute<User | null>;

  static initModel(sequelize: Sequelize): void {
    RecipeReview.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        versionNumber: { type: DataTypes.INTEGER, allowNull: false },
        action: { type: DataTypes.STRING(20), allowNull: false },
        userId: { type: DataTypes.INTEGER, allowNull: true },
        comment: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
        overrideReason: { type: DataTypes.TEXT, allowNull: true },
        selfApproved: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'recipe_reviews', underscored: true },
    );
  }
}
