#!/usr/bin/env bash
# `npm run test:scale`: the scaled-out shape (scripts/lib/scale-shape.sh) on throwaway data, then the scale
# journeys in tests/e2e/scale through HAProxy. Reuses the production build in .next-test that `npm test` made.
set -euo pipefail
cd "$(dirname "$0")/.."
source scripts/lib/services.sh
source scripts/lib/scale-shape.sh

[ "$(id -u)" = 0 ] || { echo "Run as root: PostgreSQL and PgBouncer run as the postgres user." >&2; exit 1; }
bash scripts/ensure-system-packages.sh
[ -d node_modules/next ] || npm ci --no-audit --no-fund

export SCALE_DIR=$PWD/.tmp/scale
export SCALE_PRIMARY_PORT=${TEST_SCALE_PRIMARY_PORT:-55446} SCALE_STANDBY_PORT=${TEST_SCALE_STANDBY_PORT:-55447}
export SCALE_PGBOUNCER_PORT=${TEST_SCALE_PGBOUNCER_PORT:-6436} SCALE_HAPROXY_PORT=${TEST_SCALE_HAPROXY_PORT:-8086}
export SCALE_APP1_PORT=${TEST_SCALE_APP1_PORT:-3116} SCALE_APP2_PORT=${TEST_SCALE_APP2_PORT:-3126}
export SCALE_DIST_DIR=.next-test PG_FSYNC=off
SMTP_PORT=${TEST_SMTP_PORT:-1026} MAILDEV_WEB_PORT=${TEST_MAILDEV_PORT:-1081}
export SMTP_HOST=127.0.0.1 SMTP_PORT
export NEXTAUTH_SECRET="scale-secret-$(date +%s)-not-for-production"
# Wide enough that a paused replay (the test's proof that reads come from the replica) stays within it.
export DATABASE_REPLICA_MAX_LAG_SECONDS=30

for port in "$SCALE_PRIMARY_PORT" "$SCALE_STANDBY_PORT" "$SCALE_PGBOUNCER_PORT" "$SCALE_HAPROXY_PORT" "$SCALE_APP1_PORT" "$SCALE_APP2_PORT" "$SMTP_PORT" "$MAILDEV_WEB_PORT"; do
  if ss -ltn 2>/dev/null | grep -q "127.0.0.1:$port "; then echo "Port $port is in use; stop what runs there (or set TEST_SCALE_*_PORT)." >&2; exit 1; fi
done

maildev_pid=
cleanup() {
  scale_stop_all >/dev/null 2>&1 || true
  [ -n "$maildev_pid" ] && kill "$maildev_pid" 2>/dev/null
  rm -rf "$(scale_postgres_dir)" "$SCALE_DIR"
  PG_DIR=$SCALE_DIR/primary bash scripts/pg.sh destroy >/dev/null 2>&1 || true
}
trap cleanup EXIT
cleanup
mkdir -p "$SCALE_DIR"

maildev_pid=$(start_maildev "$SMTP_PORT" "$MAILDEV_WEB_PORT" "$SCALE_DIR/maildev.log")
scale_primary_start
echo "== migrate and seed (demo data)"
DATABASE_URL=$(scale_primary_url) migrate
DATABASE_URL=$(scale_primary_url) node --conditions=react-server --import tsx scripts/seed.ts --reset >/dev/null
scale_standby_start
scale_pgbouncer_start
if [ ! -f "$SCALE_DIST_DIR/BUILD_ID" ]; then
  echo "== production build (into $SCALE_DIST_DIR)"
  NEXT_DIST_DIR=$SCALE_DIST_DIR node_modules/.bin/next build >"$SCALE_DIR/build.log" 2>&1 || { tail -40 "$SCALE_DIR/build.log"; exit 1; }
fi
wait_for_url "http://127.0.0.1:$MAILDEV_WEB_PORT/api/email" 30
scale_app_env
scale_app_start APP1 "$SCALE_APP1_PORT" "$SCALE_DIR/app1.log" INBOUND_SMTP_PORT="${TEST_INBOUND_SMTP_PORT:-2526}"
scale_app_start APP2 "$SCALE_APP2_PORT" "$SCALE_DIR/app2.log" INBOUND_SMTP=off
wait_for_url "http://127.0.0.1:$SCALE_APP1_PORT/api/health" 90
wait_for_url "http://127.0.0.1:$SCALE_APP2_PORT/api/health" 90
scale_haproxy_start
wait_for_url "http://127.0.0.1:$SCALE_HAPROXY_PORT/api/health" 30

echo "== every process of the shape listens on loopback only"
bash scripts/lib/check-loopback.sh "${scale_pids[@]}" "$maildev_pid"

export SCALE_BASE_URL="http://127.0.0.1:$SCALE_HAPROXY_PORT"
export SCALE_APP1_URL="http://127.0.0.1:$SCALE_APP1_PORT" SCALE_APP2_URL="http://127.0.0.1:$SCALE_APP2_PORT"
export SCALE_APP1_PID SCALE_APP2_PID SCALE_STANDBY_DATA; SCALE_STANDBY_DATA=$(scale_standby_dir)
export SCALE_PRIMARY_URL; SCALE_PRIMARY_URL=$(scale_primary_url)
export SCALE_STANDBY_ADMIN_URL="postgres://postgres@127.0.0.1:$SCALE_STANDBY_PORT/$SCALE_DB"
export MAILDEV_URL="http://127.0.0.1:$MAILDEV_WEB_PORT"
echo "== vitest: scale journeys through HAProxy"
set +e
timeout 600 npx vitest run --project scale
status=$?
set -e
if [ $status -ne 0 ]; then
  for log in app1 app2; do echo "--- last lines of $log.log"; tail -30 "$SCALE_DIR/$log.log" || true; done
fi
exit $status
