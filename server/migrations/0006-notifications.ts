import { DataTypes } from 'sequelize';
import type { Migration } from './index';

const uint = (allowNull = false) => ({ type: DataTypes.INTEGER.UNSIGNED, allowNull });
const ref = (model: string, allowNull = false) => ({ ...uint(allowNull), references: { model, key: 'id' } });
const flag = { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: true };

/** Viewer site access, e-mail settings, one-time password links, the mail outbox and the digest ledger. */
export const notifications: Migration = {
  name: '0006-notifications',
  async up({ context: qi }) {
    await qi.createTable('user_site_access', {
      user_id: { ...ref('users'), primaryKey: true },
      site_id: { ...ref('sites'), primaryKey: true },
      granted_by: ref('users', true),
      created_at: { type: DataTypes.DATE(3), allowNull: false },
    });
    await qi.addIndex('user_site_access', ['site_id']);

    // No row means every e-mail the role can receive is on.
    await qi.createTable('user_notification_settings', {
      user_id: { ...ref('users'), primaryKey: true },
      raised: flag,
      cleared: flag,
      digest: flag,
      my_tags: flag,
      updated_at: { type: DataTypes.DATE(3), allowNull: false },
    });

    // Only a SHA-256 of each token is stored; the token itself exists only in the e-mail.
    await qi.createTable('password_tokens', {
      id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
      user_id: ref('users'),
      purpose: { type: DataTypes.STRING(20), allowNull: false },
      token_hash: { type: DataTypes.CHAR(64), allowNull: false, unique: true },
      expires_at: { type: DataTypes.DATE(3), allowNull: false },
      used_at: { type: DataTypes.DATE(3), allowNull: true },
      created_by: ref('users', true),
      created_at: { type: DataTypes.DATE(3), allowNull: false },
    });
    await qi.addIndex('password_tokens', ['user_id', 'used_at']);

    // Mail is written here in the transaction of the event that causes it and sent later by the outbox worker.
    await qi.createTable('outbox', {
      id: { type: DataTypes.BIGINT.UNSIGNED, autoIncrement: true, primaryKey: true },
      organisation_id: ref('organisations', true),
      kind: { type: DataTypes.STRING(40), allowNull: false },
      to_email: { type: DataTypes.STRING(254), allowNull: false },
      to_user_id: ref('users', true),
      payload: { type: DataTypes.JSON, allowNull: false },
      attempts: { type: DataTypes.SMALLINT.UNSIGNED, allowNull: false, defaultValue: 0 },
      // Attempts the mail server answered with a permanent refusal (5xx), as opposed to being unreachable.
      refusals: { type: DataTypes.SMALLINT.UNSIGNED, allowNull: false, defaultValue: 0 },
      next_attempt_at: { type: DataTypes.DATE(3), allowNull: false },
      claimed_by: { type: DataTypes.STRING(64), allowNull: true },
      claimed_until: { type: DataTypes.DATE(3), allowNull: true },
      last_error: { type: DataTypes.STRING(1000), allowNull: true },
      sent_at: { type: DataTypes.DATE(3), allowNull: true },
      failed_at: { type: DataTypes.DATE(3), allowNull: true },
      created_at: { type: DataTypes.DATE(3), allowNull: false },
    });
    // The worker's claim: unsent, not given up, due now.
    await qi.addIndex('outbox', ['sent_at', 'failed_at', 'next_attempt_at'], { name: 'outbox_pending' });
    await qi.addIndex('outbox', ['claimed_by']);

    // One morning digest per person, site time zone and local date: the unique key makes the run happen once
    // however many server processes try it.
    await qi.createTable('digest_runs', {
      id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
      user_id: ref('users'),
      time_zone: { type: DataTypes.STRING(64), allowNull: false },
      local_date: { type: DataTypes.DATEONLY, allowNull: false },
      tag_count: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, defaultValue: 0 },
      run_by: { type: DataTypes.STRING(64), allowNull: false },
      created_at: { type: DataTypes.DATE(3), allowNull: false },
    });
    await qi.addIndex('digest_runs', ['user_id', 'time_zone', 'local_date'], { unique: true, name: 'digest_runs_once' });
  },
  async down({ context: qi }) {
    await qi.dropTable('digest_runs');
    await qi.dropTable('outbox');
    await qi.dropTable('password_tokens');
    await qi.dropTable('user_notification_settings');
    await qi.dropTable('user_site_access');
  },
};
