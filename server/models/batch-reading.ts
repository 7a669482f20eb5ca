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

import type { FindingLevel } from '@/lib/chemistry/carbonation';
import type { ReadingKind, Stage } from '@/lib/schemas/batches';

import type { Batch } from './batch';
import type { User } from './user';

/** One reading taken on the floor, with the check it got when it was entered. Never changed: corrected by another. */
export class BatchReading extends Model<InferAttributes<BatchReading>, InferCreationAttributes<BatchReading>> {
  declare id: CreationOptional<number>;
  declare batchId: ForeignKey<Batch['id']>;
  declare kind: ReadingKind;
  declare value: number;
  declare tempC: number | null;
  declare stage: Stage;
  declare source: 'in-house' | 'lab' | null;
  declare takenAt: Date;
  declare note: string;
  declare level: FindingLevel;
  declare message: string;
  declare predictedGaugeBar: number | null;
  declare correctsId: number | null;
  declare userId: number | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  declare user?: NonAttribute<User | null>;

  static initModel(sequelize: Sequelize): void {
    BatchReading.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        kind: { type: DataTypes.STRING(20), allowNull: false },
        value: { type: DataTypes.FLOAT, allowNull: false },
        tempC: { type: DataTypes.FLOAT, allowNull: true },
        stage: { type: DataTypes.STRING(20), allowNull: false },
        source: { type: DataTypes.STRING(20), allowNull: true },
        takenAt: { type: DataTypes.DATE, allowNull: false },
        note: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
        level: { type: DataTypes.STRING(10), allowNull: false },
        message: { type: DataTypes.TEXT, allowNull: false },
        predictedGaugeBar: { type: DataTypes.FLOAT, allowNull: true },
        correctsId: { type: DataTypes.INTEGER, allowNull: true },
        userId: { type: DataTypes.INTEGER, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'batch_readings', underscored: true },
    );
  }
}
