import type { MailKind } from '@/server/mail/outbox';
import { formatInZone, renderBlocks, type Block, type RenderedMail } from '@/server/mail/render';
import type { TagSnapshot } from '@/server/mail/tag-mail';
import { renderVisitMail, type VisitMailPayload } from '@/server/mail/visit-mail';

/** The product records; it never makes plant safe. Every tag e-mail says so. */
const RECORD_ONLY = 'Isoledger is a record only. Follow your site isolation procedure and permit system, and prove the plant safe yourself before any work.';

interface TagPayload {
  tag: TagSnapshot;
  actor: { id: number; name: string };
  reason: string | null;
  note: string | null;
  recipientName: string;
}
interface DigestRow { id: number; plantId: string; assetName: string; siteName: string; kind: string; holderName: string; expiresAt: string }
interface DigestPayload { recipientName: string; timeZone: string; localDate: string; overdue: DigestRow[]; dueToday: DigestRow[]; reviewsOverdue?: { siteId: number; siteName: string; lastReviewedOn: string | null }[] }
interface LinkPayload { recipientName: string; token: string; expiresAt: string; invitedBy?: string; organisationName?: string }

const kindWord = (kind: string) => (kind === 'override' ? 'Override' : 'Isolation');
const itemLabel = (t: TagSnapshot) => `${t.plantId} ${t.assetName}`.trim();

function tagFacts(t: TagSnapshot): Block {
  return {
    facts: [
      ['Site', t.siteName],
      ['Plant room', t.plantRoomName ?? '—'],
      ['Plant item', itemLabel(t)],
      ['Kind', kindWord(t.kind)],
      ['Reason', t.reason],
      ['Holder', t.holderName],
      ['Contact phone', t.contactPhone || '—'],
      ['Raised', formatInZone(t.raisedAt, t.timeZone)],
      ['Expires', formatInZone(t.expiresAt, t.timeZone)],
    ],
  };
}

function tagMail(kind: MailKind, p: TagPayload, url: (path: string) => string): RenderedMail {
  const t = p.tag;
  const word = kindWord(t.kind);
  const where = `${itemLabel(t)} (${t.siteName})`;
  const links: Block[] = [{ link: { label: 'Open the tag', url: url(`/tags/${t.id}`) } }, { link: { label: 'Open the plant item', url: url(`/assets/${t.assetId}`) } }];
  switch (kind) {
    case 'tag-raised':
      return renderBlocks(`${word} raised: ${where}`, [{ p: `${p.actor.name} raised an ${word.toLowerCase()} tag.` }, tagFacts(t), ...links, { caution: RECORD_ONLY }]);
    case 'tag-cleared':
      return renderBlocks(`${word} cleared: ${where}`, [{ p: `${p.actor.name} cleared the ${word.toLowerCase()} tag.` }, { facts: [['Clearance reason', p.reason ?? '—']] }, tagFacts(t), ...links, { caution: RECORD_ONLY }]);
    case 'tag-cleared-in-absence':
      return renderBlocks(`${word} cleared in the holder’s absence: ${where}`, [
        { p: `${p.actor.name} cleared ${t.holderName}’s ${word.toLowerCase()} tag while ${t.holderName} was not on site.` },
        { facts: [['Clearance reason', p.reason ?? '—']] }, tagFacts(t), ...links, { caution: RECORD_ONLY },
      ]);
    case 'my-tag-cleared-in-absence':
      return renderBlocks(`Your ${word.toLowerCase()} on ${where} was cleared in your absence`, [
        { p: `${p.recipientName}, ${p.actor.name} cleared your ${word.toLowerCase()} tag while you were not on site.` },
        { facts: [['Clearance reason', p.reason ?? '—']] }, tagFacts(t), ...links,
        // OSHA 29 CFR 1910.147(e)(3)(iii): the employee is to be told the device was removed before resuming work.
        { caution: `Do not resume work on this item until you have spoken to ${p.actor.name} and re-isolated it under your site procedure. Acknowledge this in Isoledger before you raise, clear or take over any tag. ${RECORD_ONLY}` },
      ]);
    case 'my-tag-reassigned-in-absence':
      return renderBlocks(`Your ${word.toLowerCase()} on ${where} was reassigned in your absence`, [
        { p: `${p.recipientName}, ${p.actor.name} moved your ${word.toLowerCase()} tag to ${t.holderName} while you were not on site.` },
        { facts: [['Reason', p.reason ?? '—']] }, tagFacts(t), ...links,
        // OSHA 29 CFR 1910.147(e)(3)(iii): the employee is to be told before resuming work.
        { caution: `Your lock may have been removed. Acknowledge this in Isoledger and speak to ${p.actor.name} before you resume any work. ${RECORD_ONLY}` },
      ]);
    case 'tag-reassigned-to-you':
      return renderBlocks(`You now hold the ${word.toLowerCase()} on ${where}`, [
        { p: `${p.recipientName}, ${p.actor.name} moved this ${word.toLowerCase()} tag to you in its holder’s absence. The record now names you as its holder${t.kind === 'isolation' && t.lockNumber ? `, with lock ${t.lockNumber}` : ''}.` },
        { facts: [['Reason', p.reason ?? '—']] }, tagFacts(t), ...links,
        // OSHA 29 CFR 1910.147(e)(3): removing another person's device follows the employer's specific procedure.
        { caution: `${t.kind === 'isolation' ? 'Before anyone works on this item, check on site that your own lock is on every isolation point and prove the isolation again' : 'Check on site that the override is still as the tag records it'} under your site procedure. ${RECORD_ONLY}` },
      ]);
    case 'my-tag-handed-over':
      return renderBlocks(`Your ${word.toLowerCase()} on ${where} was handed over to ${p.actor.name}`, [
        { p: `${p.recipientName}, ${p.actor.name} accepted your hand-over and now holds the ${word.toLowerCase()} tag.` },
        ...(p.note ? [{ facts: [['Hand-over note', p.note]] as [string, string][] }] : []), tagFacts(t), ...links, { caution: RECORD_ONLY },
      ]);
    default:
      throw new Error(`not a tag mail: ${kind}`);
  }
}

