import { DataTypes, Model, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

export type PlaceType = 'site' | 'plant-room';

/** A site or plant room a person opened, kept once per place with the latest time. */
export class RecentPlace extends Model<InferAttributes<RecentPlace>, InferCreationAttributes<RecentPlace>> {
  declare userId: number;
  declare placeType: PlaceType;
  declare placeId: number;
  declare openedAt: Date;

  static initModel(sequelize: Sequelize) {
    RecentPlace.init(
      {
        userId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, primaryKey: true },
        placeType: { type: DataTypes.STRING(12), allowNull: false, primaryKey: true },
        placeId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, primaryKey: true },
        openedAt: { type: DataTypes.DATE(3), allowNull: false },
      },
      { sequelize, tableName: 'recent_places', underscored: true, timestamps: false },
    );
  }
}
