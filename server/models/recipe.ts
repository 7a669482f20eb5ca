import { DataTypes, Model, type CreationOptional, type ForeignKey, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

import type { RecipeContent, TastingInput } from '../../lib/schemas/recipes';
import { jsonColumn } from './json-column';
import type { Organisation } from './organisation';

/** A flavour of the brewery; its content lives in versions, the newest being `currentVersion`. */
export class Recipe extends Model<InferAttributes<Recipe>, InferCreationAttributes<Recipe>> {
  declare id: CreationOptional<number>;
  declare organisationId: ForeignKey<Organisation['id']>;
  declare name: string;
  declare flavourNotes: CreationOptional<string>;
  declare status: CreationOptional<'draft'>;
  declare currentVersion: CreationOptional<number>;
  /** The version waiting for an owner's decision, if any. */
  declare submittedVersion: CreationOptional<number | null>;
  /** The version approved for production, if any: production keeps using it while newer drafts are made. */
  declare approvedVersion: CreationOptional<number | null>;
  declare archivedAt: CreationOptional<Date | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    Recipe.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        name: { type: DataTypes.STRING(100), allowNull: false },
        flavourNotes: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
        status: { type: DataTypes.STRING(20), allowNull: false, defaultValue: 'draft' },
        currentVersion: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 1 },
        submittedVersion: { type: DataTypes.INTEGER, allowNull: true },
        approvedVersion: { type: DataTypes.INTEGER, allowNull: true },
        archivedAt: { type: DataTypes.DATE, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'recipes', underscored: true },
    );
  }
}

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
