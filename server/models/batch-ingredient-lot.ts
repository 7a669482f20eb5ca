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

import type { Batch } from './batch';
import type { User } from './user';

/** A supplier's lot used in a batch, with the quantity as written and as grams or litres. */
export class BatchIngredientLot extends Model<
  InferAttributes<BatchIngredientLot>,
  InferCreationAttributes<BatchIngredientLot>
> {
  declare id: CreationOptional<number>;
  declare batchId: ForeignKey<Batch['id']>;
  declare ingredientId: number | null;
  declare ingredientName: string;
  declare supplier: string;
  declare supplierLot: string;
  declare quantityText: string;
  declare quantityValue: number;
  declare quantityUnit: 'g' | 'L';
  declare correctsId: number | null;
  declare userId: number | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  declare user?: NonAttribute<User | null>;
  declare batch?: NonAttribute<Batch>;

  static initModel(sequelize: Sequelize): void {
    BatchIngredientLot.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        ingredientId: { type: DataTypes.INTEGER, allowNull: true },
        ingredientName: { type: DataTypes.STRING(200), allowNull: false },
        supplier: { type: DataTypes.STRING(200), allowNull: false, defaultValue: '' },
        supplierLot: { type: DataTypes.STRING(100), allowNull: false },
        quantityText: { type: DataTypes.STRING(60), allowNull: false },
        quantityValue: { type: DataTypes.FLOAT, allowNull: false },
        quantityUnit: { type: DataTypes.STRING(4), allowNull: false },
        correctsId: { type: DataTypes.INTEGER, allowNull: true },
        userId: { type: DataTypes.INTEGER, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'batch_ingredient_lots', underscored: true },
    );
  }
}
