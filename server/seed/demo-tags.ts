import { Op, type Transaction } from 'sequelize';
import { Asset } from '@/server/models/asset.model';
import { Site } from '@/server/models/site.model';
import { Tag } from '@/server/models/tag.model';
import { TagEvent } from '@/server/models/tag-event.model';
import { TagPoint } from '@/server/models/tag-point.model';
import type { User } from '@/server/models/user.model';
import { endOfDayInZone } from '@/shared/rules/time-zone';

const HOUR = 3600_000;

/**
 * A few live tags so the board, the item states and the history have something to show in the demo: an isolation
 * left past its expiry, a fresh override, and a group isolation held by two engineers. Invented scenario.
 */
export async function seedDemoTags(opts: { organisationId: number; engineer: User; engineer2: User; now?: Date; transaction: Transaction }) {
  const { organisationId, engineer, engineer2, transaction } = opts;
  const now = opts.now ?? new Date();
  const site = await Site.findOne({ where: { organisationId, name: { [Op.like]: 'Castellan%' } }, transaction });
  if (!site || (await Tag.count({ where: { organisationId }, transaction }))) return;
  const item = async (plantId: string) => Asset.findOne({ where: { organisationId, siteId: site.id, plantId }, transaction });
  const [boiler, actuator] = await Promise.all([item('B-02'), item('ACT-12')]);

  const raise = async (asset: Asset | null, holder: User, fields: Partial<Tag> & Pick<Tag, 'kind' | 'reason' | 'raisedAt' | 'expiresAt'>, points: { assetId?: number; description?: string; method: TagPoint['method'] }[] = []) => {
    if (!asset) return;
    const tag = await Tag.create(
      {
        organisationId, assetId: asset.id, raisedById: holder.id, holderId: holder.id, contactPhone: holder.phone ?? '', lockNumber: '',
        energySources: [], normalState: '', leftState: '', idempotencyKey: null, ...fields,
      },
      { transaction },
    );
    await TagPoint.bulkCreate(points.map((p) => ({ tagId: tag.id, assetId: p.assetId ?? null, description: p.description ?? '', method: p.method })), { transaction });
    await TagEvent.create({ tagId: tag.id, organisationId, type: 'raised', at: fields.raisedAt, byId: holder.id, data: { reason: fields.reason, expiresAt: fields.expiresAt.toISOString(), kind: fields.kind } }, { transaction });
  };

  const boilerIsolation = {
    kind: 'isolation' as const,
    energySources: ['gas', 'electrical'] as Tag['energySources'],
    expiresAt: new Date(now.getTime() - 5 * HOUR),
    raisedAt: new Date(now.getTime() - 29 * HOUR),
    lockNumber: 'HV-031',
  };
  await raise(boiler, engineer2, { ...boilerIsolation, reason: 'Burner fault lockout: flame sensor replacement, waiting for the part' }, [
    { description: 'Boiler 2 gas isolating valve, behind the boiler', method: 'valve-locked' },
    { description: 'Boiler 2 local isolator on the panel side', method: 'isolator-locked' },
  ]);
  await raise(boiler, engineer, { ...boilerIsolation, lockNumber: 'HV-044', reason: 'Flue inspection alongside the burner repair', raisedAt: new Date(now.getTime() - 27 * HOUR) }, [
    { description: 'Boiler 2 local isolator on the panel side', method: 'isolator-locked' },
  ]);
  await raise(actuator, engineer, {
    kind: 'override',
    reason: 'Actuator on manual while the circuit 1 balancing is checked',
    normalState: 'Auto, 0–10 V from the controls panel',
    leftState: 'Manual, valve V-12 held 60 % open',
    raisedAt: new Date(now.getTime() - 2 * HOUR),
    expiresAt: endOfDayInZone(now, site.timeZone),
  });
}
