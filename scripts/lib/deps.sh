#!/usr/bin/env bash
# Installs the npm dependencies when they are missing or older than package-lock.json.

deps_ensure_node_modules() {
  local stamp=node_modules/.package-lock.json
  if [ ! -f "$stamp" ] || [ package-lock.json -nt "$stamp" ]; then
    echo "ionfolio: installing npm dependencies (npm ci)"
    npm ci --no-audit --no-fund --loglevel=error || return 1
  fi
}

deps_ensure_chromium() {
  if [ -x /usr/bin/chromium ]; then return 0; fi
  echo "ionfolio: installing Debian's chromium for the browser journeys"
  if [ "$(id -u)" != 0 ]; then echo "ionfolio: need root to install chromium" >&2; return 1; fi
  DEBIAN_FRONTEND=noninteractive apt-get update -qq && \
    DEBIAN_FRONTEND=noninteractive apt-get install -y -qq chromium >/dev/null
}
