// Debian's Chromium and the flags every test and the bench launch it with (no vitest here: npm run bench imports it).
export const CHROMIUM = '/usr/bin/chromium';

// Chromium's own background calls would otherwise try the network, which this product never needs.
export const CHROMIUM_ARGS = [
  '--headless',
  '--no-sandbox',
  '--disable-gpu',
  '--disable-quic',
  '--no-first-run',
  '--disable-background-networking',
  '--disable-component-update',
  '--disable-sync',
  '--host-resolver-rules=MAP * ~NOTFOUND, EXCLUDE 127.0.0.1',
];
