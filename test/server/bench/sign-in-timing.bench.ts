import request from 'supertest';
import { afterAll, bench, describe } from 'vitest';
import { backgroundSettled } from '@/server/lib/background';
import { createOrganisation, setupTestApp, TEST_PASSWORD } from '@/test/setup/app';

// Known and unknown accounts must cost the same: sign-in compares against a stand-in hash of the same cost, and a
// reset request is answered before any work. Run: npx vitest bench --run test/server/bench/sign-in-timing.bench.ts
const t = await setupTestApp({ loginRateLimit: { max: 1_000_000, windowMs: 60_000 } });
const { users } = await createOrganisation('bench');
afterAll(async () => {
  await backgroundSettled();
  await t.close();
});
const login = (email: string) => request(t.app).post('/api/auth/login').send({ email, password: `${TEST_PASSWORD}-wrong` });
const reset = (email: string) => request(t.app).post('/api/auth/password/reset-request').send({ email });
const opts = { time: 3000, warmupIterations: 3 };

describe('wrong password: known vs unknown account', () => {
  bench('known account', async () => { await login(users.engineer.email); }, opts);
  bench('unknown account', async () => { await login('nobody-here@bench.test'); }, opts);
});

describe('reset request: known vs unknown address', () => {
  bench('known address', async () => { await reset(users.engineer.email); await backgroundSettled(); }, opts);
  bench('known address (answer only)', async () => { await reset(users.engineer.email); }, opts);
  bench('unknown address (answer only)', async () => { await reset('nobody-here@bench.test'); }, opts);
});
