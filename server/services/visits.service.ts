import { Op, UniqueConstraintError, type Sequelize, type WhereOptions } from 'sequelize';
import { clock } from '@/server/lib/clock';
import { renderVisitPdf } from '@/server/lib/visit-pdf';
import { HttpError, forbidden, notFound } from '@/server/lib/http-error';
import type { AuthUser } from '@/server/middleware/auth';
import { Site } from '@/server/models/site.model';
import { Tag } from '@/server/models/tag.model';
import { User } from '@/server/models/user.model';
import { Visit } from '@/server/models/visit.model';
import { VisitDecision } from '@/server/models/visit-decision.model';
import { tagInclude, toTagDto } from '@/server/services/tags.dto';
import { enqueueVisitMail } from '@/server/mail/visit-mail';
import { findSite } from '@/server/services/register.lookup';
import { liveTagsIn } from '@/server/services/live-tags.service';
import { activityFor } from '@/server/services/visit-activity.service';
import { carryOutDecisions, checkDecisions } from '@/server/services/visit-decisions.service';
import { may } from '@/shared/rules/permissions';
import type { VisitDecisionAction } from '@/shared/rules/visits';
import type { Tag as TagDto } from '@/shared/types/tags';
import type { EndVisitInput, StartVisitInput, VisitFiltersQuery } from '@/shared/schemas/visits';
import type { ListResponse } from '@/shared/types/api';
import type { Visit as VisitDto, VisitDecision as VisitDecisionDto } from '@/shared/types/visits';
import { listPage, pageRows, type Paging } from '@/shared/rules/paging';

type VisitFilters = Pick<VisitFiltersQuery, 'userId' | 'from' | 'to' | 'open'>;

const include = [{ model: Site, as: 'site' }, { model: User, as: 'user', attributes: ['id', 'name'] }];

function toVisitDto(v: Visit): VisitDto {
  return {
    id: v.id,
    site: { id: v.siteId, name: v.site?.name ?? '', timeZone: v.site?.timeZone ?? 'UTC' },
    person: { id: v.userId, name: v.user?.name ?? 'Unknown' },
    purpose: v.purpose,
    jobReference: v.jobReference,
    startedAt: v.startedAt.toISOString(),
    endedAt: v.endedAt ? v.endedAt.toISOString() : null,
    endNote: v.endNote ?? null,
    inProgress: !v.endedAt,
  };
}

/** Another organisation's visit is a 404; someone else's visit is for supervisors only. */
async function findVisit(actor: AuthUser, id: number): Promise<Visit> {
  const visit = await Visit.findOne({ where: { id, organisationId: actor.organisationId }, include });
  if (!visit) throw notFound('Visit');
  if (visit.userId !== actor.id && !may(actor, 'superviseVisits')) throw forbidden('Only the person who made this visit and supervisors can open it.');
  return visit;
}

export async function startVisit(actor: AuthUser, siteId: number, input: StartVisitInput): Promise<VisitDto> {
  const site = await findSite(actor, siteId);
  const open = await Visit.findOne({ where: { userId: actor.id, endedAt: null }, include });
  if (open) throw new HttpError(409, 'visit-in-progress', `You already have a visit in progress at ${open.site?.name ?? 'another site'}. End it before starting another.`);
  try {
    const visit = await Visit.create({ organisationId: actor.organisationId, siteId: site.id, userId: actor.id, purpose: input.purpose, jobReference: input.jobReference, startedAt: clock.now() });
    return getVisit(actor, visit.id);
  } catch (err) {
    // Two starts at once: the database's one-open-visit index lets one through.
    if (err instanceof UniqueConstraintError) throw new HttpError(409, 'visit-in-progress', 'You already have a visit in progress. End it before starting another.');
    throw err;
  }
}

function decisionDto(tag: TagDto, d: { action: VisitDecisionAction; note: string; expiresAt?: Date | string | null }): VisitDecisionDto {
  return {
    tagId: tag.id, action: d.action, note: d.note, expiresAt: d.expiresAt ? new Date(d.expiresAt).toISOString() : null,
    kind: tag.kind, reason: tag.reason, item: { id: tag.asset.id, plantId: tag.asset.plantId, name: tag.asset.name },
  };
}

