import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

/** Which e-mails a person wants; a person without a row gets every e-mail their role can receive. */
export class NotificationSetting extends Model<InferAttributes<NotificationSetting>, InferCreationAttributes<NotificationSetting>> {
  declare userId: number;
  declare raised: boolean;
  declare cleared: boolean;
  declare digest: boolean;
  declare myTags: boolean;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    NotificationSetting.init(
      {
        userId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, primaryKey: true },
        raised: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: true },
        cleared: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: true },
        digest: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: true },
        myTags: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: true },
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'user_notification_settings', underscored: true, createdAt: false },
    );
  }
}
