import { DataTypes } from 'sequelize';
import type { Migration } from './index';

const id = { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true };
const ref = (model: string, allowNull = false) => ({ type: DataTypes.INTEGER.UNSIGNED, allowNull, references: { model, key: 'id' } });
const text = (length: number) => ({ type: DataTypes.STRING(length), allowNull: false, defaultValue: '' });
const timestamps = {
  created_at: { type: DataTypes.DATE(3), allowNull: false },
  updated_at: { type: DataTypes.DATE(3), allowNull: false },
};

/** Sites → plant rooms → plant items (assets), and photos of rooms and items. */
export const register: Migration = {
  name: '0002-register',
  async up({ context: qi }) {
    await qi.createTable('sites', {
      id,
      organisation_id: ref('organisations'),
      name: { type: DataTypes.STRING(160), allowNull: false },
      address: text(400),
      time_zone: { type: DataTypes.STRING(64), allowNull: false },
      client_contact_name: { type: DataTypes.STRING(120), allowNull: true },
      client_contact_phone: { type: DataTypes.STRING(40), allowNull: true },
      client_contact_email: { type: DataTypes.STRING(254), allowNull: true },
      created_by: ref('users'),
      ...timestamps,
    });
    // Imports name sites, so a name must mean one site within an organisation.
    await qi.addIndex('sites', ['organisation_id', 'name'], { unique: true, name: 'sites_organisation_name_unique' });

    await qi.createTable('plant_rooms', {
      id,
      organisation_id: ref('organisations'),
      site_id: ref('sites'),
      name: { type: DataTypes.STRING(120), allowNull: false },
      floor_area: text(120),
      access_notes: { type: DataTypes.TEXT, allowNull: false },
      emergency_stop: text(400),
      gas_isolation: text(400),
      electrical_isolator: text(400),
      first_aid: text(400),
      exits: text(400),
      created_by: ref('users'),
      ...timestamps,
    });
    await qi.addIndex('plant_rooms', ['site_id', 'name'], { unique: true, name: 'plant_rooms_site_name_unique' });
    await qi.addIndex('plant_rooms', ['organisation_id']);

    await qi.createTable('assets', {
      id,
      organisation_id: ref('organisations'),
      site_id: ref('sites'),
      plant_room_id: ref('plant_rooms', true),
      plant_id: { type: DataTypes.STRING(32), allowNull: false },
      label_code: { type: DataTypes.CHAR(12), allowNull: false },
      name: { type: DataTypes.STRING(160), allowNull: false },
      type: { type: DataTypes.STRING(32), allowNull: false },
      system: text(120),
      energy_sources: { type: DataTypes.JSON, allowNull: false },
      manufacturer: text(120),
      model: text(120),
      serial_number: text(120),
      install_date: { type: DataTypes.DATEONLY, allowNull: true },
      service_interval_months: { type: DataTypes.SMALLINT.UNSIGNED, allowNull: true },
      last_service_date: { type: DataTypes.DATEONLY, allowNull: true },
      // Derived from the two above on every write (shared/rules/register.ts) so lists can sort and filter on it.
      next_service_due: { type: DataTypes.DATEONLY, allowNull: true },
      notes: { type: DataTypes.TEXT, allowNull: false },
      attributes: { type: DataTypes.JSON, allowNull: false },
      archived_at: { type: DataTypes.DATE(3), allowNull: true },
      archived_by: ref('users', true),
      created_by: ref('users'),
      ...timestamps,
    });
    await qi.addIndex('assets', ['site_id', 'plant_id'], { unique: true, name: 'assets_site_plant_id_unique' });
    await qi.addIndex('assets', ['label_code'], { unique: true, name: 'assets_label_code_unique' });
    // Search and list indexes: prefix search on plant ID, serial, name and system, default sort by plant ID,
    // filter by type or plant room, sort by next service due; FULLTEXT for words in name and system.
    await qi.addIndex('assets', ['organisation_id', 'plant_id'], { name: 'assets_org_plant_id' });
    await qi.addIndex('assets', ['organisation_id', 'serial_number'], { name: 'assets_org_serial' });
    await qi.addIndex('assets', ['organisation_id', 'name'], { name: 'assets_org_name' });
    await qi.addIndex('assets', ['organisation_id', 'system'], { name: 'assets_org_system' });
    await qi.addIndex('assets', ['organisation_id', 'type', 'plant_id'], { name: 'assets_org_type_plant_id' });
    await qi.addIndex('assets', ['organisation_id', 'next_service_due'], { name: 'assets_org_next_service_due' });
    await qi.addIndex('assets', ['plant_room_id', 'plant_id'], { name: 'assets_room_plant_id' });
    await qi.addIndex('assets', ['name', 'system'], { type: 'FULLTEXT', name: 'assets_name_system_fulltext' });

    await qi.createTable('photos', {
      id,
      organisation_id: ref('organisations'),
      asset_id: ref('assets', true),
      plant_room_id: ref('plant_rooms', true),
      storage_key: { type: DataTypes.STRING(200), allowNull: false },
      thumbnail_key: { type: DataTypes.STRING(200), allowNull: false },
      width: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
      height: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
      bytes: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
      caption: { type: DataTypes.STRING(200), allowNull: true },
      created_by: ref('users'),
      created_at: { type: DataTypes.DATE(3), allowNull: false },
    });
    await qi.addIndex('photos', ['asset_id', 'id'], { name: 'photos_asset' });
    await qi.addIndex('photos', ['plant_room_id', 'id'], { name: 'photos_plant_room' });
    await qi.addIndex('photos', ['organisation_id'], { name: 'photos_organisation' });
    // A photo belongs to exactly one thing: a plant item or a plant room.
    await qi.sequelize.query('ALTER TABLE photos ADD CONSTRAINT photos_one_owner CHECK ((asset_id IS NULL) <> (plant_room_id IS NULL))');
  },
  async down({ context: qi }) {
    await qi.dropTable('photos');
    await qi.dropTable('assets');
    await qi.dropTable('plant_rooms');
    await qi.dropTable('sites');
  },
};
