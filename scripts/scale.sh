#!/usr/bin/env bash
# `npm run demo:scale`: the scaled-out shape on one machine with the demo data, all on loopback:
# PostgreSQL primary + streaming standby, PgBouncer, two app processes, HAProxy in front. Ctrl-C stops it all.
# Ports (env): SCALE_PRIMARY_PORT 54339, SCALE_STANDBY_PORT 54340, SCALE_PGBOUNCER_PORT 6432,
# SCALE_APP1_PORT 3001, SCALE_APP2_PORT 3002, SCALE_HAPROXY_PORT 8080; mail in MailDev on 1025/1080.
set -euo pipefail
cd "$(dirname "$0")/.."
source scripts/lib/services.sh
source scripts/lib/scale-shape.sh

[ "$(id -u)" = 0 ] || { echo "Run as root: PostgreSQL and PgBouncer run as the postgres user." >&2; exit 1; }
bash scripts/ensure-system-packages.sh
[ -d node_modules/next ] || npm ci --no-audit --no-fund

export SCALE_DIR=${SCALE_DIR:-$PWD/.data/scale}
export SCALE_PRIMARY_PORT=${SCALE_PRIMARY_PORT:-54339} SCALE_STANDBY_PORT=${SCALE_STANDBY_PORT:-54340}
export SCALE_PGBOUNCER_PORT=${SCALE_PGBOUNCER_PORT:-6432} SCALE_HAPROXY_PORT=${SCALE_HAPROXY_PORT:-8080}
export SCALE_APP1_PORT=${SCALE_APP1_PORT:-3001} SCALE_APP2_PORT=${SCALE_APP2_PORT:-3002}
export SCALE_DIST_DIR=${SCALE_DIST_DIR:-.next-scale}
export SMTP_HOST=127.0.0.1 SMTP_PORT=${SMTP_PORT:-1025}
mkdir -p "$SCALE_DIR" .data
if [ -z "${NEXTAUTH_SECRET:-}" ]; then
  [ -f .data/nextauth-secret ] || node -e "console.log(require('crypto').randomBytes(32).toString('base64url'))" > .data/nextauth-secret
  NEXTAUTH_SECRET=$(cat .data/nextauth-secret); export NEXTAUTH_SECRET
fi

maildev_pid=
trap 'echo; echo "Stopping..."; scale_stop_all || true; [ -n "$maildev_pid" ] && kill "$maildev_pid" 2>/dev/null; exit 0' INT TERM
trap 'scale_stop_all || true; [ -n "$maildev_pid" ] && kill "$maildev_pid" 2>/dev/null || true' EXIT

if ! curl -fsS -o /dev/null http://127.0.0.1:1080/api/email 2>/dev/null; then
  maildev_pid=$(start_maildev "$SMTP_PORT" 1080 "$SCALE_DIR/maildev.log")
  wait_for_url http://127.0.0.1:1080/api/email 30
fi

scale_primary_start
DATABASE_URL=$(scale_primary_url) migrate
DATABASE_URL=$(scale_primary_url) npm run --silent db:seed
scale_standby_start
scale_pgbouncer_start
# SCALE_REUSE_BUILD=1 serves an existing build in SCALE_DIST_DIR (for instance .next-test) instead of building.
if [ "${SCALE_REUSE_BUILD:-}" != 1 ] || [ ! -f "$SCALE_DIST_DIR/BUILD_ID" ]; then
  echo "== production build (into $SCALE_DIST_DIR)"
  NEXT_DIST_DIR=$SCALE_DIST_DIR node_modules/.bin/next build >"$SCALE_DIR/build.log" 2>&1 || { tail -40 "$SCALE_DIR/build.log"; exit 1; }
fi
scale_app_env
scale_app_start APP1 "$SCALE_APP1_PORT" "$SCALE_DIR/app1.log"
scale_app_start APP2 "$SCALE_APP2_PORT" "$SCALE_DIR/app2.log" INBOUND_SMTP=off
wait_for_url "http://127.0.0.1:$SCALE_APP1_PORT/api/health" 90
wait_for_url "http://127.0.0.1:$SCALE_APP2_PORT/api/health" 90
scale_haproxy_start
wait_for_url "http://127.0.0.1:$SCALE_HAPROXY_PORT/api/health" 30
bash scripts/lib/check-loopback.sh "${scale_pids[@]}" ${maildev_pid:+"$maildev_pid"}

cat <<TXT

Swarfbook (scaled out): http://127.0.0.1:$SCALE_HAPROXY_PORT  (HAProxy -> app processes on $SCALE_APP1_PORT and $SCALE_APP2_PORT)
Replica lag:            curl -s http://127.0.0.1:$SCALE_HAPROXY_PORT/api/health
Mail inbox:             http://127.0.0.1:1080
Logs:                   $SCALE_DIR/app1.log, app2.log, build.log
Stop with Ctrl-C.
TXT
while sleep 5; do
  for pid in "$SCALE_APP1_PID" "$SCALE_APP2_PID"; do kill -0 "$pid" 2>/dev/null || echo "An app process ($pid) has stopped; HAProxy serves from the other." >&2; done
done
