import { Op, type Transaction } from 'sequelize';
import type { AuthUser } from '@/server/middleware/auth';
import { Organisation } from '@/server/models/organisation.model';
import { User } from '@/server/models/user.model';
import type { Visit } from '@/server/models/visit.model';
import { enqueueMail, type OutboxMail } from '@/server/mail/outbox';
import { formatInZone, renderBlocks, type Block, type RenderedMail } from '@/server/mail/render';
import { ROLE_PERMISSIONS } from '@/shared/rules/permissions';
import { TAG_EVENT_LABELS } from '@/shared/rules/tags';
import { VISIT_DECISION_LABELS } from '@/shared/rules/visits';
import type { Visit as VisitDto } from '@/shared/types/visits';

const RECORD_ONLY = 'Isoledger is a record only. Anyone working on this plant follows the site isolation procedure and permit system, and proves the plant safe themselves before any work.';

export interface VisitMailPayload {
  visit: VisitDto;
  recipientName: string;
  /** The site's client contact: no links into Isoledger, which they cannot sign in to. */
  forClient: boolean;
}

/**
 * Queues the end-of-visit summary in the transaction that ends the visit: to supervisors and admins, and to the site's client contact when the organisation has turned that on.
 */
export async function enqueueVisitMail(visit: Visit, summary: VisitDto, actor: AuthUser, transaction: Transaction): Promise<void> {
  const sequelize = visit.sequelize;
  const mails: OutboxMail[] = [];
  // Every supervisor and admin: the summary is the record they answer for, so no e-mail setting turns it off.
  const people = await User.findAll({
    where: { organisationId: visit.organisationId, active: true, role: [...ROLE_PERMISSIONS.superviseVisits], passwordHash: { [Op.ne]: null } },
    order: [['id', 'ASC']], transaction,
  });
  for (const p of people) {
    if (p.id === actor.id) continue;
    mails.push({ organisationId: visit.organisationId, kind: 'visit-summary', toEmail: p.email, toUserId: p.id, payload: { visit: summary, recipientName: p.name, forClient: false } });
  }
  const org = await Organisation.findByPk(visit.organisationId, { transaction });
  const client = visit.site?.clientContactEmail;
  if (org?.visitSummaryToClient && client) {
    mails.push({ organisationId: visit.organisationId, kind: 'visit-summary', toEmail: client, toUserId: null, payload: { visit: summary, recipientName: visit.site?.clientContactName || 'Site contact', forClient: true } });
  }
  await enqueueMail(sequelize, mails, transaction);
}

export function renderVisitMail(p: VisitMailPayload, url: (path: string) => string): RenderedMail {
  const v = p.visit;
  const at = (iso: string) => formatInZone(iso, v.site.timeZone);
  const blocks: Block[] = [
    { p: `${p.recipientName}, ${v.person.name} has ended a visit to ${v.site.name}.` },
    { facts: [['Site', v.site.name], ['Engineer', v.person.name], ['Job reference', v.jobReference || '—'], ['Came for', v.purpose], ['Arrived', at(v.startedAt)], ['Left', v.endedAt ? at(v.endedAt) : '—']] },
  ];
  const decisions = v.decisions ?? [];
  blocks.push({ p: decisions.length ? `Live tags they held on leaving (${decisions.length}):` : 'They held no live tags on this site when they left.' });
  for (const d of decisions) {
    blocks.push({ facts: [
      ['Tag', `${d.kind === 'override' ? 'Override' : 'Isolation'} on ${d.item.plantId} ${d.item.name}`],
      ['Reason', d.reason], ['Decision', VISIT_DECISION_LABELS[d.action]], ['Note', d.note || '—'],
      ...(d.expiresAt ? [['New expiry', at(d.expiresAt)] as [string, string]] : []),
    ] });
  }
  const a = v.activity;
  if (a?.tagEvents.length) blocks.push({ p: 'Tag actions during the visit:' }, { facts: a.tagEvents.map((e) => [`${at(e.at)}`, `${TAG_EVENT_LABELS[e.type]}: ${e.kind} on ${e.item.plantId} ${e.item.name} — ${e.text ?? e.reason}`]) });
  if (a?.readings.length) blocks.push({ p: `Readings logged: ${a.readings.length}, of which flagged: ${a.readings.filter((r) => r.flags.length).length}.` });
  if (a?.photos.length) blocks.push({ p: `Photos added: ${a.photos.length}.` });
  if (v.endNote) blocks.push({ facts: [['Note on leaving', v.endNote]] });
  if (!p.forClient) blocks.push({ link: { label: 'Open the visit', url: url(`/visits/${v.id}`) } });
  blocks.push({ caution: RECORD_ONLY });
  return renderBlocks(`Visit ended: ${v.site.name} — ${v.person.name}${decisions.length ? `, ${decisions.length} live tag${decisions.length === 1 ? '' : 's'} left` : ''}`, blocks);
}
