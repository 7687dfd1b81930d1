import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type NonAttribute, type Sequelize } from 'sequelize';
import type { Site } from './site.model';
import type { User } from './user.model';

export class PlantRoom extends Model<InferAttributes<PlantRoom>, InferCreationAttributes<PlantRoom>> {
  declare id: CreationOptional<number>;
  declare organisationId: number;
  declare siteId: number;
  declare name: string;
  declare floorArea: CreationOptional<string>;
  declare accessNotes: string;
  // Safety-critical locations, as free text written on site.
  declare emergencyStop: CreationOptional<string>;
  declare gasIsolation: CreationOptional<string>;
  declare electricalIsolator: CreationOptional<string>;
  declare firstAid: CreationOptional<string>;
  declare exits: CreationOptional<string>;
  declare createdBy: number;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
  declare site?: NonAttribute<Site>;
  declare creator?: NonAttribute<User>;

  static initModel(sequelize: Sequelize) {
    const text = (length: number) => ({ type: DataTypes.STRING(length), allowNull: false, defaultValue: '' });
    PlantRoom.init(
      {
        id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
        organisationId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        siteId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        name: { type: DataTypes.STRING(120), allowNull: false },
        floorArea: text(120),
        accessNotes: { type: DataTypes.TEXT, allowNull: false },
        emergencyStop: text(400),
        gasIsolation: text(400),
        electricalIsolator: text(400),
        firstAid: text(400),
        exits: text(400),
        createdBy: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'plant_rooms', underscored: true },
    );
  }
}
