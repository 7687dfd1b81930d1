/** A message as a few blocks, rendered once as plain text and once as simple HTML so the two always agree. */
export type Block =
  | { p: string }
  | { link: { label: string; url: string } }
  | { facts: [string, string][] }
  | { list: { text: string; url: string }[] }
  | { caution: string };

export interface RenderedMail {
  subject: string;
  text: string;
  html: string;
}

const escapeHtml = (s: string) => s.replace(/[&<>"']/g, (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' })[c]!);

export function renderBlocks(subject: string, blocks: Block[]): RenderedMail {
  const text: string[] = [];
  const html: string[] = [];
  for (const b of blocks) {
    if ('p' in b) {
      text.push(b.p);
      html.push(`<p>${escapeHtml(b.p)}</p>`);
    } else if ('link' in b) {
      text.push(`${b.link.label}: ${b.link.url}`);
      html.push(`<p><a href="${escapeHtml(b.link.url)}">${escapeHtml(b.link.label)}</a></p>`);
    } else if ('facts' in b) {
      text.push(b.facts.map(([k, v]) => `${k}: ${v}`).join('\n'));
      html.push(`<table>${b.facts.map(([k, v]) => `<tr><th align="left">${escapeHtml(k)}</th><td>${escapeHtml(v)}</td></tr>`).join('')}</table>`);
    } else if ('list' in b) {
      text.push(b.list.map((i) => `- ${i.text}\n  ${i.url}`).join('\n'));
      html.push(`<ul>${b.list.map((i) => `<li><a href="${escapeHtml(i.url)}">${escapeHtml(i.text)}</a></li>`).join('')}</ul>`);
    } else {
      text.push(`CAUTION: ${b.caution}`);
      html.push(`<p><strong>Caution:</strong> ${escapeHtml(b.caution)}</p>`);
    }
  }
  return {
    subject,
    text: `${text.join('\n\n')}\n`,
    html: `<!doctype html><html><body style="font-family:sans-serif">${html.join('\n')}</body></html>`,
  };
}

/** A time as it reads on site, e.g. "4 Mar 2025, 14:00 (Europe/London)". */
export function formatInZone(iso: string, timeZone: string): string {
  const text = new Intl.DateTimeFormat('en-GB', { timeZone, day: 'numeric', month: 'short', year: 'numeric', hour: '2-digit', minute: '2-digit', hourCycle: 'h23' }).format(new Date(iso));
  return `${text} (${timeZone})`;
}