async function decisionsOf(visit: Visit): Promise<VisitDecisionDto[]> {
  const rows = await VisitDecision.findAll({ where: { visitId: visit.id }, order: [['id', 'ASC']] });
  const tags = await Tag.findAll({ where: { id: rows.map((r) => r.tagId) }, include: tagInclude });
  return rows.map((r) => decisionDto(toTagDto(tags.find((t) => t.id === r.tagId)!), r));
}

/** A visit with what the person did on the site while it was open, and their end-of-visit decisions. */
export async function getVisit(actor: AuthUser, id: number): Promise<VisitDto> {
  const visit = await findVisit(actor, id);
  const activity = await activityFor({ organisationId: visit.organisationId, siteId: visit.siteId, userId: visit.userId, from: visit.startedAt, to: visit.endedAt });
  return { ...toVisitDto(visit), activity, decisions: await decisionsOf(visit) };
}

/** The signed-in person's visit in progress, if any. */
export async function currentVisit(actor: AuthUser): Promise<VisitDto | null> {
  const visit = await Visit.findOne({ where: { userId: actor.id, organisationId: actor.organisationId, endedAt: null }, include });
  return visit ? toVisitDto(visit) : null;
}

/**
 * Ends a visit. Every live tag the person holds on the site needs a decision — leave (an override only with a
 * note), offer in hand-over, or clear — or the whole request is refused with the undecided tags listed.
 */
export async function endVisit(sequelize: Sequelize, actor: AuthUser, id: number, input: EndVisitInput): Promise<VisitDto> {
  const visit = await findVisit(actor, id);
  if (visit.userId !== actor.id) throw forbidden('Only the person on the visit can end it.');
  if (visit.endedAt) throw new HttpError(409, 'visit-ended', 'This visit has already ended.');
  const held = await liveTagsIn(actor, { siteId: visit.siteId, holderId: actor.id });
  const decisions = checkDecisions(held, input.decisions, actor);
  await carryOutDecisions(sequelize, actor, held, decisions);
  await sequelize.transaction(async (transaction) => {
    const endedAt = clock.now();
    await VisitDecision.bulkCreate(decisions.map((d) => ({ visitId: visit.id, tagId: d.tagId, action: d.action, note: d.note, expiresAt: d.expiresAt ?? null })), { transaction });
    await visit.update({ endedAt, endNote: input.note || null }, { transaction });
    const activity = await activityFor({ organisationId: visit.organisationId, siteId: visit.siteId, userId: visit.userId, from: visit.startedAt, to: endedAt }, transaction);
    const summary = { ...toVisitDto(visit), activity, decisions: decisions.map((d) => decisionDto(held.find((t) => t.id === d.tagId)!, d)) };
    await enqueueVisitMail(visit, summary, actor, transaction);
  });
  return getVisit(actor, id);
}

/** A site's visits: supervisors see everyone's and may filter; an engineer sees their own. */
export async function listSiteVisits(actor: AuthUser, siteId: number, filters: VisitFilters, paging: Paging): Promise<ListResponse<VisitDto>> {
  await findSite(actor, siteId);
  const where: WhereOptions<Visit> = { organisationId: actor.organisationId, siteId };
  const userId = may(actor, 'superviseVisits') ? filters.userId : actor.id;
  if (userId) Object.assign(where, { userId });
  if (filters.from || filters.to) Object.assign(where, { startedAt: { ...(filters.from ? { [Op.gte]: filters.from } : {}), ...(filters.to ? { [Op.lte]: filters.to } : {}) } });
  if (filters.open) Object.assign(where, { endedAt: filters.open === 'true' ? null : { [Op.ne]: null } });
  const { rows, count } = await Visit.findAndCountAll({ where, include, order: [['startedAt', 'DESC'], ['id', 'DESC']], ...pageRows(paging) });
  return listPage(rows.map(toVisitDto), count, paging);
}


export async function visitReportPdf(actor: AuthUser, id: number): Promise<{ pdf: Buffer; fileName: string }> {
  const visit = await getVisit(actor, id);
  const pdf = await renderVisitPdf(visit, clock.now());
  return { pdf, fileName: `isoledger-visit-${visit.id}.pdf` };
}
