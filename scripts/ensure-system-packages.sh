#!/usr/bin/env bash
# Debian packages the app and its tests need: PostgreSQL, Chromium, poppler (pdftotext), fonts for PDFs,
# and HAProxy and PgBouncer for the scaled-out shape (npm run demo:scale, npm run test:scale).
set -euo pipefail
need=()
ls /usr/lib/postgresql/*/bin/initdb >/dev/null 2>&1 || need+=(postgresql)
[ -x /usr/bin/chromium ] || need+=(chromium)
command -v pdftotext >/dev/null 2>&1 || need+=(poppler-utils)
[ -f /usr/share/fonts/truetype/dejavu/DejaVuSans.ttf ] || need+=(fonts-dejavu-core)
command -v haproxy >/dev/null 2>&1 || [ -x /usr/sbin/haproxy ] || need+=(haproxy)
command -v pgbouncer >/dev/null 2>&1 || [ -x /usr/sbin/pgbouncer ] || need+=(pgbouncer)
if [ ${#need[@]} -gt 0 ]; then
  if [ "$(id -u)" != 0 ]; then echo "Missing Debian packages: ${need[*]} (run as root to install)" >&2; exit 1; fi
  echo "Installing Debian packages: ${need[*]}"
  export DEBIAN_FRONTEND=noninteractive
  apt-get update -qq
  apt-get install -y -qq "${need[@]}" >/dev/null
fi
