import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type NonAttribute, type Sequelize } from 'sequelize';
import type { User } from './user.model';

/** A re-encoded JPEG (and its thumbnail) of a plant item or a plant room; the bytes live in PhotoStorage. */
export class Photo extends Model<InferAttributes<Photo>, InferCreationAttributes<Photo>> {
  declare id: CreationOptional<number>;
  declare organisationId: number;
  declare assetId: number | null;
  declare plantRoomId: number | null;
  declare tagId: CreationOptional<number | null>;
  declare storageKey: string;
  declare thumbnailKey: string;
  declare width: number;
  declare height: number;
  declare bytes: number;
  declare caption: string | null;
  declare createdBy: number;
  /** The Idempotency-Key it was sent with, so a repeat from an outbox stores it once. */
  declare idempotencyKey: CreationOptional<string | null>;
  declare createdAt: CreationOptional<Date>;
  declare creator?: NonAttribute<User>;

  static initModel(sequelize: Sequelize) {
    Photo.init(
      {
        id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
        organisationId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        assetId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
        plantRoomId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
        tagId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
        storageKey: { type: DataTypes.STRING(200), allowNull: false },
        thumbnailKey: { type: DataTypes.STRING(200), allowNull: false },
        width: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        height: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        bytes: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        caption: { type: DataTypes.STRING(200), allowNull: true },
        createdBy: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        idempotencyKey: { type: DataTypes.STRING(100), allowNull: true },
        createdAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'photos', underscored: true, updatedAt: false },
    );
  }
}
