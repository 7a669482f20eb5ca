import {
  type CreationOptional,
  DataTypes,
  type ForeignKey,
  type InferAttributes,
  type InferCreationAttributes,
  Model,
  type Sequelize,
} from 'sequelize';

import type { Closure, Material } from '@/lib/schemas/bottle-formats';

import type { Organisation } from './organisation';

/** A kind of container a brewery fills, with the working pressure its supplier rates it for. */
export class BottleFormat extends Model<InferAttributes<BottleFormat>, InferCreationAttributes<BottleFormat>> {
  declare id: CreationOptional<number>;
  declare organisationId: ForeignKey<Organisation['id']>;
  declare name: string;
  declare liquidMl: number;
  declare headspaceMl: number;
  declare closure: Closure;
  declare material: Material;
  declare maxWorkingPressureBar: number;
  /** Where the pressure figure comes from: the supplier's sheet, or "typical value (from memory)". */
  declare pressureSource: string;
  declare notes: string | null;
  declare archivedAt: CreationOptional<Date | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    BottleFormat.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        name: { type: DataTypes.STRING(60), allowNull: false },
        liquidMl: { type: DataTypes.FLOAT, allowNull: false },
        headspaceMl: { type: DataTypes.FLOAT, allowNull: false },
        closure: { type: DataTypes.STRING(20), allowNull: false },
        material: { type: DataTypes.STRING(20), allowNull: false },
        maxWorkingPressureBar: { type: DataTypes.FLOAT, allowNull: false },
        pressureSource: { type: DataTypes.STRING(200), allowNull: false },
        notes: { type: DataTypes.TEXT, allowNull: true },
        archivedAt: { type: DataTypes.DATE, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'bottle_formats', underscored: true },
    );
  }
}