function digestMail(p: DigestPayload, url: (path: string) => string): RenderedMail {
  const line = (r: DigestRow) => ({ text: `${r.siteName} · ${r.plantId} ${r.assetName} · ${kindWord(r.kind)} · ${r.holderName} · expires ${formatInZone(r.expiresAt, p.timeZone)}`, url: url(`/tags/${r.id}`) });
  const blocks: Block[] = [{ p: `${p.recipientName}, these tags on your sites in ${p.timeZone} need attention today (${p.localDate}).` }];
  if (p.overdue.length) blocks.push({ p: `Past expiry (${p.overdue.length}):` }, { list: p.overdue.map(line) });
  if (p.dueToday.length) blocks.push({ p: `Due today (${p.dueToday.length}):` }, { list: p.dueToday.map(line) });
  const reviews = p.reviewsOverdue ?? [];
  if (reviews.length) {
    blocks.push({ p: `Isolation procedure review overdue (${reviews.length}): the yearly review is more than 12 months old or not recorded.` }, {
      list: reviews.map((r) => ({ text: `${r.siteName} · last review ${r.lastReviewedOn ?? 'none recorded'}`, url: url(`/sites/${r.siteId}`) })),
    });
  }
  blocks.push({ link: { label: 'Open the board', url: url('/board') } }, { caution: RECORD_ONLY });
  const reviewNote = reviews.length ? `, ${reviews.length} procedure review${reviews.length === 1 ? '' : 's'} overdue` : '';
  return renderBlocks(`Tags for ${p.localDate}: ${p.overdue.length} past expiry, ${p.dueToday.length} due today${reviewNote}`, blocks);
}

function linkMail(kind: 'invite' | 'password-reset', p: LinkPayload, url: (path: string) => string): RenderedMail {
  const link = url(`/set-password?token=${encodeURIComponent(p.token)}`);
  const until = formatInZone(p.expiresAt, 'UTC');
  if (kind === 'invite') {
    return renderBlocks(`${p.invitedBy ?? 'Your administrator'} invited you to Isoledger`, [
      { p: `${p.recipientName}, ${p.invitedBy ?? 'your administrator'} has added you to ${p.organisationName ?? 'their organisation'} on Isoledger.` },
      { link: { label: 'Choose your password', url: link } },
      { p: `The link works once and expires ${until}. If you did not expect this, ignore this e-mail.` },
    ]);
  }
  return renderBlocks('Reset your Isoledger password', [
    { p: `${p.recipientName}, someone asked to reset the password for this address.` },
    { link: { label: 'Choose a new password', url: link } },
    { p: `The link works once and expires ${until}. If you did not ask, ignore this e-mail; your password stays as it is.` },
  ]);
}

/** Renders an outbox row; links are built from PUBLIC_URL at send time. */
export function renderMail(kind: MailKind, payload: Record<string, unknown>, publicUrl: string): RenderedMail {
  const url = (path: string) => `${publicUrl}${path}`;
  if (kind === 'visit-summary') return renderVisitMail(payload as unknown as VisitMailPayload, url);
  if (kind === 'digest') return digestMail(payload as unknown as DigestPayload, url);
  if (kind === 'invite' || kind === 'password-reset') return linkMail(kind, payload as unknown as LinkPayload, url);
  return tagMail(kind, payload as unknown as TagPayload, url);
}
