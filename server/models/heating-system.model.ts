import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type NonAttribute, type Sequelize } from 'sequelize';
import type { User } from './user.model';

/** Design values of one heating system: the assets on a site whose `system` text is this name. SI units. */
export class HeatingSystem extends Model<InferAttributes<HeatingSystem>, InferCreationAttributes<HeatingSystem>> {
  declare id: CreationOptional<number>;
  declare organisationId: number;
  declare siteId: number;
  declare name: string;
  declare designDeltaTK: number | null;
  declare flowSetpointC: number | null;
  declare fillPressureGaugePa: number | null;
  declare safetyValveSettingGaugePa: number | null;
  declare systemVolumeM3: number | null;
  declare staticHeightM: number | null;
  declare maxFlowTemperatureC: number | null;
  declare fillTemperatureC: number | null;
  declare preChargeMarginBar: number | null;
  declare updatedBy: number;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
  declare editor?: NonAttribute<User>;

  static initModel(sequelize: Sequelize) {
    // A factory, not a shared object: Sequelize writes each attribute's column name into its definition.
    const measured = () => ({ type: DataTypes.DOUBLE, allowNull: true });
    HeatingSystem.init(
      {
        id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
        organisationId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        siteId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        name: { type: DataTypes.STRING(120), allowNull: false },
        designDeltaTK: { ...measured(), field: 'design_delta_t_k' },
        flowSetpointC: measured(),
        fillPressureGaugePa: measured(),
        safetyValveSettingGaugePa: measured(),
        systemVolumeM3: { ...measured(), field: 'system_volume_m3' },
        staticHeightM: measured(),
        maxFlowTemperatureC: measured(),
        fillTemperatureC: measured(),
        preChargeMarginBar: measured(),
        updatedBy: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'heating_systems', underscored: true },
    );
  }
}
