import { afterAll, bench, describe } from 'vitest';
import { SEARCHES, searchBench } from '@/test/server/bench/search-bench-setup';

// GET /api/assets?q=… over the demo register, through the whole app (auth, query, JSON).
// Run: npx vitest bench --run test/server/bench/asset-search-demo.bench.ts
const b = await searchBench(0);
console.log(`demo seed took ${b.seedMs.toFixed(0)} ms`);
afterAll(() => b.close());

describe('search over the demo register', () => {
  for (const q of SEARCHES) bench(`q=${q}`, async () => { await b.search(q); }, { time: 1000 });
});
