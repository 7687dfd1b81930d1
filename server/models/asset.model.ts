import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type NonAttribute, type Sequelize } from 'sequelize';
import type { AssetType, EnergySource } from '@/shared/rules/register';
import type { AssetAttributes } from '@/shared/types/register';
import type { PlantRoom } from './plant-room.model';
import type { Site } from './site.model';
import type { User } from './user.model';

/** A plant item. Never deleted: taken out of service by archiving. */
export class Asset extends Model<InferAttributes<Asset>, InferCreationAttributes<Asset>> {
  declare id: CreationOptional<number>;
  declare organisationId: number;
  declare siteId: number;
  declare plantRoomId: number | null;
  declare plantId: string;
  declare labelCode: string;
  declare name: string;
  declare type: AssetType;
  declare system: string;
  declare energySources: EnergySource[];
  declare manufacturer: string;
  declare model: string;
  declare serialNumber: string;
  declare installDate: string | null;
  declare serviceIntervalMonths: number | null;
  declare lastServiceDate: string | null;
  declare nextServiceDue: string | null;
  declare notes: string;
  declare attributes: AssetAttributes;
  declare archivedAt: CreationOptional<Date | null>;
  declare archivedBy: CreationOptional<number | null>;
  declare createdBy: number;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
  declare site?: NonAttribute<Site>;
  declare plantRoom?: NonAttribute<PlantRoom | null>;
  declare creator?: NonAttribute<User>;

  static initModel(sequelize: Sequelize) {
    const text = (length: number) => ({ type: DataTypes.STRING(length), allowNull: false, defaultValue: '' });
    Asset.init(
      {
        id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
        organisationId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        siteId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        plantRoomId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
        plantId: { type: DataTypes.STRING(32), allowNull: false },
        labelCode: { type: DataTypes.CHAR(12), allowNull: false },
        name: { type: DataTypes.STRING(160), allowNull: false },
        type: { type: DataTypes.STRING(32), allowNull: false },
        system: text(120),
        energySources: { type: DataTypes.JSON, allowNull: false },
        manufacturer: text(120),
        model: text(120),
        serialNumber: text(120),
        installDate: { type: DataTypes.DATEONLY, allowNull: true },
        serviceIntervalMonths: { type: DataTypes.SMALLINT.UNSIGNED, allowNull: true },
        lastServiceDate: { type: DataTypes.DATEONLY, allowNull: true },
        nextServiceDue: { type: DataTypes.DATEONLY, allowNull: true },
        notes: { type: DataTypes.TEXT, allowNull: false },
        attributes: { type: DataTypes.JSON, allowNull: false },
        archivedAt: { type: DataTypes.DATE(3), allowNull: true },
        archivedBy: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
        createdBy: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'assets', underscored: true },
    );
  }
}
