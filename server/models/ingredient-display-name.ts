import {
  type CreationOptional,
  DataTypes,
  type ForeignKey,
  type InferAttributes,
  type InferCreationAttributes,
  Model,
  type Sequelize,
} from 'sequelize';

import type { Ingredient } from './ingredient';
import type { Organisation } from './organisation';

/** The name one brewery reads for a dataset ingredient, in place of the dataset's long description. */
export class IngredientDisplayName extends Model<
  InferAttributes<IngredientDisplayName>,
  InferCreationAttributes<IngredientDisplayName>
> {
  declare id: CreationOptional<number>;
  declare organisationId: ForeignKey<Organisation['id']>;
  declare ingredientId: ForeignKey<Ingredient['id']>;
  declare name: string;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    IngredientDisplayName.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        name: { type: DataTypes.STRING(80), allowNull: false },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'ingredient_display_names', underscored: true },
    );
  }
}
