#!/usr/bin/env bash
# npm test: installs what is missing, then runs every test (scripts/test.ts).
set -euo pipefail
cd "$(dirname "$0")/.."
source scripts/lib/prereqs.sh
# galera-4 and rsync: the cluster test starts a three-node Galera cluster (state transfers by rsync).
ensure_debian mariadbd mariadb-server chromium chromium pdftoppm poppler-utils /usr/lib/galera/libgalera_smm.so galera-4 rsync rsync
ensure_node_modules
exec node_modules/.bin/tsx scripts/test.ts "$@"
