import { DataTypes, type QueryInterface } from 'sequelize';
import type { Migration } from './index';

const uint = (allowNull = false) => ({ type: DataTypes.INTEGER.UNSIGNED, allowNull });
const ref = (model: string, allowNull = false) => ({ ...uint(allowNull), references: { model, key: 'id' } });
const refuse = (message: string) => `SIGNAL SQLSTATE '45000' SET MESSAGE_TEXT = '${message}'`;

/** Triggers that refuse every change and removal of a table's rows once written. */
async function appendOnly(qi: QueryInterface, table: string, message: string) {
  for (const op of ['UPDATE', 'DELETE']) {
    await qi.sequelize.query(`CREATE TRIGGER ${table}_no_${op.toLowerCase()} BEFORE ${op} ON ${table} FOR EACH ROW ${refuse(message)}`);
  }
}

/**
 * Hand-over offers, omitted energy sources, proofs, per-point lock numbers, notices to an absent holder, periodic
 * procedure reviews and idempotency keys on every tag action; triggers that keep a tag's identity and its
 * isolation points as they were raised (the record is evidence: OSHA 29 CFR 1910.147(c)(5)(ii)(D), (e)(3)).
 */
export const tagRules: Migration = {
  name: '0008-tag-rules',
  async up({ context: qi }) {
    await qi.addColumn('tags', 'omitted_sources', { type: DataTypes.JSON, allowNull: true });
    await qi.addColumn('tags', 'request_hash', { type: DataTypes.CHAR(64), allowNull: true });
    await qi.addColumn('tags', 'offer_to_id', ref('users', true));
    await qi.addColumn('tags', 'offer_note', { type: DataTypes.TEXT, allowNull: true });
    await qi.addColumn('tags', 'offered_at', { type: DataTypes.DATE(3), allowNull: true });
    await qi.addColumn('tags', 'offer_lapses_at', { type: DataTypes.DATE(3), allowNull: true });
    await qi.addColumn('tag_points', 'lock_number', { type: DataTypes.STRING(60), allowNull: false, defaultValue: '' });
    await qi.addColumn('tag_events', 'idempotency_key', { type: DataTypes.STRING(100), allowNull: true });
    await qi.addColumn('tag_events', 'request_hash', { type: DataTypes.CHAR(64), allowNull: true });
    // One Idempotency-Key per person across every tag action: a retry finds the event the first request wrote.
    await qi.addIndex('tag_events', ['by_id', 'idempotency_key'], { unique: true, name: 'tag_events_idempotency' });

    await qi.createTable('tag_proofs', {
      id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
      tag_id: ref('tags'),
      organisation_id: ref('organisations'),
      method: { type: DataTypes.STRING(30), allowNull: false },
      instrument: { type: DataTypes.STRING(120), allowNull: false, defaultValue: '' },
      reading: { type: DataTypes.STRING(60), allowNull: false, defaultValue: '' },
      note: { type: DataTypes.STRING(500), allowNull: false, defaultValue: '' },
      by_id: ref('users'),
      at: { type: DataTypes.DATE(3), allowNull: false },
    });
    await qi.addIndex('tag_proofs', ['tag_id']);

    await qi.createTable('tag_notices', {
      id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
      tag_id: ref('tags'),
      organisation_id: ref('organisations'),
      user_id: ref('users'),
      kind: { type: DataTypes.STRING(30), allowNull: false },
      by_id: ref('users'),
      reason: { type: DataTypes.TEXT, allowNull: false },
      at: { type: DataTypes.DATE(3), allowNull: false },
      acknowledged_at: { type: DataTypes.DATE(3), allowNull: true },
    });
    await qi.addIndex('tag_notices', ['user_id', 'acknowledged_at']);

    await qi.createTable('procedure_reviews', {
      id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
      organisation_id: ref('organisations'),
      site_id: ref('sites'),
      reviewed_on: { type: DataTypes.DATEONLY, allowNull: false },
      reviewer_id: ref('users'),
      observed: { type: DataTypes.JSON, allowNull: false },
      deviations: { type: DataTypes.TEXT, allowNull: false },
      corrections: { type: DataTypes.TEXT, allowNull: false },
      signed_off_at: { type: DataTypes.DATE(3), allowNull: false },
      created_at: { type: DataTypes.DATE(3), allowNull: false },
    });
    await qi.addIndex('procedure_reviews', ['site_id', 'reviewed_on']);

    // A tag's identity is fixed when it is raised, and a cleared tag is final: nothing brings it back to live.
    await qi.sequelize.query(`CREATE TRIGGER tags_identity BEFORE UPDATE ON tags FOR EACH ROW BEGIN
      IF OLD.status = 'cleared' AND NEW.status <> 'cleared' THEN ${refuse('a cleared tag cannot go back to live')}; END IF;
      IF OLD.status = 'cleared' THEN ${refuse('a cleared tag is final')}; END IF;
      IF NEW.status NOT IN ('live', 'cleared') THEN ${refuse('a tag is live or cleared')}; END IF;
      IF NOT (NEW.organisation_id <=> OLD.organisation_id AND NEW.asset_id <=> OLD.asset_id AND NEW.kind <=> OLD.kind
        AND NEW.reason <=> OLD.reason AND NEW.raised_by_id <=> OLD.raised_by_id AND NEW.raised_at <=> OLD.raised_at
        AND NEW.energy_sources <=> OLD.energy_sources AND NEW.omitted_sources <=> OLD.omitted_sources
        AND NEW.idempotency_key <=> OLD.idempotency_key AND NEW.request_hash <=> OLD.request_hash) THEN
        ${refuse("a tag''s identity (item, kind, reason, raised by, raised at, sources) cannot change")};
      END IF;
    END`);
    await appendOnly(qi, 'tag_points', 'isolation points are fixed when the tag is raised');
    await appendOnly(qi, 'tag_proofs', 'proofs are append-only');
    await appendOnly(qi, 'procedure_reviews', 'procedure reviews are append-only');
    // A notice to an absent holder is acknowledged once and otherwise never changes.
    await qi.sequelize.query(`CREATE TRIGGER tag_notices_acknowledge_only BEFORE UPDATE ON tag_notices FOR EACH ROW BEGIN
      IF OLD.acknowledged_at IS NOT NULL OR NEW.acknowledged_at IS NULL OR NOT (NEW.tag_id <=> OLD.tag_id AND NEW.user_id <=> OLD.user_id
        AND NEW.kind <=> OLD.kind AND NEW.by_id <=> OLD.by_id AND NEW.reason <=> OLD.reason AND NEW.at <=> OLD.at AND NEW.organisation_id <=> OLD.organisation_id) THEN
        ${refuse('a notice is only ever acknowledged, once')};
      END IF;
    END`);
    await qi.sequelize.query(`CREATE TRIGGER tag_notices_no_delete BEFORE DELETE ON tag_notices FOR EACH ROW ${refuse('notices are never deleted')}`);
  },
  async down({ context: qi }) {
    for (const trigger of ['tags_identity', 'tag_points_no_update', 'tag_points_no_delete', 'tag_notices_acknowledge_only', 'tag_notices_no_delete']) {
      await qi.sequelize.query(`DROP TRIGGER IF EXISTS ${trigger}`);
    }
    await qi.dropTable('procedure_reviews');
    await qi.dropTable('tag_notices');
    await qi.dropTable('tag_proofs');
    await qi.removeIndex('tag_events', 'tag_events_idempotency');
    for (const c of ['idempotency_key', 'request_hash']) await qi.removeColumn('tag_events', c);
    await qi.removeColumn('tag_points', 'lock_number');
    for (const c of ['omitted_sources', 'request_hash', 'offer_to_id', 'offer_note', 'offered_at', 'offer_lapses_at']) await qi.removeColumn('tags', c);
  },
};
