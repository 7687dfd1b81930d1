import { DataTypes } from 'sequelize';
import type { Migration } from './index';

const id = { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true };
const timestamps = {
  created_at: { type: DataTypes.DATE(3), allowNull: false },
  updated_at: { type: DataTypes.DATE(3), allowNull: false },
};

export const foundation: Migration = {
  name: '0001-foundation',
  async up({ context: qi }) {
    await qi.createTable('organisations', { id, name: { type: DataTypes.STRING(160), allowNull: false }, ...timestamps });
    await qi.createTable('users', {
      id,
      organisation_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, references: { model: 'organisations', key: 'id' } },
      name: { type: DataTypes.STRING(120), allowNull: false },
      email: { type: DataTypes.STRING(254), allowNull: false, unique: true },
      password_hash: { type: DataTypes.STRING(100), allowNull: true },
      role: { type: DataTypes.STRING(20), allowNull: false },
      active: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: true },
      token_version: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, defaultValue: 0 },
      phone: { type: DataTypes.STRING(40), allowNull: true },
      ...timestamps,
    });
    await qi.addIndex('users', ['organisation_id', 'role']);
    await qi.createTable('audit_events', {
      id: { type: DataTypes.BIGINT.UNSIGNED, autoIncrement: true, primaryKey: true },
      organisation_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
      user_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
      actor_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
      type: { type: DataTypes.STRING(40), allowNull: false },
      detail: { type: DataTypes.JSON, allowNull: true },
      ip: { type: DataTypes.STRING(64), allowNull: true },
      created_at: { type: DataTypes.DATE(3), allowNull: false },
    });
    await qi.addIndex('audit_events', ['organisation_id', 'created_at']);
    // The audit log is append-only: the database itself refuses edits and deletions.
    await qi.sequelize.query(
      `CREATE TRIGGER audit_events_no_update BEFORE UPDATE ON audit_events FOR EACH ROW
       SIGNAL SQLSTATE '45000' SET MESSAGE_TEXT = 'audit_events is append-only'`,
    );
    await qi.sequelize.query(
      `CREATE TRIGGER audit_events_no_delete BEFORE DELETE ON audit_events FOR EACH ROW
       SIGNAL SQLSTATE '45000' SET MESSAGE_TEXT = 'audit_events is append-only'`,
    );
  },
  async down({ context: qi }) {
    await qi.dropTable('audit_events');
    await qi.dropTable('users');
    await qi.dropTable('organisations');
  },
};
