#!/usr/bin/env bash
# One command from a fresh clone to the running app with demo data on http://localhost:3000:
# installs packages, starts PostgreSQL, MailDev and the S3 fake on loopback, migrates, seeds, builds, serves.
set -euo pipefail
cd "$(dirname "$0")/.."
source scripts/lib/services.sh

bash scripts/ensure-system-packages.sh
[ -d node_modules/next ] || npm ci --no-audit --no-fund

export PORT=${PORT:-3000}
export NEXTAUTH_URL=${NEXTAUTH_URL:-http://localhost:$PORT}
mkdir -p .data
if [ -z "${NEXTAUTH_SECRET:-}" ]; then
  [ -f .data/nextauth-secret ] || node -e "console.log(require('crypto').randomBytes(32).toString('base64url'))" > .data/nextauth-secret
  NEXTAUTH_SECRET=$(cat .data/nextauth-secret)
  export NEXTAUTH_SECRET
fi
export SMTP_HOST=${SMTP_HOST:-127.0.0.1} SMTP_PORT=${SMTP_PORT:-1025}
# Replies typed into the local mail catcher carry no Authentication-Results header.
export INBOUND_MAIL_REQUIRE_AUTH=${INBOUND_MAIL_REQUIRE_AUTH:-off}

pids=()
trap 'for pid in "${pids[@]}"; do kill "$pid" 2>/dev/null || true; done; bash scripts/pg.sh stop' EXIT

bash scripts/pg.sh start
if ! curl -fsS -o /dev/null http://127.0.0.1:1080/api/email 2>/dev/null; then
  pids+=("$(start_maildev "$SMTP_PORT" 1080 .data/maildev.log)")
  wait_for_url http://127.0.0.1:1080/api/email 30
fi
s3_pid=$(start_s3_fake 4569 "$PWD/.data/s3" .data/s3-fake.log)
if [ -n "$s3_pid" ]; then
  pids+=("$s3_pid")
  wait_for_url http://127.0.0.1:4569/ 30
  export STORAGE_ENGINE=s3 S3_ENDPOINT=http://127.0.0.1:4569 S3_BUCKET=swarfbook-uploads S3_ACCESS_KEY_ID=S3RVER S3_SECRET_ACCESS_KEY=S3RVER S3_REGION=us-east-1
fi

migrate
npm run --silent db:seed
npx next build
echo
echo "Swarfbook:  http://localhost:$PORT"
echo "Mail inbox: http://127.0.0.1:1080 (MailDev: sign-in links, invitations, alerts)"
echo "Stop with Ctrl-C."
npx next start -H 127.0.0.1 -p "$PORT"
