import sharp from 'sharp';

// Placeholder "photos" for the demo: simple drawings made here, never real photographs.

const escapeXml = (s: string) => s.replace(/[<>&"']/g, (c) => `&#${c.charCodeAt(0)};`);
const W = 960;
const H = 720;

/** A plant item drawn as a labelled box with pipe stubs and a rating plate. */
export function itemPlaceholderSvg(plantId: string, name: string): string {
  return `<svg xmlns="http://www.w3.org/2000/svg" width="${W}" height="${H}" viewBox="0 0 ${W} ${H}">
  <rect width="${W}" height="${H}" fill="#d9dee3"/>
  <rect x="0" y="560" width="${W}" height="160" fill="#b8bec4"/>
  <rect x="250" y="200" width="90" height="26" fill="#7a8590"/><rect x="620" y="200" width="90" height="26" fill="#7a8590"/>
  <rect x="280" y="120" width="30" height="90" fill="#7a8590"/><rect x="650" y="120" width="30" height="90" fill="#7a8590"/>
  <rect x="220" y="180" width="520" height="400" rx="18" fill="#eef1f4" stroke="#4a545e" stroke-width="6"/>
  <rect x="300" y="250" width="360" height="120" rx="8" fill="#ffffff" stroke="#4a545e" stroke-width="4"/>
  <text x="480" y="330" font-family="DejaVu Sans, Liberation Sans, sans-serif" font-size="64" font-weight="bold" text-anchor="middle" fill="#1f2a33">${escapeXml(plantId)}</text>
  <text x="480" y="440" font-family="DejaVu Sans, Liberation Sans, sans-serif" font-size="30" text-anchor="middle" fill="#1f2a33">${escapeXml(name)}</text>
  <text x="480" y="690" font-family="DejaVu Sans, Liberation Sans, sans-serif" font-size="22" text-anchor="middle" fill="#4a545e">Placeholder drawing (demo data)</text>
</svg>`;
}

/** A plant room drawn as a plan: walls, a door, plant outlines and the room name. */
export function roomPlaceholderSvg(roomName: string, siteName: string): string {
  return `<svg xmlns="http://www.w3.org/2000/svg" width="${W}" height="${H}" viewBox="0 0 ${W} ${H}">
  <rect width="${W}" height="${H}" fill="#f4f1ea"/>
  <rect x="80" y="110" width="800" height="480" fill="none" stroke="#2d3640" stroke-width="14"/>
  <rect x="420" y="576" width="120" height="28" fill="#f4f1ea"/>
  <path d="M420 590 A120 120 0 0 1 540 470" fill="none" stroke="#2d3640" stroke-width="4"/>
  <rect x="130" y="160" width="150" height="120" fill="#cfd6dd" stroke="#2d3640" stroke-width="4"/>
  <rect x="310" y="160" width="150" height="120" fill="#cfd6dd" stroke="#2d3640" stroke-width="4"/>
  <circle cx="700" cy="220" r="60" fill="#cfd6dd" stroke="#2d3640" stroke-width="4"/>
  <rect x="720" y="420" width="120" height="90" fill="#cfd6dd" stroke="#2d3640" stroke-width="4"/>
  <text x="480" y="380" font-family="DejaVu Sans, Liberation Sans, sans-serif" font-size="44" font-weight="bold" text-anchor="middle" fill="#1f2a33">${escapeXml(roomName)}</text>
  <text x="480" y="60" font-family="DejaVu Sans, Liberation Sans, sans-serif" font-size="26" text-anchor="middle" fill="#2d3640">${escapeXml(siteName)}</text>
  <text x="480" y="690" font-family="DejaVu Sans, Liberation Sans, sans-serif" font-size="22" text-anchor="middle" fill="#4a545e">Placeholder drawing (demo data)</text>
</svg>`;
}

/** The drawing as a PNG, to go through the same photo pipeline as an upload. */
export const renderPlaceholder = (svg: string) => sharp(Buffer.from(svg)).png().toBuffer();
