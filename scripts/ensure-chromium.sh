#!/usr/bin/env bash
# Browser tests drive Debian's chromium with playwright-core (no browser download);
# PDF checks read text with poppler's pdftotext. Both come from Debian's packages.
set -euo pipefail
BIN=${BARWRIGHT_CHROMIUM:-/usr/bin/chromium}
missing=()
[ -x "$BIN" ] || missing+=(chromium)
command -v pdftotext >/dev/null 2>&1 || missing+=(poppler-utils)
[ ${#missing[@]} -eq 0 ] && exit 0
if [ "$(id -u)" -ne 0 ]; then
  echo "test tools: ${missing[*]} missing. Install as root: apt-get update && apt-get install -y ${missing[*]}" >&2
  exit 1
fi
echo "test tools: installing Debian's ${missing[*]} (once, about a minute)…"
DEBIAN_FRONTEND=noninteractive apt-get update -qq >/dev/null || { echo "test tools: apt-get update failed" >&2; exit 1; }
DEBIAN_FRONTEND=noninteractive apt-get install -y -qq "${missing[@]}" >/dev/null || { echo "test tools: apt-get install ${missing[*]} failed" >&2; exit 1; }
[ -x "$BIN" ] || { echo "test tools: installed, but $BIN is still missing" >&2; exit 1; }
