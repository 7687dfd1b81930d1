import { buildWeb } from '@/scripts/lib/web-build';

buildWeb((line) => console.log(`[isoledger] ${line}`));
