#!/usr/bin/env bash
# Stops the daemons tests/cluster/start-slurm.sh started, by the process ids it wrote to
# DIR/pids (last started first), and waits for them to end. Safe to run twice.
dir=${1:?usage: stop-slurm.sh DIR}
[ -f "$dir/pids" ] || exit 0
pids=$(tac "$dir/pids")
for pid in $pids; do kill "$pid" 2>/dev/null || true; done
for pid in $pids; do
  for _ in $(seq 50); do kill -0 "$pid" 2>/dev/null || break; sleep 0.1; done
  kill -9 "$pid" 2>/dev/null || true
done
: > "$dir/pids"
