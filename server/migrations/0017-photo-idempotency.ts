import { DataTypes } from 'sequelize';
import type { Migration } from './index';

/** A photo added with no signal is sent again when it returns; its key lets the server store it once. */
export const photoIdempotency: Migration = {
  name: '0017-photo-idempotency',
  async up({ context: qi }) {
    await qi.addColumn('photos', 'idempotency_key', { type: DataTypes.STRING(100), allowNull: true });
    // The same key from the same person finds the first photo; NULLs (photos added without a key) never clash.
    await qi.addIndex('photos', ['created_by', 'idempotency_key'], { unique: true, name: 'photos_idempotency' });
  },
  async down({ context: qi }) {
    await qi.removeIndex('photos', 'photos_idempotency');
    await qi.removeColumn('photos', 'idempotency_key');
  },
};
