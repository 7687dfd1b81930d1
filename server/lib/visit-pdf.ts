// A visit report on A4: who came, what for, what they did, and what they left live behind them.
import path from 'node:path';
import PDFDocument from 'pdfkit';
import { formatInZone } from '@/server/mail/render';
import { TAG_EVENT_LABELS } from '@/shared/rules/tags';
import { VISIT_DECISION_LABELS } from '@/shared/rules/visits';
import type { Visit } from '@/shared/types/visits';

const FONT = path.resolve('assets/fonts/AtkinsonHyperlegible_400Regular.ttf');
const BOLD = path.resolve('assets/fonts/AtkinsonHyperlegible_700Bold.ttf');
const MARGIN = 48;

const kindWord = (kind: string) => (kind === 'override' ? 'Override' : 'Isolation');

export function renderVisitPdf(v: Visit, generatedAt: Date): Promise<Buffer> {
  const doc = new PDFDocument({ size: 'A4', margin: MARGIN, info: { Title: `Visit report: ${v.site.name}`, Creator: 'Isoledger' } });
  doc.registerFont('body', FONT).registerFont('bold', BOLD);
  const chunks: Buffer[] = [];
  const done = new Promise<Buffer>((resolve, reject) => {
    doc.on('data', (c: Buffer) => chunks.push(c));
    doc.on('end', () => resolve(Buffer.concat(chunks)));
    doc.on('error', reject);
  });
  const at = (iso: string) => formatInZone(iso, v.site.timeZone);
  const heading = (text: string) => doc.moveDown(0.6).font('bold').fontSize(13).fillColor('#000000').text(text).moveDown(0.2);
  const line = (label: string, value: string) => doc.font('bold').fontSize(10).text(`${label}: `, { continued: true }).font('body').text(value);
  const body = (text: string) => doc.font('body').fontSize(10).text(text);

  doc.font('bold').fontSize(18).text(`Visit report — ${v.site.name}`);
  doc.font('body').fontSize(10).text(`Made by Isoledger ${at(generatedAt.toISOString())}`).moveDown(0.5);
  line('Engineer', v.person.name);
  line('Job reference', v.jobReference || '—');
  line('Came for', v.purpose);
  line('Arrived', at(v.startedAt));
  line('Left', v.endedAt ? at(v.endedAt) : 'Visit still in progress');

  const decisions = v.decisions ?? [];
  heading(`Live tags held on leaving (${decisions.length})`);
  if (!decisions.length) body(v.endedAt ? 'None: the engineer held no live tags on this site when they left.' : 'Decided when the visit ends.');
  for (const d of decisions) {
    doc.font('bold').fontSize(10).text(`${kindWord(d.kind)} on ${d.item.plantId} ${d.item.name} — ${VISIT_DECISION_LABELS[d.action]}`);
    body(`Reason: ${d.reason}`);
    if (d.note) body(`Note: ${d.note}`);
    if (d.expiresAt) body(`Expiry: ${at(d.expiresAt)}`);
    doc.moveDown(0.3);
  }

  const a = v.activity;
  heading(`Tag actions (${a?.tagEvents.length ?? 0})`);
  for (const e of a?.tagEvents ?? []) body(`${at(e.at)} · ${TAG_EVENT_LABELS[e.type]} · ${kindWord(e.kind)} on ${e.item.plantId} ${e.item.name} · ${e.text ?? e.reason}`);
  heading(`Readings (${a?.readings.length ?? 0})`);
  for (const r of a?.readings ?? []) body(`${at(r.takenAt)} · ${r.item.plantId} ${r.item.name} · ${r.flags.length ? r.flags.map((f) => `${f.level}: ${f.message}`).join('; ') : 'no flags'}`);
  heading(`Photos (${a?.photos.length ?? 0})`);
  for (const p of a?.photos ?? []) body(`${at(p.at)} · ${p.subject}${p.caption ? ` · ${p.caption}` : ''}`);
  if (v.endNote) {
    heading('Note on leaving');
    body(v.endNote);
  }
  doc.moveDown(1).font('body').fontSize(9).fillColor('#333333')
    .text('Isoledger is a record only. It does not isolate anything or make plant safe. Follow the site isolation procedure and permit system, and prove the isolation before any work.');
  doc.end();
  return done;
}
