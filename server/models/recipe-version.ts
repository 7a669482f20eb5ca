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

import type { RecipeContent } from '@/lib/schemas/recipes';

import { jsonColumn } from './json-column';
import type { Recipe } from './recipe';
import type { User } from './user';

/** One saved state of a recipe: never changed once written. */
export class RecipeVersion extends Model<InferAttributes<RecipeVersion>, InferCreationAttributes<RecipeVersion>> {
  declare id: CreationOptional<number>;
  declare recipeId: ForeignKey<Recipe['id']>;
  declare number: number;
  declare name: string;
  declare flavourNotes: string;
  declare content: RecipeContent;
  declare note: CreationOptional<string>;
  declare createdById: number | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  declare createdBy?: NonAttribute<User | null>;

  static initModel(sequelize: Sequelize): void {
    RecipeVersion.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        number: { type: DataTypes.INTEGER, allowNull: false },
        name: { type: DataTypes.STRING(100), allowNull: false },
        flavourNotes: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
        content: jsonColumn<RecipeContent>('content'),
        note: { type: DataTypes.STRING(300), allowNull: false, defaultValue: '' },
        createdById: { type: DataTypes.INTEGER, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'recipe_versions', underscored: true },
    );
  }
}
