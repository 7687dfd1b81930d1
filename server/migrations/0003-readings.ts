import { DataTypes } from 'sequelize';
import type { Migration } from './index';

const id = { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true };
const ref = (model: string, allowNull = false) => ({ type: DataTypes.INTEGER.UNSIGNED, allowNull, references: { model, key: 'id' } });
// A factory, not a shared object: Sequelize writes each attribute's column name into its definition.
const measured = () => ({ type: DataTypes.DOUBLE, allowNull: true });

/**
 * Heating system design values (per site and system name) and reading sets on plant items.
 * Values are SI: °C, K, Pa gauge, m³/s, m³, m. Reading sets are append-only: a correction is a new
 * row that supersedes the old one, so the original always stays on record.
 */
export const readings: Migration = {
  name: '0003-readings',
  async up({ context: qi }) {
    await qi.createTable('heating_systems', {
      id,
      organisation_id: ref('organisations'),
      site_id: ref('sites'),
      // Matches assets.system on the same site (same collation, so case does not matter).
      name: { type: DataTypes.STRING(120), allowNull: false },
      design_delta_t_k: measured(),
      flow_setpoint_c: measured(),
      fill_pressure_gauge_pa: measured(),
      safety_valve_setting_gauge_pa: measured(),
      system_volume_m3: measured(),
      static_height_m: measured(),
      max_flow_temperature_c: measured(),
      fill_temperature_c: measured(),
      pre_charge_margin_bar: measured(),
      updated_by: ref('users'),
      created_at: { type: DataTypes.DATE(3), allowNull: false },
      updated_at: { type: DataTypes.DATE(3), allowNull: false },
    });
    await qi.addIndex('heating_systems', ['site_id', 'name'], { unique: true, name: 'heating_systems_site_name_unique' });

    await qi.createTable('readings', {
      id,
      asset_id: ref('assets'),
      taken_at: { type: DataTypes.DATE(3), allowNull: false },
      flow_temperature_c: measured(),
      return_temperature_c: measured(),
      flow_setpoint_c: measured(),
      flow_rate_m3_per_s: measured(),
      system_pressure_gauge_pa: measured(),
      pump_inlet_pressure_gauge_pa: measured(),
      pump_outlet_pressure_gauge_pa: measured(),
      surface_temperatures: { type: DataTypes.JSON, allowNull: false },
      note: { type: DataTypes.TEXT, allowNull: false },
      // Computed by the server with shared/calc when the set is stored, with the settings it used.
      results: { type: DataTypes.JSON, allowNull: false },
      flags: { type: DataTypes.JSON, allowNull: false },
      settings_used: { type: DataTypes.JSON, allowNull: false },
      worst_flag: { type: DataTypes.STRING(10), allowNull: true },
      // A set is superseded at most once; a later correction corrects the correction.
      supersedes_id: { ...ref('readings', true), unique: 'readings_supersedes_unique' },
      correction_reason: { type: DataTypes.STRING(500), allowNull: true },
      created_by: ref('users'),
      created_at: { type: DataTypes.DATE(3), allowNull: false },
    });
    await qi.addIndex('readings', ['asset_id', 'taken_at'], { name: 'readings_asset_taken_at' });
    // Reading sets are part of the item's history: the database itself refuses edits and deletions.
    await qi.sequelize.query(
      `CREATE TRIGGER readings_no_update BEFORE UPDATE ON readings FOR EACH ROW
       SIGNAL SQLSTATE '45000' SET MESSAGE_TEXT = 'readings is append-only'`,
    );
    await qi.sequelize.query(
      `CREATE TRIGGER readings_no_delete BEFORE DELETE ON readings FOR EACH ROW
       SIGNAL SQLSTATE '45000' SET MESSAGE_TEXT = 'readings is append-only'`,
    );
  },
  async down({ context: qi }) {
    await qi.dropTable('readings');
    await qi.dropTable('heating_systems');
  },
};
