import { Op, type Transaction } from 'sequelize';
import { Asset } from '@/server/models/asset.model';
import { ProcedureReview } from '@/server/models/procedure-review.model';
import { Site } from '@/server/models/site.model';
import { Tag } from '@/server/models/tag.model';
import { TagEvent } from '@/server/models/tag-event.model';
import { TagPoint } from '@/server/models/tag-point.model';
import { TagProof } from '@/server/models/tag-proof.model';
import type { User } from '@/server/models/user.model';
import { addMonths } from '@/shared/rules/register';
import type { ProofMethod } from '@/shared/rules/tag-isolation';
import { endOfDayInZone, localDate } from '@/shared/rules/time-zone';

const HOUR = 3600_000;
type Point = { assetId?: number; description?: string; method: TagPoint['method']; lockNumber?: string };
type Proof = { method: ProofMethod; instrument: string; reading: string };

/**
 * A few live tags so the board, the item states and the history have something to show in the demo, done as good
 * practice: a group isolation in which each engineer puts their own padlock on every point (one point is the
 * register's gas valve V-02, so that item shows it is holding an isolation), every source accounted for and each
 * isolation proved; and an override left for the day. Invented scenario; lock numbers are padlock numbers, not
 * plant or switchgear references.
 */
export async function seedDemoTags(opts: { organisationId: number; engineer: User; engineer2: User; supervisor?: User; now?: Date; transaction: Transaction }) {
  const { organisationId, engineer, engineer2, transaction } = opts;
  const now = opts.now ?? new Date();
  const site = await Site.findOne({ where: { organisationId, name: { [Op.like]: 'Castellan%' } }, transaction });
  if (!site || (await Tag.count({ where: { organisationId }, transaction }))) return;
  const item = async (plantId: string) => Asset.findOne({ where: { organisationId, siteId: site.id, plantId }, transaction });
  const [boiler, actuator, gasValve] = await Promise.all([item('B-02'), item('ACT-12'), item('V-02')]);

  const raise = async (asset: Asset | null, holder: User, fields: Partial<Tag> & Pick<Tag, 'kind' | 'reason' | 'raisedAt' | 'expiresAt'>, points: Point[] = [], proof?: Proof) => {
    if (!asset) return;
    const tag = await Tag.create(
      {
        organisationId, assetId: asset.id, raisedById: holder.id, holderId: holder.id, contactPhone: holder.phone ?? '', lockNumber: '',
        energySources: [], omittedSources: [], normalState: '', leftState: '', idempotencyKey: null, requestHash: null, ...fields,
      },
      { transaction },
    );
    await TagPoint.bulkCreate(points.map((p) => ({ tagId: tag.id, assetId: p.assetId ?? null, description: p.description ?? '', method: p.method, lockNumber: p.lockNumber ?? '' })), { transaction });
    await TagEvent.create({ tagId: tag.id, organisationId, type: 'raised', at: fields.raisedAt, byId: holder.id, data: { reason: fields.reason, expiresAt: fields.expiresAt.toISOString(), kind: fields.kind } }, { transaction });
    if (proof) {
      const at = new Date(fields.raisedAt.getTime() + 10 * 60_000);
      const row = await TagProof.create({ tagId: tag.id, organisationId, ...proof, note: '', byId: holder.id, at }, { transaction });
      await TagEvent.create({ tagId: tag.id, organisationId, type: 'proved', at, byId: holder.id, data: { proofId: row.id, ...proof, note: '' } }, { transaction });
    }
  };

  // Group isolation (OSHA 29 CFR 1910.147(f)(3)): each engineer has a tag of their own and a padlock on every point.
  const groupPoints = (padlock: string): Point[] => [
    gasValve ? { assetId: gasValve.id, method: 'valve-locked', lockNumber: padlock } : { description: 'Boiler 2 gas isolating valve, behind the boiler', method: 'valve-locked', lockNumber: padlock },
    { description: 'Boiler 2 local isolator on the panel side', method: 'isolator-locked', lockNumber: padlock },
  ];
  const boilerIsolation = {
    kind: 'isolation' as const,
    energySources: ['gas', 'electrical'] as Tag['energySources'],
    omittedSources: [{ source: 'hot-water' as const, reason: 'Boiler off and cold; flow and return valves shut, no work on the waterways' }],
    expiresAt: new Date(now.getTime() - 5 * HOUR),
    raisedAt: new Date(now.getTime() - 29 * HOUR),
  };
  const proved: Proof = { method: 'absence-of-voltage', instrument: 'Two-pole tester, proved on a proving unit before and after', reading: '0 V at the burner terminals' };
  await raise(boiler, engineer2, { ...boilerIsolation, lockNumber: 'Padlock 31', reason: 'Burner fault: flame failure probe replacement, waiting for the part' }, groupPoints('Padlock 31'), proved);
  await raise(boiler, engineer, { ...boilerIsolation, lockNumber: 'Padlock 44', reason: 'Flue inspection alongside the burner repair', raisedAt: new Date(now.getTime() - 27 * HOUR) }, groupPoints('Padlock 44'), {
    method: 'try-start', instrument: '', reading: 'Boiler called for heat from the panel: no fan, no ignition',
  });
  await raise(actuator, engineer, {
    kind: 'override',
    reason: 'Actuator on manual while the circuit 1 balancing is checked',
    normalState: 'Auto, 0–10 V from the controls panel',
    leftState: 'Manual, valve V-12 held 60 % open',
    raisedAt: new Date(now.getTime() - 2 * HOUR),
    expiresAt: endOfDayInZone(now, site.timeZone),
  });

  // Periodic procedure reviews (OSHA 29 CFR 1910.147(c)(6)): recent at the other sites; Castellan's is 14 months old, so overdue.
  if (!opts.supervisor) return;
  const today = localDate(now, site.timeZone);
  const sites = await Site.findAll({ where: { organisationId }, transaction });
  for (const s of sites) {
    const reviewedOn = addMonths(today, s.id === site.id ? -14 : -3);
    await ProcedureReview.create({
      organisationId, siteId: s.id, reviewedOn, reviewerId: opts.supervisor.id,
      observed: [{ id: engineer.id, name: engineer.name }, { id: engineer2.id, name: engineer2.name }],
      deviations: s.id === site.id ? 'Try-start not done after locking off pump P-02A' : 'None found',
      corrections: s.id === site.id ? 'Engineer briefed on site; try-start added to the plant-room isolation card' : 'None needed',
      signedOffAt: new Date(`${reviewedOn}T16:00:00Z`),
    }, { transaction });
  }
}
