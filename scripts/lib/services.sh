# Shell helpers shared by scripts/demo.sh and scripts/test.sh (sourced, not run).

wait_for_url() { # url seconds
  local url=$1 deadline=$((SECONDS + ${2:-60}))
  until curl -fsS -o /dev/null "$url" 2>/dev/null; do
    [ $SECONDS -lt $deadline ] || { echo "Timed out waiting for $url" >&2; return 1; }
    sleep 0.5
  done
}

start_maildev() { # smtp_port web_port log
  node_modules/.bin/maildev --ip 127.0.0.1 --web-ip 127.0.0.1 --smtp "$1" --web "$2" --mail-directory "$(mktemp -d)" >"$3" 2>&1 &
  echo $!
}

start_s3_fake() { # port dir log
  if [ -f scripts/s3-fake.ts ]; then
    S3_PORT=$1 S3_FAKE_DIR=$2 node --import tsx scripts/s3-fake.ts >"$3" 2>&1 &
    echo $!
  fi
}

# The PID of the postmaster of the cluster scripts/pg.sh manages (PG_DIR from env).
pg_pid() { bash scripts/pg.sh status 2>/dev/null | sed -n 's/.*(PID: \([0-9]*\)).*/\1/p'; }

migrate() { node --import tsx node_modules/knex/bin/cli.js --knexfile knexfile.ts migrate:latest >/dev/null; }
