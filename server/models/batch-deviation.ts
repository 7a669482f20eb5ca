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

/** Something that went other than planned, and what was done; it may close a danger reading. */
export class BatchDeviation extends Model<InferAttributes<BatchDeviation>, InferCreationAttributes<BatchDeviation>> {
  declare id: CreationOptional<number>;
  declare batchId: ForeignKey<Batch['id']>;
  declare whatHappened: string;
  declare actionTaken: string;
  declare closesReadingId: number | null;
  declare correctsId: number | null;
  declare userId: number | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  declare user?: NonAttribute<User | null>;

  static initModel(sequelize: Sequelize): void {
    BatchDeviation.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        whatHappened: { type: DataTypes.TEXT, allowNull: false },
        actionTaken: { type: DataTypes.TEXT, allowNull: false },
        closesReadingId: { type: DataTypes.INTEGER, allowNull: true },
        correctsId: { type: DataTypes.INTEGER, allowNull: true },
        userId: { type: DataTypes.INTEGER, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'batch_deviations', underscored: true },
    );
  }
}
