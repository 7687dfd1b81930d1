import type { Migration } from './index';

export const BOARD_INDEX = 'tags_live_board';

/**
 * The board's index: live tags of an organisation in expiry order, carrying what the board filters, sorts and
 * counts by (item, kind, holder), so the board reads its page and its counts from the index alone and never
 * touches the cleared tags. `id` is named so the order (expiry, then id) is the board's own tie-break. It replaces
 * (organisation_id, status, expires_at), a prefix of it, which every other query using that one can use instead.
 */
export const boardIndexes: Migration = {
  name: '0016-board-indexes',
  async up({ context: qi }) {
    await qi.addIndex('tags', ['organisation_id', 'status', 'expires_at', 'id', 'asset_id', 'kind', 'holder_id'], { name: BOARD_INDEX });
    await qi.removeIndex('tags', 'tags_organisation_id_status_expires_at');
  },
  async down({ context: qi }) {
    await qi.addIndex('tags', ['organisation_id', 'status', 'expires_at']);
    await qi.removeIndex('tags', BOARD_INDEX);
  },
};
