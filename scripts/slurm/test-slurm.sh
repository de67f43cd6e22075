#!/bin/bash
# `npm run test:slurm` (also run by .ci/run): runs an ensemble through Slurm on a one-node cluster
# brought up here and compares the merged tables byte for byte with a local run. Needs root
# (Debian: installs slurm-wlm and munge when missing). The daemons run in a private network
# namespace with only the loopback interface, so they are reachable from nowhere else; on exit the
# script stops exactly the PIDs it started and removes its temporary directory.
#
# Two kinds of ending (docs/cluster.md):
#   - the cluster cannot be brought up here (not root, no apt-get or packages, no network
#     namespace, daemons that do not start): "SLURM TEST NOT RUN: <reason>" and the failing
#     command's output on stderr, exit 0; exit 1 when FIRNLINE_REQUIRE_SLURM=1;
#   - once the node is up, any failed job, missed resume or byte difference fails (exit 1).
set -euo pipefail
ROOT="$(cd "$(dirname "$0")/../.." && pwd)"
EXPERIMENT="${1:-$ROOT/examples/demo-ensemble.experiment.json}"
SHARDS="${SHARDS:-3}"
APT_TIMEOUT="${FIRNLINE_SLURM_APT_TIMEOUT:-900}"

# not_run REASON [FILE]: the environment cannot run the test (not a test failure).
not_run() {
  NOT_RUN=1
  {
    echo "================================================================================"
    echo "SLURM TEST NOT RUN: $1"
    if [ -n "${2:-}" ] && [ -s "$2" ]; then
      echo "---- last lines of $(basename "$2") ----"
      tail -n 25 "$2"
    fi
    echo "================================================================================"
  } >&2
  if [ "${FIRNLINE_REQUIRE_SLURM:-0}" = 1 ]; then
    echo "test:slurm: FIRNLINE_REQUIRE_SLURM=1, so not running the test is a failure" >&2
    exit 1
  fi
  exit 0
}
# fail MESSAGE: the cluster is up and the test itself went wrong.
fail() {
  echo "test:slurm: FAILED: $1" >&2
  exit 1
}
NOT_RUN=0

