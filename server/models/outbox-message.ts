import {
  type CreationOptional,
  DataTypes,
  type ForeignKey,
  type InferAttributes,
  type InferCreationAttributes,
  Model,
  type Sequelize,
} from 'sequelize';

import type { Organisation } from './organisation';
import type { User } from './user';

/** A message kept by the local mail outbox (used when no SMTP server is configured). */
export class OutboxMessage extends Model<InferAttributes<OutboxMessage>, InferCreationAttributes<OutboxMessage>> {
  declare id: CreationOptional<number>;
  declare organisationId: ForeignKey<Organisation['id']> | null;
  /** The account the message is addressed to, when it has one. */
  declare userId: ForeignKey<User['id']> | null;
  declare kind: string;
  declare to: string;
  declare from: string;
  declare subject: string;
  declare text: string;
  declare html: string | null;
  /** SHA-256 of the token of the one-time link the message carries, so its text can be redacted once it no longer works. */
  declare linkTokenHash: CreationOptional<string | null>;
  declare linkExpiresAt: CreationOptional<Date | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    OutboxMessage.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        kind: { type: DataTypes.STRING(40), allowNull: false },
        to: { type: DataTypes.STRING(254), allowNull: false, field: 'to_address' },
        from: { type: DataTypes.STRING(254), allowNull: false, field: 'from_address' },
        subject: { type: DataTypes.STRING(200), allowNull: false },
        text: { type: DataTypes.TEXT, allowNull: false },
        html: { type: DataTypes.TEXT, allowNull: true },
        linkTokenHash: { type: DataTypes.STRING(64), allowNull: true },
        linkExpiresAt: { type: DataTypes.DATE, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'outbox_messages', underscored: true },
    );
  }
}
