import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';
import type { IsolationMethod } from '@/shared/rules/tags';

/** Fixed once written (migration 0008 triggers). One isolation point of an isolation tag: another plant item (a valve, an isolator) or a described point. */
export class TagPoint extends Model<InferAttributes<TagPoint>, InferCreationAttributes<TagPoint>> {
  declare id: CreationOptional<number>;
  declare tagId: number;
  declare assetId: number | null;
  declare description: string;
  declare method: IsolationMethod;
  declare lockNumber: CreationOptional<string>;

  static initModel(sequelize: Sequelize) {
    TagPoint.init(
      {
        id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
        tagId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        assetId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
        description: { type: DataTypes.STRING(300), allowNull: false, defaultValue: '' },
        method: { type: DataTypes.STRING(30), allowNull: false },
        lockNumber: { type: DataTypes.STRING(60), allowNull: false, defaultValue: '' },
      },
      { sequelize, tableName: 'tag_points', underscored: true, timestamps: false },
    );
  }
}
