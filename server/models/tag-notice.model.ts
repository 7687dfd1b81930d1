import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type NonAttribute, type Sequelize } from 'sequelize';
import type { User } from './user.model';

/**
 * What a holder must be told when their tag was cleared or reassigned in their absence (OSHA 29 CFR
 * 1910.147(e)(3)(iii)). Only acknowledgedAt ever changes, once (migration 0008 trigger).
 */
export class TagNotice extends Model<InferAttributes<TagNotice>, InferCreationAttributes<TagNotice>> {
  declare id: CreationOptional<number>;
  declare tagId: number;
  declare organisationId: number;
  declare userId: number;
  declare kind: 'cleared-in-absence' | 'reassigned-in-absence';
  declare byId: number;
  declare reason: string;
  declare at: Date;
  declare acknowledgedAt: CreationOptional<Date | null>;
  declare by?: NonAttribute<User>;

  static initModel(sequelize: Sequelize) {
    TagNotice.init(
      {
        id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
        tagId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        organisationId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        userId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        kind: { type: DataTypes.STRING(30), allowNull: false },
        byId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        reason: { type: DataTypes.TEXT, allowNull: false },
        at: { type: DataTypes.DATE(3), allowNull: false },
        acknowledgedAt: { type: DataTypes.DATE(3), allowNull: true },
      },
      { sequelize, tableName: 'tag_notices', underscored: true, timestamps: false },
    );
  }
}
