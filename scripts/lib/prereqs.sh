# Shared by scripts/start.sh and scripts/test.sh: installs what Isoledger needs on a fresh Debian machine.

# ensure_debian COMMAND PACKAGE [COMMAND PACKAGE ...]: installs each PACKAGE whose COMMAND is missing
# (COMMAND may also be an absolute path to a file the package installs, e.g. a library).
ensure_debian() {
  local missing=()
  while [ "$#" -gt 0 ]; do
    local cmd="$1" pkg="$2"; shift 2
    if [ "${cmd#/}" != "$cmd" ]; then
      [ -e "$cmd" ] || missing+=("$pkg")
    elif ! command -v "$cmd" >/dev/null 2>&1 && [ ! -x "/usr/sbin/$cmd" ] && [ ! -x "/usr/bin/$cmd" ]; then
      missing+=("$pkg")
    fi
  done
  [ "${#missing[@]}" -eq 0 ] && return 0
  if [ "$(id -u)" -eq 0 ] && command -v apt-get >/dev/null 2>&1; then
    echo "[isoledger] installing Debian packages: ${missing[*]}"
    apt-get update -qq
    DEBIAN_FRONTEND=noninteractive apt-get install -y -qq --no-install-recommends "${missing[@]}" >/dev/null
  else
    echo "[isoledger] missing Debian packages; install them with:  sudo apt-get install -y ${missing[*]}" >&2
    exit 1
  fi
}

# ensure_node_modules: npm ci when node_modules is missing or older than package-lock.json.
ensure_node_modules() {
  if [ ! -f node_modules/.package-lock.json ] || [ package-lock.json -nt node_modules/.package-lock.json ]; then
    echo "[isoledger] installing npm packages (npm ci)…"
    npm ci --no-audit --no-fund --loglevel=error
  fi
}
