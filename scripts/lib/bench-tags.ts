import { Asset } from '@/server/models/asset.model';
import { Tag } from '@/server/models/tag.model';
import { User } from '@/server/models/user.model';

/** Adds `live` live and `cleared` cleared tags over the organisation's items, in batches of a thousand. */
export async function seedBenchTags(organisationId: number, live: number, cleared: number) {
  const assets = await Asset.findAll({ where: { organisationId } });
  const people = await User.findAll({ where: { organisationId } });
  const holders = people.filter((p) => p.role !== 'viewer');
  const now = Date.now();
  const hour = 3600_000;
  const make = (i: number, status: 'live' | 'cleared') => {
    const holder = holders[i % holders.length];
    // Expiries spread from two days ago to ten days ahead, so every board state is well represented.
    const expiresAt = new Date(now + ((i * 7919) % (12 * 24) - 48) * hour);
    return {
      organisationId, assetId: assets[i % assets.length].id, kind: i % 3 === 0 ? 'override' as const : 'isolation' as const, status,
      reason: `Bench tag ${i}: ${i % 2 ? 'seal replacement on the flow side' : 'controls fault finding'}`, raisedById: holder.id, holderId: holder.id,
      raisedAt: new Date(expiresAt.getTime() - 30 * hour), expiresAt, contactPhone: '+44 7700 900199', lockNumber: `L-${i}`,
      energySources: [], normalState: '', leftState: '', idempotencyKey: null,
      ...(status === 'cleared' ? { clearedAt: new Date(now - hour), clearedById: holder.id, clearance: 'normal' as const } : {}),
    };
  };
  for (let i = 0; i < live + cleared; i += 1000) {
    const rows = Array.from({ length: Math.min(1000, live + cleared - i) }, (_, k) => make(i + k, i + k < live ? 'live' : 'cleared'));
    await Tag.bulkCreate(rows);
  }
  return { assets: assets.length, sites: new Set(assets.map((a) => a.siteId)).size };
}
