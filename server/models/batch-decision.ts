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

import type { Decision } from '@/lib/schemas/batches';

import type { Batch } from './batch';
import type { User } from './user';

/** An owner's decision on a batch (or the hold an ABV reading at the limit puts on it). */
export class BatchDecision extends Model<InferAttributes<BatchDecision>, InferCreationAttributes<BatchDecision>> {
  declare id: CreationOptional<number>;
  declare batchId: ForeignKey<Batch['id']>;
  declare decision: Decision;
  declare note: string;
  declare overrideReason: string | null;
  declare userId: number | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  declare user?: NonAttribute<User | null>;

  static initModel(sequelize: Sequelize): void {
    BatchDecision.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        decision: { type: DataTypes.STRING(20), allowNull: false },
        note: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
        overrideReason: { type: DataTypes.TEXT, allowNull: true },
        userId: { type: DataTypes.INTEGER, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'batch_decisions', underscored: true },
    );
  }
}
