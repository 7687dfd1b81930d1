/*
 * npm run routes:types — writes Expo Router's typed-route declarations (.expo/types/router.d.ts) without a dev
 * server, so `npm run typecheck` works from a fresh clone: Expo generates them while customising the project's
 * tsconfig, which is left as it is.
 */
import { spawnSync } from 'node:child_process';
import path from 'node:path';

const root = path.resolve(__dirname, '..');
const expo = path.join(root, 'node_modules', '.bin', 'expo');
const run = spawnSync(expo, ['customize', 'tsconfig.json'], { cwd: root, stdio: 'inherit', env: { ...process.env, EXPO_OFFLINE: '1' } });
process.exit(run.status ?? 1);
