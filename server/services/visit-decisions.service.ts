/** The end of a visit: each live tag the person holds on the site needs a decision (clear, extend, hand over, leave with a note), checked and carried out here. */
import type { Sequelize } from 'sequelize';
import { clock } from '@/server/lib/clock';
import { HttpError } from '@/server/lib/http-error';
import type { AuthUser } from '@/server/middleware/auth';
import { addTagNote, clearTag, extendTag } from '@/server/services/tag-actions.service';
import { offerHandover } from '@/server/services/tag-handover.service';
import { MIN_CLEARANCE_REASON, RELEASE_CHECKS, expiryProblem } from '@/shared/rules/tags';
import { decisionProblem } from '@/shared/rules/visits';
import type { VisitDecisionInput } from '@/shared/schemas/visits';
import type { Tag as TagDto } from '@/shared/types/tags';

const label = (t: TagDto) => `${t.kind === 'override' ? 'Override' : 'Isolation'} on ${t.asset.plantId} ${t.asset.name}`;

/**
 * Every live tag held needs exactly one decision, each decision must stand on its own, and none may name a tag
 * the person does not hold here. Otherwise a 422 whose fields name each tag (`tags.<id>`) and what is missing.
 */
export function checkDecisions(held: TagDto[], decisions: VisitDecisionInput[], actor: AuthUser): VisitDecisionInput[] {
  const fields: Record<string, string> = {};
  const byTag = new Map(decisions.map((d) => [d.tagId, d]));
  const heldIds = new Set(held.map((t) => t.id));
  const undecided = held.filter((t) => !byTag.has(t.id));
  for (const t of undecided) fields[`tags.${t.id}`] = `${label(t)}: no decision yet. Leave it with a note, offer it in hand-over or clear it.`;
  for (const d of decisions) {
    const tag = held.find((t) => t.id === d.tagId);
    if (!heldIds.has(d.tagId) || !tag) {
      fields[`tags.${d.tagId}`] = 'You do not hold a live tag with this number on this site.';
      continue;
    }
    const problem = decisionProblem(tag.kind, d.action, d.note, MIN_CLEARANCE_REASON);
    if (problem) fields[`tags.${d.tagId}`] = `${label(tag)}: ${problem}`;
    else if (d.action === 'clear' && tag.kind === 'isolation' && RELEASE_CHECKS.some((k) => !d.checks?.[k])) {
      fields[`tags.${d.tagId}`] = `${label(tag)}: confirm every release check before clearing an isolation.`;
    } else if (d.action === 'handover' && !d.toUserId) {
      // OSHA 29 CFR 1910.147(f)(4): a hand-over is to a named on-coming person, who accepts it on site.
      fields[`tags.${d.tagId}`] = `${label(tag)}: name the colleague you offer it to.`;
    } else if (d.action === 'leave' && d.expiresAt) {
      const expiry = expiryProblem(new Date(d.expiresAt), clock.now(), actor.role);
      if (expiry) fields[`tags.${d.tagId}`] = `${label(tag)}: ${expiry}`;
    }
  }
  if (Object.keys(fields).length) {
    const message = undecided.length
      ? `Before you end the visit, decide what happens to ${undecided.length === 1 ? 'this live tag' : `these ${undecided.length} live tags`} you hold here: ${undecided.map(label).join('; ')}.`
      : 'Some decisions need attention.';
    throw new HttpError(422, undecided.length ? 'undecided-tags' : 'invalid', message, fields);
  }
  return decisions;
}

/** Carries out each decision through the tag's own actions, so each lands in the tag's history as usual. */
export async function carryOutDecisions(sequelize: Sequelize, actor: AuthUser, held: TagDto[], decisions: VisitDecisionInput[]): Promise<void> {
  for (const d of decisions) {
    const tag = held.find((t) => t.id === d.tagId)!;
    if (d.action === 'clear') {
      await clearTag(sequelize, actor, tag.id, { reason: d.note, checks: { workComplete: false, guardsRefitted: false, personnelClear: false, testedSafe: false, ...d.checks } });
    } else if (d.action === 'leave') {
      if (d.expiresAt && new Date(d.expiresAt).getTime() !== new Date(tag.expiresAt).getTime()) {
        await extendTag(sequelize, actor, tag.id, { expiresAt: new Date(d.expiresAt), reason: d.note || 'Left in place at the end of a visit.' });
      }
      if (d.note) await addTagNote(sequelize, actor, tag.id, `Left in place at the end of a visit: ${d.note}`);
    } else {
      await offerHandover(sequelize, actor, tag.id, { toUserId: d.toUserId!, note: d.note }, null);
    }
  }
}
