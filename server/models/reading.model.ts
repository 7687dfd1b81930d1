import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type NonAttribute, type Sequelize } from 'sequelize';
import type { CheckFlagLevel, CheckResult, InhibitorResult, WaterAppearance } from '@/shared/calc';
import type { CheckSettings, ReadingFlag, SurfaceTemperature } from '@/shared/types/readings';
import type { Asset } from './asset.model';
import type { User } from './user.model';

// Columns of migration 0009, named outright: underscoring would split "USPerCm" and "O2" its own way.
const VISIT_FIELDS = {
  gaugeHeightM: 'gauge_height_m',
  outsideTemperatureC: 'outside_temperature_c',
  gasStandingPressurePa: 'gas_standing_pressure_pa',
  gasWorkingPressurePa: 'gas_working_pressure_pa',
  burnerPressurePa: 'burner_pressure_pa',
  flueO2Percent: 'flue_o2_percent',
  flueCo2Percent: 'flue_co2_percent',
  flueCoPpm: 'flue_co_ppm',
  flueTemperatureC: 'flue_temperature_c',
  combustionEfficiencyPercent: 'combustion_efficiency_percent',
  storeTemperatureC: 'store_temperature_c',
  hotWaterReturnTemperatureC: 'hot_water_return_temperature_c',
  outletTemperatureC: 'outlet_temperature_c',
  outletRunSeconds: 'outlet_run_seconds',
  waterPh: 'water_ph',
  conductivityUSPerCm: 'conductivity_us_per_cm',
  unitCutInPressureGaugePa: 'unit_cut_in_pressure_gauge_pa',
  unitCutOutPressureGaugePa: 'unit_cut_out_pressure_gauge_pa',
} as const;

const visitColumns = () => ({
  ...Object.fromEntries(Object.entries(VISIT_FIELDS).map(([k, field]) => [k, { type: DataTypes.DOUBLE, allowNull: true, field }])),
  inhibitorResult: { type: DataTypes.STRING(20), allowNull: true, field: 'inhibitor_result' },
  waterAppearance: { type: DataTypes.STRING(20), allowNull: true, field: 'water_appearance' },
}) as unknown as Record<keyof typeof VISIT_FIELDS | 'inhibitorResult' | 'waterAppearance', { type: DataTypes.DataType; allowNull: true; field: string }>;

/** One set of readings on a plant item, in SI. Append-only: corrections are new rows that supersede. */
export class Reading extends Model<InferAttributes<Reading>, InferCreationAttributes<Reading>> {
  declare id: CreationOptional<number>;
  declare assetId: number;
  declare takenAt: Date;
  declare flowTemperatureC: number | null;
  declare returnTemperatureC: number | null;
  declare flowSetpointC: number | null;
  declare flowRateM3PerS: number | null;
  declare systemPressureGaugePa: number | null;
  declare pumpInletPressureGaugePa: number | null;
  declare pumpOutletPressureGaugePa: number | null;
  declare gaugeHeightM: number | null;
  declare outsideTemperatureC: number | null;
  declare gasStandingPressurePa: number | null;
  declare gasWorkingPressurePa: number | null;
  declare burnerPressurePa: number | null;
  declare flueO2Percent: number | null;
  declare flueCo2Percent: number | null;
  declare flueCoPpm: number | null;
  declare flueTemperatureC: number | null;
  declare combustionEfficiencyPercent: number | null;
  declare storeTemperatureC: number | null;
  declare hotWaterReturnTemperatureC: number | null;
  declare outletTemperatureC: number | null;
  declare outletRunSeconds: number | null;
  declare inhibitorResult: InhibitorResult | null;
  declare waterPh: number | null;
  declare conductivityUSPerCm: number | null;
  declare waterAppearance: WaterAppearance | null;
  declare unitCutInPressureGaugePa: number | null;
  declare unitCutOutPressureGaugePa: number | null;
  declare surfaceTemperatures: SurfaceTemperature[];
  declare note: string;
  declare results: CheckResult[];
  declare flags: ReadingFlag[];
  declare settingsUsed: CheckSettings;
  declare worstFlag: CheckFlagLevel | null;
  declare supersedesId: number | null;
  declare correctionReason: string | null;
  declare createdBy: number;
  /** The client's Idempotency-Key, so a set sent twice (an outbox retry) is stored once. */
  declare idempotencyKey: CreationOptional<string | null>;
  declare createdAt: CreationOptional<Date>;
  declare asset?: NonAttribute<Asset>;
  declare creator?: NonAttribute<User>;
  declare correction?: NonAttribute<Reading | null>;

  static initModel(sequelize: Sequelize) {
    // A factory, not a shared object: Sequelize writes each attribute's column name into its definition.
    const measured = () => ({ type: DataTypes.DOUBLE, allowNull: true });
    Reading.init(
      {
        id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
        assetId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        takenAt: { type: DataTypes.DATE(3), allowNull: false },
        flowTemperatureC: measured(),
        returnTemperatureC: measured(),
        flowSetpointC: measured(),
        // Sequelize's underscoring would give flow_rate_m3_per_s for this name, as the migration has it.
        flowRateM3PerS: { ...measured(), field: 'flow_rate_m3_per_s' },
        systemPressureGaugePa: measured(),
        pumpInletPressureGaugePa: measured(),
        pumpOutletPressureGaugePa: measured(),
        ...visitColumns(),
        surfaceTemperatures: { type: DataTypes.JSON, allowNull: false },
        note: { type: DataTypes.TEXT, allowNull: false },
        results: { type: DataTypes.JSON, allowNull: false },
        flags: { type: DataTypes.JSON, allowNull: false },
        settingsUsed: { type: DataTypes.JSON, allowNull: false },
        worstFlag: { type: DataTypes.STRING(10), allowNull: true },
        supersedesId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
        correctionReason: { type: DataTypes.STRING(500), allowNull: true },
        createdBy: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        idempotencyKey: { type: DataTypes.STRING(100), allowNull: true },
        createdAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'readings', underscored: true, updatedAt: false },
    );
  }
}
