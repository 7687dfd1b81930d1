import { Op, QueryTypes, type Sequelize } from 'sequelize';
import { clock } from '@/server/lib/clock';
import { notFound, unprocessable } from '@/server/lib/http-error';
import { ensurePermission, type AuthUser } from '@/server/middleware/auth';
import { ProcedureReview } from '@/server/models/procedure-review.model';
import { User } from '@/server/models/user.model';
import { findSite } from '@/server/services/register.lookup';
import { visibleSiteIds } from '@/server/services/site-access.service';
import { rolesWith } from '@/shared/rules/permissions';
import { isReviewOverdue, reviewDueOn } from '@/shared/rules/procedure-review';
import { localDate } from '@/shared/rules/time-zone';
import type { ProcedureReviewInput } from '@/shared/schemas/procedure-reviews';
import type { ReviewOverdueSite } from '@/shared/types/board';
import type { ProcedureReview as ReviewDto, ProcedureReviewList } from '@/shared/types/procedure-reviews';

async function visibleSite(actor: AuthUser, siteId: number) {
  if (!Number.isSafeInteger(siteId)) throw notFound('Site');
  const site = await findSite(actor, siteId);
  const visible = await visibleSiteIds(actor);
  if (visible && !visible.includes(site.id)) throw notFound('Site');
  return site;
}

const toDto = (r: ProcedureReview): ReviewDto => ({
  id: r.id, siteId: r.siteId, reviewedOn: r.reviewedOn, reviewer: { id: r.reviewerId, name: r.reviewer?.name ?? 'Unknown' },
  observed: r.observed, deviations: r.deviations, corrections: r.corrections, signedOffAt: r.signedOffAt.toISOString(),
});

export async function listProcedureReviews(actor: AuthUser, siteId: number): Promise<ProcedureReviewList> {
  const site = await visibleSite(actor, siteId);
  const rows = await ProcedureReview.findAll({ where: { siteId: site.id }, include: [{ model: User, as: 'reviewer' }], order: [['reviewedOn', 'DESC'], ['id', 'DESC']] });
  const last = rows[0]?.reviewedOn ?? null;
  return { items: rows.map(toDto), lastReviewedOn: last, dueOn: reviewDueOn(last), overdue: isReviewOverdue(last, localDate(clock.now(), site.timeZone)) };
}

/** A supervisor or admin records a site's periodic review; the reviewer is not one of the engineers observed. */
export async function createProcedureReview(actor: AuthUser, siteId: number, input: ProcedureReviewInput): Promise<ReviewDto> {
  ensurePermission(actor, 'reviewProcedures', 'Only a supervisor or admin records a procedure review.');
  const site = await visibleSite(actor, siteId);
  const today = localDate(clock.now(), site.timeZone);
  const fields: Record<string, string> = {};
  if (input.reviewedOn > today || Number.isNaN(Date.parse(input.reviewedOn))) fields.reviewedOn = 'Give a real date, today or earlier.';
  const ids = [...new Set(input.observedUserIds)];
  // OSHA 29 CFR 1910.147(c)(6)(i)(A): the inspection is performed by an authorized employee other than the one(s) using the procedure.
  if (ids.includes(actor.id)) fields.observedUserIds = 'The reviewer cannot be one of the engineers observed.';
  const people = await User.findAll({ where: { id: { [Op.in]: ids }, organisationId: actor.organisationId, role: rolesWith('holdTags') }, order: [['name', 'ASC']] });
  if (!fields.observedUserIds && people.length !== ids.length) fields.observedUserIds = 'Choose engineers of your organisation.';
  if (Object.keys(fields).length) throw unprocessable('Some fields need attention.', fields);
  const row = await ProcedureReview.create({
    organisationId: actor.organisationId, siteId: site.id, reviewedOn: input.reviewedOn, reviewerId: actor.id,
    observed: people.map((p) => ({ id: p.id, name: p.name })), deviations: input.deviations, corrections: input.corrections, signedOffAt: clock.now(),
  });
  row.reviewer = (await User.findByPk(actor.id)) ?? undefined;
  return toDto(row);
}

/** Sites (of those given, or all of the organisation) whose periodic review is overdue on their own local date. */
export async function overdueReviews(sequelize: Sequelize, organisationId: number, siteIds: number[] | null, now: Date): Promise<ReviewOverdueSite[]> {
  if (siteIds && !siteIds.length) return [];
  const rows = await sequelize.query<{ siteId: number; siteName: string; timeZone: string; last: string | null }>(
    `SELECT s.id AS siteId, s.name AS siteName, s.time_zone AS timeZone, DATE_FORMAT(MAX(r.reviewed_on), '%Y-%m-%d') AS last
     FROM sites s LEFT JOIN procedure_reviews r ON r.site_id = s.id
     WHERE s.organisation_id = ? ${siteIds ? 'AND s.id IN (?)' : ''} GROUP BY s.id, s.name, s.time_zone ORDER BY s.name, s.id`,
    { replacements: siteIds ? [organisationId, siteIds] : [organisationId], type: QueryTypes.SELECT },
  );
  return rows.filter((r) => isReviewOverdue(r.last, localDate(now, r.timeZone))).map((r) => ({ siteId: r.siteId, siteName: r.siteName, lastReviewedOn: r.last }));
}