if [ -z "${FIRNLINE_SLURM_NETNS:-}" ]; then
  # Outside the namespace: root, packages, and whether a network namespace can be made at all.
  [ "$(id -u)" = 0 ] || not_run "needs root to install and run munged, slurmctld and slurmd (running as uid $(id -u))"
  LOG="$(mktemp /tmp/firnline-slurm-setup-XXXXXX.log)"
  trap 'rm -f "$LOG"' EXIT
  missing=()
  for tool in slurmctld slurmd munged sbatch squeue sinfo scontrol; do command -v "$tool" >/dev/null || missing+=("$tool"); done
  packages=()
  [ ${#missing[@]} -eq 0 ] || packages+=(slurm-wlm munge)
  command -v ip >/dev/null || packages+=(iproute2)
  command -v unshare >/dev/null || packages+=(util-linux)
  if [ ${#packages[@]} -gt 0 ]; then
    command -v apt-get >/dev/null || not_run "missing ${missing[*]:-ip/unshare} and there is no apt-get to install ${packages[*]}"
    echo "test:slurm: installing ${packages[*]} (apt-get, at most ${APT_TIMEOUT} s per step)" >&2
    apt_get() { DEBIAN_FRONTEND=noninteractive timeout "$APT_TIMEOUT" apt-get -o DPkg::Lock::Timeout=120 "$@" >>"$LOG" 2>&1; }
    # A clean machine may have no package lists yet: update only when the install fails.
    if ! apt_get install -y --no-install-recommends "${packages[@]}"; then
      apt_get update || not_run "apt-get update failed (exit $?)" "$LOG"
      apt_get install -y --no-install-recommends "${packages[@]}" || not_run "apt-get install ${packages[*]} failed (exit $?)" "$LOG"
    fi
    for tool in slurmctld slurmd munged sbatch squeue sinfo scontrol ip unshare; do
      command -v "$tool" >/dev/null || not_run "$tool is still missing after installing ${packages[*]}" "$LOG"
    done
  fi
  unshare --net --fork true >"$LOG" 2>&1 || not_run "cannot make a private network namespace: 'unshare --net --fork true' failed" "$LOG"
  rm -f "$LOG"
  trap - EXIT
  exec env FIRNLINE_SLURM_NETNS=1 unshare --net --fork "$0" "$@"
fi

START=$(date +%s)
D="$(mktemp -d /tmp/firnline-slurm-XXXXXX)"
chmod 700 "$D"
mkdir -p "$D/state" "$D/spool" "$D/work"
PIDS=()
cleanup() {
  local status=$?
  for pid in "${PIDS[@]}"; do kill "$pid" 2>/dev/null || true; done
  for pid in "${PIDS[@]}"; do wait "$pid" 2>/dev/null || true; done
  if [ "$status" != 0 ] && [ "$NOT_RUN" = 0 ]; then
    echo "test:slurm: FAILED (exit $status); logs:" >&2
    for f in "$D"/*.log "$D"/*.console "$D"/work/slurm-*.out; do [ -f "$f" ] && { echo "== $f" >&2; tail -n 30 "$f" >&2; }; done
  fi
  rm -rf "$D"
  exit "$status"
}
trap cleanup EXIT

ip link set lo up >"$D/ip.log" 2>&1 || not_run "cannot bring up the loopback interface in the network namespace" "$D/ip.log"
# Slurm resolves its listening address with AF_INET and AI_ADDRCONFIG, which glibc answers only
# when an IPv4 address other than 127.0.0.1 is configured: give the namespace's loopback one.
ip addr add 10.254.17.1/32 dev lo >"$D/ip.log" 2>&1 || not_run "cannot add 10.254.17.1/32 to the namespace's loopback" "$D/ip.log"

dd if=/dev/urandom of="$D/munge.key" bs=1024 count=1 status=none
chmod 600 "$D/munge.key"
munged --foreground --force --socket="$D/munge.socket" --key-file="$D/munge.key" \
  --pid-file="$D/munged.pid" --log-file="$D/munged.log" --seed-file="$D/munge.seed" >"$D/munged.console" 2>&1 &
PIDS+=($!)
for _ in $(seq 100); do [ -S "$D/munge.socket" ] && break; sleep 0.1; done
if [ ! -S "$D/munge.socket" ]; then
  cat "$D/munged.console" >>"$D/munged.log" 2>/dev/null || true
  not_run "munged did not open its socket within 10 s" "$D/munged.log"
fi

NODE=firnline1
HOST="$(hostname -s 2>/dev/null || uname -n)"
cat > "$D/slurm.conf" <<CONF
ClusterName=firnline
SlurmctldHost=$HOST(127.0.0.1)
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
NodeName=$NODE NodeHostname=$HOST NodeAddr=127.0.0.1 CPUs=$(nproc) State=UNKNOWN
PartitionName=main Nodes=$NODE Default=YES MaxTime=INFINITE State=UP
CONF
export SLURM_CONF="$D/slurm.conf"
slurmctld -D -i -f "$SLURM_CONF" >"$D/slurmctld.console" 2>&1 &
CTLD=$!
PIDS+=($CTLD)
slurmd -D -f "$SLURM_CONF" -N "$NODE" >"$D/slurmd.console" 2>&1 &
SLURMD=$!
PIDS+=($SLURMD)
exited=""
for _ in $(seq 120); do
  timeout 5 sinfo -h -o %T 2>/dev/null | grep -qE '^idle' && break
  kill -0 "$CTLD" 2>/dev/null || exited="slurmctld exited; "
  kill -0 "$SLURMD" 2>/dev/null || exited="${exited}slurmd exited; "
  [ -z "$exited" ] || break
  sleep 0.5
done
if ! timeout 5 sinfo -h -o %T 2>/dev/null | grep -qE '^idle'; then
  {
    echo "sinfo: $(timeout 5 sinfo -h -o '%N %T' 2>&1 || true)"
    for f in slurmctld slurmd; do
      echo "== $f (log and console)"
      tail -n 10 "$D/$f.log" 2>/dev/null || true
      tail -n 5 "$D/$f.console" 2>/dev/null || true
    done
  } >"$D/bringup.txt"
  if [ -n "$exited" ]; then
    not_run "node $NODE never came up: ${exited%; } (daemon output below)" "$D/bringup.txt"
  fi
  not_run "slurmctld and slurmd did not bring node $NODE up (idle) within 60 s" "$D/bringup.txt"
fi
echo "test:slurm: one-node cluster up: $(sinfo -h -o '%N %T, %c CPUs')"

# The members are slowed down with short time steps (same experiment otherwise): a member must take
# long enough that the requeue below lands between the first and the last member of a task on any
# machine (the demo's members take well under 0.1 s on a fast core).
node -e '
  const fs = require("node:fs");
  const [from, to] = process.argv.slice(1);
  const experiment = JSON.parse(fs.readFileSync(from, "utf8"));
  experiment.base.numerics = { ...experiment.base.numerics, maxStepYears: 0.005 };
  fs.writeFileSync(to, JSON.stringify(experiment, null, 2));
' "$EXPERIMENT" "$D/work/experiment.json" || fail "could not write the slowed experiment file"
cd "$D/work"
FIRNLINE="$ROOT/bin/firnline.mjs"
# An earlier attempt of array task 2 that stopped part-way (as before a requeue): its tables were
# never written and two members lost their completion markers. The task must resume from it.
node "$FIRNLINE" experiment "$D/work/experiment.json" --out "$D/work/out/shard-2" --shard "2/$SHARDS" --quiet
rm "$D/work/out/shard-2/experiment.csv" "$D/work/out/shard-2/outcomes.csv" "$D/work/out/shard-2/manifest.json"
ls -d "$D"/work/out/shard-2/*/ | head -n 2 | while read -r m; do rm "$m/member-done.json"; done
ARRAY=$(sbatch --parsable --array="1-$SHARDS" --cpus-per-task=1 --chdir="$D/work" \
  --export="ALL,EXPERIMENT=$D/work/experiment.json,OUT=$D/work/out,SHARDS=$SHARDS,FIRNLINE=$FIRNLINE" \
  "$ROOT/scripts/slurm/experiment-array.sh") || fail "sbatch of the array job failed"
MERGE=$(sbatch --parsable --dependency="afterok:$ARRAY" --kill-on-invalid-dep=yes --chdir="$D/work" \
  --export="ALL,OUT=$D/work/out,SHARDS=$SHARDS,FIRNLINE=$FIRNLINE" \
  "$ROOT/scripts/slurm/merge.sh") || fail "sbatch of the merge job failed"
echo "test:slurm: array job $ARRAY ($SHARDS shards), merge job $MERGE"

# Requeue: once array task 1 has finished some members, `scontrol requeue` stops it and puts it
# back in the queue; the new attempt must keep those members (same files, same inodes) and run
# only the rest. The markers (and each member's profiles.csv) are noted just before the requeue.
task_state() { scontrol -o show job "${ARRAY}_1" 2>/dev/null | grep -o "JobState=[A-Z_]*" | head -n 1 | cut -d= -f2 || true; }
REQUEUED_WITH=-1
for _ in $(seq 1800); do
  state="$(task_state)"
  done_now=$(find "$D/work/out/shard-1" -name member-done.json 2>/dev/null | wc -l || true)
  if [ "$state" = RUNNING ] && [ "$done_now" -ge 1 ]; then
    for marker in "$D"/work/out/shard-1/*/member-done.json; do
      stat -c '%n %i %y' "$marker" "$(dirname "$marker")/profiles.csv"
    done >"$D/before-requeue.txt"
    REQUEUED_WITH=$(grep -c 'member-done.json' "$D/before-requeue.txt" || true)
    scontrol requeue "${ARRAY}_1" || fail "scontrol requeue ${ARRAY}_1 failed"
    # Slurm holds a requeued job back (Reason=BeginTime, about two minutes on) once it has ended
    # its first attempt: let it start at once.
    for _ in $(seq 100); do
      scontrol -o show job "${ARRAY}_1" 2>/dev/null | grep -q 'Reason=BeginTime' && break
      sleep 0.1
    done
    scontrol update JobId="${ARRAY}_1" StartTime=now || fail "scontrol update StartTime=now of the requeued ${ARRAY}_1 failed"
    break
  fi
  case "$state" in COMPLETED | FAILED | CANCELLED | TIMEOUT | NODE_FAIL | OUT_OF_MEMORY) break ;; esac
  sleep 0.1
done
[ "$REQUEUED_WITH" -ge 1 ] || fail "array task 1 was never seen running with a finished member (state ${state:-unknown}), so it could not be requeued mid-run"
echo "test:slurm: requeued array task ${ARRAY}_1 with $REQUEUED_WITH members finished"

for _ in $(seq 1200); do
  queue="$(squeue -h -j "$ARRAY,$MERGE" -o '%i %T %r' 2>&1)" || fail "squeue failed: $queue"
  [ -z "$queue" ] && break
  sleep 0.5
done
[ -z "$queue" ] || fail "jobs still queued after 10 minutes: $queue"
states="$(scontrol -o show job "$ARRAY" 2>/dev/null | grep -o 'ArrayTaskId=[0-9]*\|JobState=[A-Z_]*\|ExitCode=[0-9:]*' | paste -sd' ' - || true)"
[ -f "$D/work/out/all/manifest.json" ] || fail "the merge job wrote no manifest.json (array: $states)"

grep -q "found done" "$D"/work/slurm-*_2.out || fail "array task 2 did not resume the earlier attempt's members"
echo "test:slurm: array task 2: $(cat "$D"/work/slurm-*_2.out)"
restarts=$(scontrol -o show job "${ARRAY}_1" | grep -o 'Restarts=[0-9]*' | cut -d= -f2 || true)
[ "${restarts:-0}" -ge 1 ] || fail "array task 1 shows Restarts=${restarts:-?} after scontrol requeue"
found=$(grep -o '[0-9]* found done' "$D"/work/slurm-*_1.out | cut -d' ' -f1 || true)
[ -n "$found" ] && [ "$found" -ge "$REQUEUED_WITH" ] ||
  fail "requeued array task 1 found ${found:-no} members done, but $REQUEUED_WITH were finished before the requeue: $(cat "$D"/work/slurm-*_1.out)"
shard_size=$(grep -o 'ran [0-9]* of' "$D"/work/slurm-*_1.out | cut -d' ' -f2 || true)
[ "$found" -lt "${shard_size:-0}" ] || fail "the requeue came after array task 1 had finished all ${shard_size:-?} members, so no resume was tested"
while read -r path inode rest; do
  now="$(stat -c '%n %i %y' "$path" 2>/dev/null)" || fail "$path vanished after the requeue"
  [ "$now" = "$path $inode $rest" ] || fail "requeued array task 1 rewrote a finished member's file: before '$path $inode $rest', after '$now'"
done <"$D/before-requeue.txt"
echo "test:slurm: array task 1 (requeued, Restarts=$restarts): $(cat "$D"/work/slurm-*_1.out)"

node "$FIRNLINE" experiment "$D/work/experiment.json" --out "$D/work/local" --quiet
compared=0
for f in experiment.csv outcomes.csv manifest.json percentiles.csv; do
  if [ -f "$D/work/local/$f" ] || [ -f "$D/work/out/all/$f" ]; then
    cmp "$D/work/local/$f" "$D/work/out/all/$f" || fail "merged $f differs from the local run's"
    compared=$((compared + 1))
  fi
done
[ "$compared" -ge 3 ] || fail "only $compared tables to compare"
echo "test:slurm: passed: merged Slurm output (task 1 requeued mid-run, task 2 resumed) equals the local run byte for byte ($compared files, $(( $(date +%s) - START )) s)"
