import {
  type CreationOptional,
  DataTypes,
  type InferAttributes,
  type InferCreationAttributes,
  Model,
  type Sequelize,
} from 'sequelize';

/**
 * A sign-up waiting for its address to be confirmed. The brewery and its owner are created only when the link in
 * the confirmation e-mail is followed, so a sign-up answers the same whether or not the address has an account.
 */
export class PendingSignUp extends Model<InferAttributes<PendingSignUp>, InferCreationAttributes<PendingSignUp>> {
  declare id: CreationOptional<number>;
  declare email: string;
  declare name: string;
  declare breweryName: string;
  declare passwordHash: string;
  /** SHA-256 of the confirmation link's token. */
  declare tokenHash: string;
  declare expiresAt: Date;
  declare usedAt: CreationOptional<Date | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    PendingSignUp.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        email: { type: DataTypes.STRING(254), allowNull: false },
        name: { type: DataTypes.STRING(80), allowNull: false },
        breweryName: { type: DataTypes.STRING(80), allowNull: false },
        passwordHash: { type: DataTypes.STRING(100), allowNull: false },
        tokenHash: { type: DataTypes.STRING(64), allowNull: false, unique: true },
        expiresAt: { type: DataTypes.DATE, allowNull: false },
        usedAt: { type: DataTypes.DATE, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'pending_sign_ups', underscored: true },
    );
  }
}
