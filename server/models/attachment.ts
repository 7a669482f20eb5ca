import {
  type CreationOptional,
  DataTypes,
  type ForeignKey,
  type InferAttributes,
  type InferCreationAttributes,
  Model,
  type Sequelize,
} from 'sequelize';

import type { Ingredient } from './ingredient';
import type { Organisation } from './organisation';

/** A file attached to a house ingredient (or to a batch's ABV reading): its bytes are in the uploads folder under a generated name. */
export class Attachment extends Model<InferAttributes<Attachment>, InferCreationAttributes<Attachment>> {
  declare id: CreationOptional<number>;
  declare organisationId: ForeignKey<Organisation['id']>;
  declare ingredientId: ForeignKey<Ingredient['id'] | null>;
  /** A lab's report on an ABV reading, when the file belongs to a batch rather than an ingredient. */
  declare batchReadingId: CreationOptional<number | null>;
  declare uploadedById: number | null;
  declare storedName: string;
  declare originalName: string;
  declare mimeType: string;
  declare sizeBytes: number;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    Attachment.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        uploadedById: { type: DataTypes.INTEGER, allowNull: true },
        batchReadingId: { type: DataTypes.INTEGER, allowNull: true },
        storedName: { type: DataTypes.STRING(80), allowNull: false, unique: true },
        originalName: { type: DataTypes.STRING(200), allowNull: false },
        mimeType: { type: DataTypes.STRING(40), allowNull: false },
        sizeBytes: { type: DataTypes.INTEGER, allowNull: false },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'attachments', underscored: true },
    );
  }
}
