#!/usr/bin/env bash
# Every test: typecheck, lint, unit, integration (throw-away PostgreSQL) and browser (Debian chromium).
# Vitest's global setups create and remove the throw-away clusters and build and serve the app.
set -uo pipefail
cd "$(dirname "$0")/.."
export NEXT_TELEMETRY_DISABLED=1
# The pinned AWS SDK (S3 client) works on Node 20; its notice that later releases will need Node 22 is noise here.
export AWS_SDK_JS_NODE_VERSION_SUPPORT_WARNING_DISABLED=true
mkdir -p .data

step() { printf '\n== %s ==\n' "$1"; }

step "prerequisites"
scripts/ensure-chromium.sh || exit 1
scripts/db.sh install || exit 1

step "typecheck"
npx tsc --noEmit || { echo "test: typecheck failed"; exit 1; }

step "lint"
npx eslint --max-warnings=0 . || { echo "test: lint failed"; exit 1; }

step "unit, integration and browser tests"
rm -f .data/vitest.json
npx vitest run --reporter=default --reporter=json --outputFile.json=.data/vitest.json
status=$?
node -e '
  const fs = require("fs");
  try {
    const r = JSON.parse(fs.readFileSync(".data/vitest.json", "utf8"));
    const skipped = (r.numPendingTests || 0) + (r.numTodoTests || 0);
    console.log(`\n${r.numPassedTests} passed, ${r.numFailedTests} failed` + (skipped ? `, ${skipped} skipped` : ""));
  } catch { console.log("\n0 passed, 1 failed (no test report was written)"); }
'
exit $status
