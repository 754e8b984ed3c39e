#!/usr/bin/env bash
# Starts a single-node Slurm cluster for the cluster test, everything under DIR: munge with a
# fresh key on its own socket, then slurmctld and slurmd with a minimal configuration (process
# tracking by /proc, no task plugin, the node sized from nproc), on free ports. Writes
# DIR/slurm.conf and DIR/pids (the process id of each daemon started, one a line) and waits
# until the node takes jobs. Needs root and Debian's slurm-wlm and munge packages.
# Stop it with tests/cluster/stop-slurm.sh DIR.
set -euo pipefail
dir=${1:?usage: start-slurm.sh DIR}
here=$(cd "$(dirname "$0")" && pwd)
mkdir -p "$dir"/munge "$dir"/state "$dir"/spool "$dir"/log
chmod 700 "$dir" "$dir"/munge
: > "$dir/pids"
trap 'echo "start-slurm.sh: failed; logs in $dir/log" >&2; "$here/stop-slurm.sh" "$dir"' ERR

# munge: a fresh key, readable by root only.
head -c 1024 /dev/urandom > "$dir/munge/munge.key"
chmod 400 "$dir/munge/munge.key"
munged --foreground --force --key-file="$dir/munge/munge.key" --socket="$dir/munge/socket" \
  --pid-file="$dir/munge/munged.pid" --log-file="$dir/log/munged.log" --seed-file="$dir/munge/seed" \
  >> "$dir/log/munged.out" 2>&1 &
echo $! >> "$dir/pids"
for _ in $(seq 100); do [ -S "$dir/munge/socket" ] && break; sleep 0.1; done
[ -S "$dir/munge/socket" ] || { echo "munged did not start" >&2; false; }

host=$(hostname -s)
port=$(( 20000 + RANDOM % 20000 ))
cat > "$dir/slurm.conf" <<CONF
ClusterName=pithytest
SlurmctldHost=$host(127.0.0.1)
SlurmctldPort=$port
SlurmdPort=$(( port + 1 ))
SlurmUser=root
SlurmdUser=root
AuthType=auth/munge
AuthInfo=socket=$dir/munge/socket
CredType=cred/munge
ProctrackType=proctrack/linuxproc
TaskPlugin=task/none
JobAcctGatherType=jobacct_gather/none
AccountingStorageType=accounting_storage/none
SelectType=select/cons_tres
SelectTypeParameters=CR_Core
SchedulerType=sched/backfill
MpiDefault=none
ReturnToService=2
StateSaveLocation=$dir/state
SlurmdSpoolDir=$dir/spool
SlurmctldPidFile=$dir/slurmctld.pid
SlurmdPidFile=$dir/slurmd.pid
SlurmctldLogFile=$dir/log/slurmctld.log
SlurmdLogFile=$dir/log/slurmd.log
NodeName=$host NodeAddr=127.0.0.1 CPUs=$(nproc) State=UNKNOWN
PartitionName=test Nodes=$host Default=YES MaxTime=INFINITE State=UP
CONF
export SLURM_CONF="$dir/slurm.conf"

slurmctld -D -i -f "$SLURM_CONF" >> "$dir/log/slurmctld.out" 2>&1 &
echo $! >> "$dir/pids"
for _ in $(seq 150); do scontrol ping 2>/dev/null | grep -q UP && break; sleep 0.2; done
slurmd -D -f "$SLURM_CONF" >> "$dir/log/slurmd.out" 2>&1 &
echo $! >> "$dir/pids"
for _ in $(seq 150); do
  state=$(sinfo -h -n "$host" -o %T 2>/dev/null || true)
  case "$state" in idle*|mixed*|allocated*) break ;; esac
  sleep 0.2
done
case "$state" in
  idle*|mixed*|allocated*) echo "slurm up: node $host, $(nproc) CPUs, SLURM_CONF=$SLURM_CONF" >&2 ;;
  *) echo "the Slurm node did not become ready (state '$state')" >&2; false ;;
esac
