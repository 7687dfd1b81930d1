// Imported first by scripts/bench.ts: the per-request log would cost time inside the figures and bury them.
process.env.LOG_LEVEL ??= 'warn';
