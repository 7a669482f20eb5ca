import {
  type CreationOptional,
  DataTypes,
  type InferAttributes,
  type InferCreationAttributes,
  Model,
  type Sequelize,
} from 'sequelize';

import { DEFAULT_RATING_SHARE, DEFAULT_WARMEST_TEMP_C } from '@/lib/chemistry/carbonation';

/** A brewery. Every record in Fizzwright belongs to exactly one. */
export class Organisation extends Model<InferAttributes<Organisation>, InferCreationAttributes<Organisation>> {
  declare id: CreationOptional<number>;
  declare name: string;
  /** The line between non-alcoholic and alcoholic drinks, % ABV (0.5 in the US; other countries differ). */
  declare abvLimitPercent: CreationOptional<number>;
  /** The warmest the bottles may meet, °C (35 by default): pressure is always judged there too. */
  declare warmestTempC: CreationOptional<number>;
  /** The share of a bottle's rating the most sugar may reach at the warm check, % (80 by default). */
  declare ratingSharePercent: CreationOptional<number>;
  /** Printed at the start of every lot code, e.g. WCD in WCD-261202-02. */
  declare lotPrefix: CreationOptional<string>;
  /** ISO 4217 code of the currency ingredient costs are kept in. */
  declare currency: CreationOptional<string>;
  /** Declared by an owner: the brewery is licensed to make alcoholic beverages, so versions at or over the limit may be approved. */
  declare licensedForAlcohol: CreationOptional<boolean>;
  declare licenceDeclaredById: CreationOptional<number | null>;
  declare licenceDeclaredAt: CreationOptional<Date | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    Organisation.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        name: { type: DataTypes.STRING(80), allowNull: false },
        abvLimitPercent: { type: DataTypes.FLOAT, allowNull: false, defaultValue: 0.5 },
        warmestTempC: { type: DataTypes.FLOAT, allowNull: false, defaultValue: DEFAULT_WARMEST_TEMP_C },
        lotPrefix: { type: DataTypes.STRING(8), allowNull: false, defaultValue: 'LOT' },
        currency: { type: DataTypes.STRING(3), allowNull: false, defaultValue: 'USD' },
        ratingSharePercent: { type: DataTypes.FLOAT, allowNull: false, defaultValue: DEFAULT_RATING_SHARE * 100 },
        licensedForAlcohol: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
        licenceDeclaredById: { type: DataTypes.INTEGER, allowNull: true },
        licenceDeclaredAt: { type: DataTypes.DATE, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'organisations', underscored: true },
    );
  }
}
