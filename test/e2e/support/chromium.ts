// Debian's Chromium and its flags, free of test-runner imports so scripts (npm run bench) can use them too.
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
