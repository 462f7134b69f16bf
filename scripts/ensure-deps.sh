#!/usr/bin/env bash
# Installs what a fresh Debian machine lacks for Chillwright. Sourced by demo.sh and test.sh.
# Usage: scripts/ensure-deps.sh [--with-browser]
set -euo pipefail
REPO="$(cd "$(dirname "${BASH_SOURCE[0]}")/.." && pwd)"
export PATH="$PATH:/usr/sbin:/sbin"

need_apt=()
command -v mariadbd >/dev/null 2>&1 || need_apt+=(mariadb-server)
if [[ "${1:-}" == "--with-browser" && ! -x /usr/bin/chromium ]]; then need_apt+=(chromium); fi
if (( ${#need_apt[@]} )); then
  [[ "$(id -u)" == 0 ]] || { echo "ensure-deps: run as root, or apt-get install ${need_apt[*]}" >&2; exit 1; }
  echo "ensure-deps: installing ${need_apt[*]} from Debian" >&2
  apt-get update -qq
  DEBIAN_FRONTEND=noninteractive apt-get install -y -qq "${need_apt[@]}" >/dev/null
fi

# npm packages: install when node_modules is missing or older than the lock file.
if [[ ! -f "$REPO/node_modules/.package-lock.json" || "$REPO/package-lock.json" -nt "$REPO/node_modules/.package-lock.json" ]]; then
  echo "ensure-deps: npm ci" >&2
  (cd "$REPO" && npm ci --no-audit --no-fund)
fi
