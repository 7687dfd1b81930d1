import { afterAll, bench, describe } from 'vitest';
import { SEARCHES, searchBench } from '@/test/server/bench/search-bench-setup';

// The same searches with 50 000 more items in the organisation, to show the indexes carry the load.
// Run: npx vitest bench --run test/server/bench/asset-search-scaled.bench.ts
const b = await searchBench(50_000);
afterAll(() => b.close());

describe('search over the demo register plus 50 000 items', () => {
  for (const q of SEARCHES) bench(`q=${q}`, async () => { await b.search(q); }, { time: 1000 });
});
