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

/** A step of a batch signed off: by whom and when. Each step once. */
export class BatchStepSignoff extends Model<
  InferAttributes<BatchStepSignoff>,
  InferCreationAttributes<BatchStepSignoff>
> {
  declare id: CreationOptional<number>;
  declare batchId: ForeignKey<Batch['id']>;
  declare stepNumber: number;
  declare note: string;
  declare userId: number | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  declare user?: NonAttribute<User | null>;

  static initModel(sequelize: Sequelize): void {
    BatchStepSignoff.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        stepNumber: { type: DataTypes.INTEGER, allowNull: false },
        note: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
        userId: { type: DataTypes.INTEGER, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'batch_step_signoffs', underscored: true },
    );
  }
}
