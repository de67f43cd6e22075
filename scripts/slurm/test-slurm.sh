#!/bin/bash
# `npm run test:slurm`: runs an ensemble through Slurm on a one-node cluster brought up here and
# compares the merged tables byte for byte with a local run. Needs root (Debian: installs
# slurm-wlm and munge when missing). The daemons run in a private network namespace with only
# the loopback interface, so they are reachable from nowhere else; on exit the script stops
# exactly the PIDs it started and removes its temporary directory. Not part of `npm test`.
set -euo pipefail
ROOT="$(cd "$(dirname "$0")/../.." && pwd)"
EXPERIMENT="${1:-$ROOT/examples/demo-ensemble.experiment.json}"
SHARDS="${SHARDS:-3}"

if [ "$(id -u)" != 0 ]; then echo "test:slurm: needs root (to install and run slurmctld, slurmd and munged)" >&2; exit 1; fi
if ! command -v slurmctld >/dev/null || ! command -v munged >/dev/null; then
  DEBIAN_FRONTEND=noninteractive apt-get install -y --no-install-recommends slurm-wlm munge
fi
if [ -z "${FIRNLINE_SLURM_NETNS:-}" ]; then
  exec env FIRNLINE_SLURM_NETNS=1 unshare --net --fork "$0" "$@"
fi
ip link set lo up
# Slurm resolves its listening address with AF_INET and AI_ADDRCONFIG, which glibc answers only
# when an IPv4 address other than 127.0.0.1 is configured: give the namespace's loopback one.
ip addr add 10.254.17.1/32 dev lo

START=$(date +%s)
D="$(mktemp -d /tmp/firnline-slurm-XXXXXX)"
chmod 700 "$D"
mkdir -p "$D/state" "$D/spool" "$D/work"
PIDS=()
cleanup() {
  local status=$?
  for pid in "${PIDS[@]}"; do kill "$pid" 2>/dev/null || true; done
  for pid in "${PIDS[@]}"; do wait "$pid" 2>/dev/null || true; done
  if [ "$status" != 0 ]; then
    echo "test:slurm: FAILED (exit $status); logs:" >&2
    for f in "$D"/*.log "$D"/work/slurm-*.out; do [ -f "$f" ] && { echo "== $f" >&2; tail -n 30 "$f" >&2; }; done
  fi
  rm -rf "$D"
  exit "$status"
}
trap cleanup EXIT

dd if=/dev/urandom of="$D/munge.key" bs=1024 count=1 status=none
chmod 600 "$D/munge.key"
munged --foreground --force --socket="$D/munge.socket" --key-file="$D/munge.key" \
  --pid-file="$D/munged.pid" --log-file="$D/munged.log" --seed-file="$D/munge.seed" &
PIDS+=($!)
for _ in $(seq 50); do [ -S "$D/munge.socket" ] && break; sleep 0.1; done

NODE=firnline1
cat > "$D/slurm.conf" <<CONF
ClusterName=firnline
SlurmctldHost=$(hostname -s)(127.0.0.1)
SlurmUser=root
SlurmdUser=root
SlurmctldPort=16817
SlurmdPort=16818
AuthType=auth/munge
AuthInfo=socket=$D/munge.socket
CredType=cred/munge
StateSaveLocation=$D/state
SlurmdSpoolDir=$D/spool
SlurmctldPidFile=$D/slurmctld.pid
SlurmdPidFile=$D/slurmd.pid
SlurmctldLogFile=$D/slurmctld.log
SlurmdLogFile=$D/slurmd.log
ProctrackType=proctrack/linuxproc
TaskPlugin=task/none
JobAcctGatherType=jobacct_gather/none
AccountingStorageType=accounting_storage/none
JobCompType=jobcomp/none
SchedulerType=sched/builtin
SelectType=select/cons_tres
SelectTypeParameters=CR_Core
ReturnToService=2
MpiDefault=none
NodeName=$NODE NodeHostname=$(hostname -s) NodeAddr=127.0.0.1 CPUs=$(nproc) State=UNKNOWN
PartitionName=main Nodes=$NODE Default=YES MaxTime=INFINITE State=UP
CONF
export SLURM_CONF="$D/slurm.conf"
slurmctld -D -i -f "$SLURM_CONF" &
PIDS+=($!)
slurmd -D -f "$SLURM_CONF" -N "$NODE" &
PIDS+=($!)
for _ in $(seq 60); do timeout 5 sinfo -h -o %T 2>/dev/null | grep -qE '^idle' && break; sleep 0.5; done
sinfo

cp "$EXPERIMENT" "$D/work/experiment.json"
cd "$D/work"
# An earlier attempt of array task 2 that stopped part-way (as before a requeue): its tables were
# never written and two members lost their completion markers. The task must resume from it.
node "$ROOT/bin/firnline.mjs" experiment "$D/work/experiment.json" --out "$D/work/out/shard-2" --shard "2/$SHARDS" --quiet
rm "$D/work/out/shard-2/experiment.csv" "$D/work/out/shard-2/outcomes.csv" "$D/work/out/shard-2/manifest.json"
ls -d "$D"/work/out/shard-2/*/ | head -n 2 | while read -r m; do rm "$m/member-done.json"; done
ARRAY=$(sbatch --parsable --array="1-$SHARDS" --cpus-per-task=1 --chdir="$D/work" \
  --export="ALL,EXPERIMENT=$D/work/experiment.json,OUT=$D/work/out,SHARDS=$SHARDS,FIRNLINE=$ROOT/bin/firnline.mjs" \
  "$ROOT/scripts/slurm/experiment-array.sh")
MERGE=$(sbatch --parsable --dependency="afterok:$ARRAY" --chdir="$D/work" \
  --export="ALL,OUT=$D/work/out,SHARDS=$SHARDS,FIRNLINE=$ROOT/bin/firnline.mjs" \
  "$ROOT/scripts/slurm/merge.sh")
echo "test:slurm: array job $ARRAY ($SHARDS shards), merge job $MERGE"
for _ in $(seq 1200); do
  queue="$(squeue -h -j "$ARRAY,$MERGE" 2>&1)" || { echo "test:slurm: squeue failed: $queue" >&2; exit 1; }
  [ -z "$queue" ] && break
  sleep 0.5
done
[ -f "$D/work/out/all/manifest.json" ] || { echo "test:slurm: the merge job wrote no manifest.json" >&2; exit 1; }
grep -q "found done" "$D/work/slurm-${ARRAY}_2.out" 2>/dev/null || grep -rq "found done" "$D/work"/slurm-*_2.out || {
  echo "test:slurm: array task 2 did not resume the earlier attempt's members" >&2; exit 1; }
echo "test:slurm: array task 2: $(cat "$D"/work/slurm-*_2.out)"

node "$ROOT/bin/firnline.mjs" experiment "$D/work/experiment.json" --out "$D/work/local" --quiet
for f in experiment.csv outcomes.csv manifest.json percentiles.csv; do
  if [ -f "$D/work/local/$f" ] || [ -f "$D/work/out/all/$f" ]; then
    cmp "$D/work/local/$f" "$D/work/out/all/$f"
  fi
done
echo "test:slurm: passed: merged Slurm output equals the local run byte for byte ($(( $(date +%s) - START )) s)"
