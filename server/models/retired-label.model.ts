import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

/** A label code taken out of use by "replace label". Kept so the code is never issued again and its history stays. */
export class RetiredLabel extends Model<InferAttributes<RetiredLabel>, InferCreationAttributes<RetiredLabel>> {
  declare id: CreationOptional<number>;
  declare organisationId: number;
  declare assetId: number;
  declare code: string;
  declare retiredAt: Date;
  declare retiredBy: number;

  static initModel(sequelize: Sequelize) {
    RetiredLabel.init(
      {
        id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
        organisationId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        assetId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        code: { type: DataTypes.CHAR(12), allowNull: false, unique: true },
        retiredAt: { type: DataTypes.DATE(3), allowNull: false },
        retiredBy: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
      },
      { sequelize, tableName: 'retired_labels', underscored: true, timestamps: false },
    );
  }
}
