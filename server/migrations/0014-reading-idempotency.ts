import { DataTypes } from 'sequelize';
import type { Migration } from './index';

/** A reading set logged with no signal is sent again when it returns; its key lets the server store it once. */
export const readingIdempotency: Migration = {
  name: '0014-reading-idempotency',
  async up({ context: qi }) {
    await qi.addColumn('readings', 'idempotency_key', { type: DataTypes.STRING(100), allowNull: true });
    // The same key from the same person finds the first set; NULLs (sets logged without a key) never clash.
    await qi.addIndex('readings', ['created_by', 'idempotency_key'], { unique: true, name: 'readings_idempotency' });
  },
  async down({ context: qi }) {
    await qi.removeIndex('readings', 'readings_idempotency');
    await qi.removeColumn('readings', 'idempotency_key');
  },
};
