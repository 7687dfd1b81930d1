import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

/** A site a viewer may see. Other roles see every site of their organisation and have no rows here. */
export class UserSiteAccess extends Model<InferAttributes<UserSiteAccess>, InferCreationAttributes<UserSiteAccess>> {
  declare userId: number;
  declare siteId: number;
  declare grantedBy: number | null;
  declare createdAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    UserSiteAccess.init(
      {
        userId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, primaryKey: true },
        siteId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, primaryKey: true },
        grantedBy: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
        createdAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'user_site_access', underscored: true, updatedAt: false },
    );
  }
}
