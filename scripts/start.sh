#!/usr/bin/env bash
# npm start: installs what is missing, then runs Isoledger with demo data on a private MariaDB (scripts/start.ts).
set -euo pipefail
cd "$(dirname "$0")/.."
source scripts/lib/prereqs.sh
if [ -z "${DATABASE_URL:-}" ]; then ensure_debian mariadbd mariadb-server; fi
ensure_node_modules
exec node_modules/.bin/tsx scripts/start.ts
