#!/usr/bin/env bash
# Fails when a process in the given process trees listens on an address other than loopback.
#   bash scripts/lib/check-loopback.sh PID...
# Lists the TCP and UDP sockets in LISTEN state (ss -ltunpH), keeps those owned by the PIDs or their
# descendants, and prints every one bound to anything but 127.0.0.0/8 or ::1 (0.0.0.0, ::, *, a LAN address).
set -euo pipefail
[ $# -gt 0 ] || { echo "usage: $0 PID..." >&2; exit 2; }

declare -A tree=()
for pid in "$@"; do [ -n "$pid" ] && tree[$pid]=1; done
# Children of children: repeat over the process table until the set stops growing.
table=$(ps -e -o pid=,ppid=)
while :; do
  grown=0
  while read -r pid ppid; do
    if [ -n "${tree[$ppid]:-}" ] && [ -z "${tree[$pid]:-}" ]; then tree[$pid]=1; grown=1; fi
  done <<<"$table"
  [ $grown = 1 ] || break
done

bad=0 checked=0
while read -r line; do
  [ -n "$line" ] || continue
  owners=$(grep -o 'pid=[0-9]*' <<<"$line" | cut -d= -f2 || true)
  mine=0
  for pid in $owners; do [ -n "${tree[$pid]:-}" ] && mine=1; done
  [ $mine = 1 ] || continue
  checked=$((checked + 1))
  local_address=$(awk '{print $5}' <<<"$line")
  case "$local_address" in
    127.*|\[::1\]:*|\[::ffff:127.*) ;;
    *) echo "Listening outside loopback: $line" >&2; bad=1 ;;
  esac
done < <(ss -ltunpH)

[ $bad = 0 ] || { echo "Bind every service to 127.0.0.1 (see README, Configuration)." >&2; exit 1; }
echo "Loopback check: $checked listening sockets of ${#tree[@]} processes, all on 127.0.0.1/::1"
