import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type NonAttribute, type Sequelize } from 'sequelize';
import type { CheckFlagLevel, CheckResult } from '@/shared/calc';
import type { CheckSettings, ReadingFlag, SurfaceTemperature } from '@/shared/types/readings';
import type { Asset } from './asset.model';
import type { User } from './user.model';

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
