import { DataTypes } from 'sequelize';
import type { Migration } from './index';

const uint = (allowNull = false) => ({ type: DataTypes.INTEGER.UNSIGNED, allowNull });

export const tags: Migration = {
  name: '0004-tags',
  async up({ context: qi }) {
    await qi.createTable('tags', {
      id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
      organisation_id: { ...uint(), references: { model: 'organisations', key: 'id' } },
      asset_id: { ...uint(), references: { model: 'assets', key: 'id' } },
      kind: { type: DataTypes.STRING(20), allowNull: false },
      status: { type: DataTypes.STRING(20), allowNull: false, defaultValue: 'live' },
      reason: { type: DataTypes.TEXT, allowNull: false },
      raised_by_id: { ...uint(), references: { model: 'users', key: 'id' } },
      holder_id: { ...uint(), references: { model: 'users', key: 'id' } },
      raised_at: { type: DataTypes.DATE(3), allowNull: false },
      expires_at: { type: DataTypes.DATE(3), allowNull: false },
      contact_phone: { type: DataTypes.STRING(40), allowNull: false, defaultValue: '' },
      lock_number: { type: DataTypes.STRING(60), allowNull: false, defaultValue: '' },
      energy_sources: { type: DataTypes.JSON, allowNull: false },
      normal_state: { type: DataTypes.STRING(300), allowNull: false, defaultValue: '' },
      left_state: { type: DataTypes.STRING(300), allowNull: false, defaultValue: '' },
      cleared_at: { type: DataTypes.DATE(3), allowNull: true },
      cleared_by_id: { ...uint(true), references: { model: 'users', key: 'id' } },
      clearance: { type: DataTypes.STRING(20), allowNull: true },
      checks: { type: DataTypes.JSON, allowNull: true },
      idempotency_key: { type: DataTypes.STRING(100), allowNull: true },
      created_at: { type: DataTypes.DATE(3), allowNull: false },
      updated_at: { type: DataTypes.DATE(3), allowNull: false },
    });
    // Board and item queries: live tags per organisation ordered by expiry; tags per item.
    await qi.addIndex('tags', ['organisation_id', 'status', 'expires_at']);
    await qi.addIndex('tags', ['asset_id', 'status']);
    await qi.addIndex('tags', ['holder_id', 'status']);
    // A retried raise with the same Idempotency-Key from the same person finds the first tag.
    await qi.addIndex('tags', ['raised_by_id', 'idempotency_key'], { unique: true, name: 'tags_idempotency' });

    await qi.createTable('tag_points', {
      id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
      tag_id: { ...uint(), references: { model: 'tags', key: 'id' } },
      asset_id: { ...uint(true), references: { model: 'assets', key: 'id' } },
      description: { type: DataTypes.STRING(300), allowNull: false, defaultValue: '' },
      method: { type: DataTypes.STRING(30), allowNull: false },
    });
    await qi.addIndex('tag_points', ['asset_id']);

    await qi.createTable('tag_events', {
      id: { type: DataTypes.BIGINT.UNSIGNED, autoIncrement: true, primaryKey: true },
      tag_id: { ...uint(), references: { model: 'tags', key: 'id' } },
      organisation_id: { ...uint(), references: { model: 'organisations', key: 'id' } },
      type: { type: DataTypes.STRING(30), allowNull: false },
      at: { type: DataTypes.DATE(3), allowNull: false },
      by_id: { ...uint(), references: { model: 'users', key: 'id' } },
      data: { type: DataTypes.JSON, allowNull: false },
    });
    await qi.addIndex('tag_events', ['tag_id', 'id']);
    // The history of a tag cannot be rewritten: the database itself refuses edits and deletions.
    for (const op of ['UPDATE', 'DELETE']) {
      await qi.sequelize.query(
        `CREATE TRIGGER tag_events_no_${op.toLowerCase()} BEFORE ${op} ON tag_events FOR EACH ROW
         SIGNAL SQLSTATE '45000' SET MESSAGE_TEXT = 'tag_events is append-only'`,
      );
    }
    // A tag is never deleted either: it is cleared.
    await qi.sequelize.query(
      `CREATE TRIGGER tags_no_delete BEFORE DELETE ON tags FOR EACH ROW
       SIGNAL SQLSTATE '45000' SET MESSAGE_TEXT = 'tags are cleared, never deleted'`,
    );
  },
  async down({ context: qi }) {
    await qi.dropTable('tag_events');
    await qi.dropTable('tag_points');
    await qi.dropTable('tags');
  },
};
