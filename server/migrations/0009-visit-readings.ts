import { DataTypes } from 'sequelize';
import type { Migration } from './index';

// A factory, not a shared object: Sequelize writes each attribute's column name into its definition.
const measured = () => ({ type: DataTypes.DOUBLE, allowNull: true });
const choice = () => ({ type: DataTypes.STRING(20), allowNull: true });

/** New reading columns (SI as before; %, ppm, pH, µS/cm and seconds as the trade reads them) and their bounds. */
const READING_COLUMNS: Record<string, ReturnType<typeof measured> | ReturnType<typeof choice>> = {
  gauge_height_m: measured(),
  outside_temperature_c: measured(),
  gas_standing_pressure_pa: measured(),
  gas_working_pressure_pa: measured(),
  burner_pressure_pa: measured(),
  flue_o2_percent: measured(),
  flue_co2_percent: measured(),
  flue_co_ppm: measured(),
  flue_temperature_c: measured(),
  combustion_efficiency_percent: measured(),
  store_temperature_c: measured(),
  hot_water_return_temperature_c: measured(),
  outlet_temperature_c: measured(),
  outlet_run_seconds: measured(),
  inhibitor_result: choice(),
  water_ph: measured(),
  conductivity_us_per_cm: measured(),
  water_appearance: choice(),
  unit_cut_in_pressure_gauge_pa: measured(),
  unit_cut_out_pressure_gauge_pa: measured(),
};

// The same bounds as shared/schemas/readings.ts: the database refuses a value the API would refuse.
const READING_CHECKS: Record<string, string> = {
  readings_gauge_height: 'gauge_height_m BETWEEN -100 AND 300',
  readings_outside_temperature: 'outside_temperature_c BETWEEN -50 AND 60',
  readings_gas_pressures: 'gas_standing_pressure_pa BETWEEN 0 AND 1000000 AND gas_working_pressure_pa BETWEEN 0 AND 1000000 AND burner_pressure_pa BETWEEN 0 AND 1000000',
  readings_flue_o2: 'flue_o2_percent BETWEEN 0 AND 21',
  readings_flue_co2: 'flue_co2_percent BETWEEN 0 AND 20',
  readings_flue_co: 'flue_co_ppm BETWEEN 0 AND 20000',
  readings_flue_temperature: 'flue_temperature_c BETWEEN -20 AND 600',
  readings_efficiency: 'combustion_efficiency_percent BETWEEN 0 AND 120',
  readings_hot_water: 'store_temperature_c BETWEEN 0 AND 100 AND hot_water_return_temperature_c BETWEEN 0 AND 100 AND outlet_temperature_c BETWEEN 0 AND 100',
  readings_outlet_run: 'outlet_run_seconds BETWEEN 0 AND 3600',
  readings_inhibitor: "inhibitor_result IN ('in-range', 'low', 'none', 'high')",
  readings_ph: 'water_ph BETWEEN 0 AND 14',
  readings_conductivity: 'conductivity_us_per_cm BETWEEN 0 AND 100000',
  readings_appearance: "water_appearance IN ('clear', 'cloudy', 'discoloured', 'dirty')",
  readings_unit_pressures: 'unit_cut_in_pressure_gauge_pa BETWEEN 0 AND 2500000 AND unit_cut_out_pressure_gauge_pa BETWEEN 0 AND 2500000',
  readings_worst_flag: "worst_flag IN ('info', 'caution', 'danger')",
};

const SYSTEM_COLUMNS = {
  glycol_kind: { type: DataTypes.STRING(20), allowNull: true },
  glycol_percent: measured(),
  compensation_outside_low_c: measured(),
  compensation_flow_at_low_c: measured(),
  compensation_outside_high_c: measured(),
  compensation_flow_at_high_c: measured(),
};

const SYSTEM_CHECKS: Record<string, string> = {
  heating_systems_glycol: "glycol_kind IN ('propylene', 'ethylene') AND glycol_percent BETWEEN 0 AND 60",
  heating_systems_glycol_pair: '(glycol_kind IS NULL) = (glycol_percent IS NULL)',
  heating_systems_curve_order: 'compensation_outside_high_c > compensation_outside_low_c',
};

/**
 * Readings for the whole visit (gas and flue gas, hot water, water treatment, the pressurisation unit,
 * gauge height and outside temperature) and the system's glycol fill and weather-compensation curve.
 * A NULL passes a CHECK, so every bound applies only to values that were read.
 */
export const visitReadings: Migration = {
  name: '0009-visit-readings',
  async up({ context: qi }) {
    for (const [column, spec] of Object.entries(READING_COLUMNS)) await qi.addColumn('readings', column, spec);
    for (const [column, spec] of Object.entries(SYSTEM_COLUMNS)) await qi.addColumn('heating_systems', column, spec);
    for (const [name, check] of Object.entries(READING_CHECKS)) await qi.sequelize.query(`ALTER TABLE readings ADD CONSTRAINT ${name} CHECK (${check})`);
    for (const [name, check] of Object.entries(SYSTEM_CHECKS)) await qi.sequelize.query(`ALTER TABLE heating_systems ADD CONSTRAINT ${name} CHECK (${check})`);
    // The site's list of latest flags reads the newest sets of many items at once.
    await qi.addIndex('readings', ['asset_id', 'worst_flag', 'taken_at'], { name: 'readings_asset_flag_taken_at' });
  },
  async down({ context: qi }) {
    await qi.removeIndex('readings', 'readings_asset_flag_taken_at');
    for (const name of Object.keys(SYSTEM_CHECKS)) await qi.sequelize.query(`ALTER TABLE heating_systems DROP CONSTRAINT ${name}`);
    for (const name of Object.keys(READING_CHECKS)) await qi.sequelize.query(`ALTER TABLE readings DROP CONSTRAINT ${name}`);
    for (const column of Object.keys(SYSTEM_COLUMNS)) await qi.removeColumn('heating_systems', column);
    for (const column of Object.keys(READING_COLUMNS)) await qi.removeColumn('readings', column);
  },
};
