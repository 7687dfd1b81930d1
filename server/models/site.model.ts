import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

export class Site extends Model<InferAttributes<Site>, InferCreationAttributes<Site>> {
  declare id: CreationOptional<number>;
  declare organisationId: number;
  declare name: string;
  declare address: CreationOptional<string>;
  /** IANA zone; "today" for service due dates is the site's local date. */
  declare timeZone: string;
  declare clientContactName: string | null;
  declare clientContactPhone: string | null;
  declare clientContactEmail: string | null;
  declare createdBy: number;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    Site.init(
      {
        id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
        organisationId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        name: { type: DataTypes.STRING(160), allowNull: false },
        address: { type: DataTypes.STRING(400), allowNull: false, defaultValue: '' },
        timeZone: { type: DataTypes.STRING(64), allowNull: false },
        clientContactName: { type: DataTypes.STRING(120), allowNull: true },
        clientContactPhone: { type: DataTypes.STRING(40), allowNull: true },
        clientContactEmail: { type: DataTypes.STRING(254), allowNull: true },
        createdBy: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'sites', underscored: true },
    );
  }
}
