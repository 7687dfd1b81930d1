import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type NonAttribute, type Sequelize } from 'sequelize';
import type { GlycolKind } from '@/shared/calc';
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
  declare glycolKind: GlycolKind | null;
  declare glycolPercent: number | null;
  declare compensationOutsideLowC: number | null;
  declare compensationFlowAtLowC: number | null;
  declare compensationOutsideHighC: number | null;
  declare compensationFlowAtHighC: number | null;
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
        glycolKind: { type: DataTypes.STRING(20), allowNull: true },
        glycolPercent: measured(),
        compensationOutsideLowC: { ...measured(), field: 'compensation_outside_low_c' },
        compensationFlowAtLowC: { ...measured(), field: 'compensation_flow_at_low_c' },
        compensationOutsideHighC: { ...measured(), field: 'compensation_outside_high_c' },
        compensationFlowAtHighC: { ...measured(), field: 'compensation_flow_at_high_c' },
        updatedBy: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'heating_systems', underscored: true },
    );
  }
}
