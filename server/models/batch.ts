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

import type { BatchFacts } from '@/lib/batches/checks';
import type { RecipeCard } from '@/lib/recipes/card';
import type { BatchState } from '@/lib/schemas/batches';
import type { BatchKind } from '@/lib/schemas/recipes';

import { jsonColumn } from './json-column';
import type { Organisation } from './organisation';
import type { Recipe } from './recipe';
import type { User } from './user';

/** What a batch froze at start: the card of its version at its size, and the facts its readings are judged by. */
export interface FrozenBatch {
  card: RecipeCard;
  facts: BatchFacts;
}

/** A production or trial batch of one recipe version: its lot code, frozen amounts and steps, and its state. */
export class Batch extends Model<InferAttributes<Batch>, InferCreationAttributes<Batch>> {
  declare id: CreationOptional<number>;
  declare organisationId: ForeignKey<Organisation['id']>;
  declare recipeId: ForeignKey<Recipe['id']>;
  declare versionNumber: number;
  declare lotCode: string;
  declare trial: boolean;
  declare state: BatchState;
  declare batchKind: BatchKind;
  declare batchValue: number;
  declare frozen: FrozenBatch;
  declare startedById: number | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  declare recipe?: NonAttribute<Recipe>;
  declare startedBy?: NonAttribute<User | null>;

  static initModel(sequelize: Sequelize): void {
    Batch.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        versionNumber: { type: DataTypes.INTEGER, allowNull: false },
        lotCode: { type: DataTypes.STRING(40), allowNull: false },
        trial: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
        state: { type: DataTypes.STRING(20), allowNull: false },
        batchKind: { type: DataTypes.STRING(20), allowNull: false },
        batchValue: { type: DataTypes.FLOAT, allowNull: false },
        frozen: jsonColumn<FrozenBatch>('frozen'),
        startedById: { type: DataTypes.INTEGER, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'batches', underscored: true },
    );
  }
}
