#!/usr/bin/env bash
# npm test: installs what is missing, then runs every test (scripts/test.ts).
set -euo pipefail
cd "$(dirname "$0")/.."
source scripts/lib/prereqs.sh
ensure_debian mariadbd mariadb-server chromium chromium pdftoppm poppler-utils
ensure_node_modules
exec node_modules/.bin/tsx scripts/test.ts "$@"
