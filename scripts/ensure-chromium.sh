#!/usr/bin/env bash
# Browser tests drive Debian's chromium with playwright-core (no browser download).
set -euo pipefail
BIN=${BARWRIGHT_CHROMIUM:-/usr/bin/chromium}
[ -x "$BIN" ] && exit 0
if [ "$(id -u)" -ne 0 ]; then
  echo "chromium: $BIN is missing. Install it as root: apt-get update && apt-get install -y chromium" >&2
  exit 1
fi
echo "chromium: installing Debian's chromium package (once, about a minute)…"
DEBIAN_FRONTEND=noninteractive apt-get update -qq >/dev/null || { echo "chromium: apt-get update failed" >&2; exit 1; }
DEBIAN_FRONTEND=noninteractive apt-get install -y -qq chromium >/dev/null || { echo "chromium: apt-get install chromium failed" >&2; exit 1; }
[ -x "$BIN" ] || { echo "chromium: installed, but $BIN is still missing" >&2; exit 1; }
