import { buildWeb } from '@/scripts/lib/web-build';

void buildWeb((line) => console.log(`[isoledger] ${line}`)).catch((err: unknown) => {
  console.error(err);
  process.exit(1);
});
