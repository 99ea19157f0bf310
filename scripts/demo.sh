#!/usr/bin/env bash
# The start command's second half: database up, migrated, demo seeded, app built and served.
set -euo pipefail
cd "$(dirname "$0")/.."
export NEXT_TELEMETRY_DISABLED=1
# The pinned AWS SDK (S3 client) works on Node 20; its notice that later releases will need Node 22 is noise here.
export AWS_SDK_JS_NODE_VERSION_SUPPORT_WARNING_DISABLED=true
PORT=${PORT:-3000}

if (exec 3<>"/dev/tcp/127.0.0.1/$PORT") 2>/dev/null; then
  echo "demo: port $PORT on 127.0.0.1 is already in use (another Barwright?). Stop that program, or run PORT=3001 npm run demo." >&2
  exit 1
fi

scripts/db.sh start
npx tsx scripts/migrate.ts
# Spec sheets and certificates go to a local S3-compatible server (s3rver) on loopback;
# it starts first because the demo seed stores a sample certificate there.
export BARWRIGHT_S3_PORT=${BARWRIGHT_S3_PORT:-4568}
export BARWRIGHT_S3_ENDPOINT="http://127.0.0.1:$BARWRIGHT_S3_PORT"
export BARWRIGHT_S3_DIR=${BARWRIGHT_S3_DIR:-$PWD/.data/s3}
node --import tsx scripts/fake-s3.ts &
S3=$!
trap 'kill $S3 2>/dev/null' EXIT
for _ in $(seq 1 50); do
  (exec 3<>"/dev/tcp/127.0.0.1/$BARWRIGHT_S3_PORT") 2>/dev/null && break
  kill -0 $S3 2>/dev/null || { echo "demo: the file store did not start (see above)." >&2; exit 1; }
  sleep 0.2
done
npx tsx scripts/seed.ts
echo "demo: building the production app…"
node node_modules/next/dist/bin/next build >.data/build.log 2>&1 || { tail -n 40 .data/build.log >&2; echo "demo: the build failed (full log: .data/build.log)." >&2; exit 1; }
# The demo's e-mail goes to a local SMTP sink; owners read it under Mailbox.
export BARWRIGHT_SMTP_PORT=${BARWRIGHT_SMTP_PORT:-2525}
export BARWRIGHT_SMTP_URL="smtp://127.0.0.1:$BARWRIGHT_SMTP_PORT"
export BARWRIGHT_MAILBOX_DIR=${BARWRIGHT_MAILBOX_DIR:-$PWD/.data/mailbox}
export BARWRIGHT_DEMO_MAILBOX=1
node --import tsx scripts/mail-sink.ts &
SINK=$!
trap 'kill $SINK $S3 2>/dev/null' EXIT
for _ in $(seq 1 50); do
  (exec 3<>"/dev/tcp/127.0.0.1/$BARWRIGHT_SMTP_PORT") 2>/dev/null && break
  kill -0 $SINK 2>/dev/null || { echo "demo: the mail sink did not start (see above)." >&2; exit 1; }
  sleep 0.2
done

echo
echo "  Barwright is at http://127.0.0.1:$PORT"
echo "  Ctrl-C stops the app; 'npm run db:stop' stops the database."
echo
node node_modules/next/dist/bin/next start -H 127.0.0.1 -p "$PORT"
