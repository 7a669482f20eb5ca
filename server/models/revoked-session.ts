import { DataTypes, type InferAttributes, type InferCreationAttributes, Model, type Sequelize } from 'sequelize';

/** A session ended by signing out, kept until its token would have expired anyway. */
export class RevokedSession extends Model<InferAttributes<RevokedSession>, InferCreationAttributes<RevokedSession>> {
  /** The token's `jti` claim. */
  declare jti: string;
  declare expiresAt: Date;

  static initModel(sequelize: Sequelize): void {
    RevokedSession.init(
      {
        jti: { type: DataTypes.STRING(32), primaryKey: true },
        expiresAt: { type: DataTypes.DATE, allowNull: false },
      },
      { sequelize, tableName: 'revoked_sessions', underscored: true, timestamps: false },
    );
  }
}
