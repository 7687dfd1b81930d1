import { ASSET_TYPES, ASSET_TYPE_LABELS, type AssetType } from '@/shared/rules/register';
import type { AssetListQuery, AssetSort } from '@/shared/schemas/queries';

/** The item list's filters, as `assetListQuery` (shared/schemas/queries.ts) reads them. */
export type AssetListFilters = Pick<AssetListQuery, 'q' | 'siteId' | 'plantRoomId' | 'type' | 'sort' | 'includeArchived'>;

// InnoDB's default full-text stopwords (information_schema.INNODB_FT_DEFAULT_STOPWORD): a required
// stopword (+the*) would match nothing, so they are left out of the full-text query.
const FT_STOPWORDS = new Set('a about an are as at be by com de en for from how i in is it la of on or that the this to was what when where who will with und www'.split(' '));
// innodb_ft_min_token_size defaults to 3: shorter words are not in the full-text index.
const FT_MIN_WORD = 3;

const escapeLike = (s: string) => s.replace(/[\\%_]/g, (c) => `\\${c}`);

/** Types whose key or label has a word starting with every word typed ("fan" → terminal unit, "calor" → water heater). */
function typesMatching(q: string): AssetType[] {
  const words = q.toLowerCase().split(/[^\p{L}\p{N}]+/u).filter(Boolean);
  if (q.length < 3 || !words.length) return [];
  return ASSET_TYPES.filter((t) => {
    const vocabulary = `${t} ${ASSET_TYPE_LABELS[t]}`.toLowerCase().split(/[^\p{L}\p{N}]+/u);
    return words.every((w) => vocabulary.some((v) => v.startsWith(w)));
  });
}

const ORDER: Record<AssetSort, string> = {
  plantId: 'a.plant_id ASC, a.id ASC',
  '-plantId': 'a.plant_id DESC, a.id DESC',
  name: 'a.name ASC, a.id ASC',
  '-name': 'a.name DESC, a.id DESC',
  type: 'a.type ASC, a.plant_id ASC, a.id ASC',
  '-type': 'a.type DESC, a.plant_id ASC, a.id ASC',
  // Items without a service interval come last either way.
  nextServiceDue: 'a.next_service_due IS NULL, a.next_service_due ASC, a.plant_id ASC, a.id ASC',
  '-nextServiceDue': 'a.next_service_due IS NULL, a.next_service_due DESC, a.plant_id ASC, a.id ASC',
};

/**
 * The SQL for one page of the item list. A search is a UNION of small indexed look-ups, each able to use
 * its own index, rather than one WHERE with ORs that would scan the organisation's items:
 *   plant ID, serial, name and system by prefix (B-tree indexes on (organisation_id, column));
 *   words anywhere in name or system by FULLTEXT, each word as a required prefix (`+circ*`);
 *   types whose name matches what was typed (index on (organisation_id, type, plant_id)).
 * The union is materialised once as a derived table, then joined for the filters, order and page.
 */
export function buildAssetListSql(organisationId: number, f: AssetListFilters, paging: { pageSize: number; offset: number }, siteIds: number[] | null = null) {
  const r: Record<string, unknown> = { org: organisationId, limit: paging.pageSize, offset: paging.offset };
  let from = 'assets a';
  if (f.q) {
    r.prefix = `${escapeLike(f.q)}%`;
    const branches = ['plant_id', 'serial_number', 'name', 'system'].map(
      (col) => `SELECT id FROM assets WHERE organisation_id = :org AND ${col} LIKE :prefix`,
    );
    const words = f.q.split(/[^\p{L}\p{N}]+/u).filter(Boolean);
    const long = words.filter((w) => w.length >= FT_MIN_WORD && !FT_STOPWORDS.has(w.toLowerCase()));
    if (long.length) {
      r.ft = long.map((w) => `+${w}*`).join(' ');
      // Short words (a circuit number, say) narrow the full-text hits by substring.
      const short = words.filter((w) => w.length < FT_MIN_WORD && !FT_STOPWORDS.has(w.toLowerCase()));
      const narrow = short.map((w, i) => {
        r[`short${i}`] = `%${escapeLike(w)}%`;
        return ` AND CONCAT_WS(' ', name, system) LIKE :short${i}`;
      });
      branches.push(`SELECT id FROM assets WHERE MATCH(name, system) AGAINST (:ft IN BOOLEAN MODE) AND organisation_id = :org${narrow.join('')}`);
    }
    const types = typesMatching(f.q);
    if (types.length) {
      r.types = types;
      branches.push('SELECT id FROM assets WHERE organisation_id = :org AND type IN (:types)');
    }
    from = `(${branches.join(' UNION ')}) hits JOIN assets a ON a.id = hits.id`;
  }
  const where = ['a.organisation_id = :org'];
  if (!f.includeArchived) where.push('a.archived_at IS NULL');
  // The sites the reader may see (visibleSiteIds in site-access.service): null is every site of the organisation.
  if (siteIds) { where.push(siteIds.length ? 'a.site_id IN (:visibleSites)' : '1 = 0'); r.visibleSites = siteIds; }
  if (f.siteId) { where.push('a.site_id = :siteId'); r.siteId = f.siteId; }
  if (f.plantRoomId) { where.push('a.plant_room_id = :plantRoomId'); r.plantRoomId = f.plantRoomId; }
  if (f.type) { where.push('a.type = :type'); r.type = f.type; }
  const tail = `FROM ${from} WHERE ${where.join(' AND ')}`;
  return {
    idsSql: `SELECT a.id ${tail} ORDER BY ${ORDER[f.sort]} LIMIT :limit OFFSET :offset`,
    countSql: `SELECT COUNT(*) AS total ${tail}`,
    replacements: r,
  };
}
