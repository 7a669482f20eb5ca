import {
  type CreationOptional,
  DataTypes,
  type ForeignKey,
  type InferAttributes,
  type InferCreationAttributes,
  Model,
  type Sequelize,
} from 'sequelize';

import type { Organisation } from './organisation';

/** A flavour of the brewery; its content lives in versions, the newest being `currentVersion`. */
export class Recipe extends Model<InferAttributes<Recipe>, InferCreationAttributes<Recipe>> {
  declare id: CreationOptional<number>;
  declare organisationId: ForeignKey<Organisation['id']>;
  declare name: string;
  declare flavourNotes: CreationOptional<string>;
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
