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

import type { Ingredient } from './ingredient';
import { jsonColumn } from './json-column';
import type { User } from './user';

/** Who changed a house ingredient, when, and what (field: [before, after]). */
export class IngredientChange extends Model<
  InferAttributes<IngredientChange>,
  InferCreationAttributes<IngredientChange>
> {
  declare id: CreationOptional<number>;
  declare ingredientId: ForeignKey<Ingredient['id']>;
  declare userId: number | null;
  declare action: 'created' | 'updated' | 'archived' | 'restored';
  declare changes: Record<string, [unknown, unknown]>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  declare user?: NonAttribute<User | null>;

  static initModel(sequelize: Sequelize): void {
    IngredientChange.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        userId: { type: DataTypes.INTEGER, allowNull: true },
        action: { type: DataTypes.STRING(20), allowNull: false },
        changes: jsonColumn<Record<string, [unknown, unknown]>>('changes', { empty: '{}' }),
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'ingredient_changes', underscored: true },
    );
  }
}
