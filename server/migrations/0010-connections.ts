import { DataTypes } from 'sequelize';
import { MEDIA } from '@/shared/rules/connections';
import type { Migration } from './index';

const ref = (model: string) => ({ type: DataTypes.INTEGER.UNSIGNED, allowNull: false, references: { model, key: 'id' } });

/** Connections between plant items: "from supplies to" in one medium, always within one site. */
export const connections: Migration = {
  name: '0010-connections',
  async up({ context: qi }) {
    await qi.createTable('connections', {
      id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
      organisation_id: ref('organisations'),
      site_id: ref('sites'),
      from_asset_id: ref('assets'),
      to_asset_id: ref('assets'),
      medium: { type: DataTypes.STRING(32), allowNull: false },
      created_by: ref('users'),
      created_at: { type: DataTypes.DATE(3), allowNull: false },
    });
    await qi.addIndex('connections', ['from_asset_id', 'to_asset_id', 'medium'], { unique: true, name: 'connections_unique_link' });
    await qi.addIndex('connections', ['to_asset_id']);
    await qi.addIndex('connections', ['organisation_id', 'site_id']);
    const media = MEDIA.map((m) => `'${m}'`).join(', ');
    await qi.sequelize.query(`ALTER TABLE connections ADD CONSTRAINT connections_not_to_itself CHECK (from_asset_id <> to_asset_id)`);
    await qi.sequelize.query(`ALTER TABLE connections ADD CONSTRAINT connections_known_medium CHECK (medium IN (${media}))`);
    // Both ends on the connection's own site and organisation, whatever the code above the database does.
    await qi.sequelize.query(
      `CREATE TRIGGER connections_one_site BEFORE INSERT ON connections FOR EACH ROW
       IF (SELECT COUNT(*) FROM assets WHERE id IN (NEW.from_asset_id, NEW.to_asset_id)
             AND site_id = NEW.site_id AND organisation_id = NEW.organisation_id) <> 2 THEN
         SIGNAL SQLSTATE '45000' SET MESSAGE_TEXT = 'a connection joins two items of its own site';
       END IF`,
    );
    // A link is removed and added again, never changed in place.
    await qi.sequelize.query(
      `CREATE TRIGGER connections_no_update BEFORE UPDATE ON connections FOR EACH ROW
       SIGNAL SQLSTATE '45000' SET MESSAGE_TEXT = 'connections are not updated; delete and add'`,
    );
    // An item keeps its site while it has connections: moving it would leave links between sites.
    await qi.sequelize.query(
      `CREATE TRIGGER assets_connected_keep_site BEFORE UPDATE ON assets FOR EACH ROW
       IF NEW.site_id <> OLD.site_id AND EXISTS (SELECT 1 FROM connections WHERE from_asset_id = OLD.id OR to_asset_id = OLD.id) THEN
         SIGNAL SQLSTATE '45000' SET MESSAGE_TEXT = 'remove the connections of an item before moving it to another site';
       END IF`,
    );
  },
  async down({ context: qi }) {
    await qi.sequelize.query('DROP TRIGGER IF EXISTS assets_connected_keep_site');
    await qi.dropTable('connections');
  },
};
