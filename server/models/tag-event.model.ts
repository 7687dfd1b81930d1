import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type NonAttribute, type Sequelize } from 'sequelize';
import type { TagEventType } from '@/shared/rules/tags';
import type { User } from './user.model';

/** Append-only: the database refuses UPDATE and DELETE on tag_events (see migration 0004). */
export class TagEvent extends Model<InferAttributes<TagEvent>, InferCreationAttributes<TagEvent>> {
  declare id: CreationOptional<number>;
  declare tagId: number;
  declare organisationId: number;
  declare type: TagEventType;
  declare at: Date;
  declare byId: number;
  declare data: Record<string, unknown>;
  /** The Idempotency-Key the action came with, and a fingerprint of its request; unique per person. */
  declare idempotencyKey: CreationOptional<string | null>;
  declare requestHash: CreationOptional<string | null>;
  declare by?: NonAttribute<User>;

  static initModel(sequelize: Sequelize) {
    TagEvent.init(
      {
        id: { type: DataTypes.BIGINT.UNSIGNED, autoIncrement: true, primaryKey: true },
        tagId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        organisationId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        type: { type: DataTypes.STRING(30), allowNull: false },
        at: { type: DataTypes.DATE(3), allowNull: false },
        byId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        data: { type: DataTypes.JSON, allowNull: false },
        idempotencyKey: { type: DataTypes.STRING(100), allowNull: true },
        requestHash: { type: DataTypes.CHAR(64), allowNull: true },
      },
      { sequelize, tableName: 'tag_events', underscored: true, timestamps: false },
    );
  }
}
