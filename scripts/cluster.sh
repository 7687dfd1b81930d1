#!/usr/bin/env bash
# npm run cluster: installs what is missing, then runs a three-node Galera cluster and two app servers on loopback (scripts/cluster.ts).
set -euo pipefail
cd "$(dirname "$0")/.."
source scripts/lib/prereqs.sh
ensure_debian mariadbd mariadb-server /usr/lib/galera/libgalera_smm.so galera-4 rsync rsync
ensure_node_modules
exec node_modules/.bin/tsx scripts/cluster.ts
