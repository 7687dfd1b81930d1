import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type NonAttribute, type Sequelize } from 'sequelize';
import type { Medium } from '@/shared/rules/connections';
import type { Asset } from './asset.model';
import type { User } from './user.model';

/** "from supplies to" in one medium. Never updated: removed and added again (see migration 0010). */
export class Connection extends Model<InferAttributes<Connection>, InferCreationAttributes<Connection>> {
  declare id: CreationOptional<number>;
  declare organisationId: number;
  declare siteId: number;
  declare fromAssetId: number;
  declare toAssetId: number;
  declare medium: Medium;
  declare createdBy: number;
  declare createdAt: CreationOptional<Date>;
  declare fromAsset?: NonAttribute<Asset>;
  declare toAsset?: NonAttribute<Asset>;
  declare creator?: NonAttribute<User>;

  static initModel(sequelize: Sequelize) {
    Connection.init(
      {
        id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
        organisationId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        siteId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        fromAssetId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        toAssetId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        medium: { type: DataTypes.STRING(32), allowNull: false },
        createdBy: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        createdAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'connections', underscored: true, updatedAt: false },
    );
  }
}
