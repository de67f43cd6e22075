#!/bin/bash
# Slurm job-array script for a firnline experiment: array task K of N runs shard K/N into
# $OUT/shard-K, resuming what an earlier (requeued) attempt of the same task finished.
# Submit (see docs/cluster.md):
#   sbatch --array=1-N --export=ALL,EXPERIMENT=file.json,OUT=out/dir,FIRNLINE=/path/to/firnline/bin/firnline.mjs \
#     scripts/slurm/experiment-array.sh
#SBATCH --job-name=firnline-shard
#SBATCH --requeue
#SBATCH --cpus-per-task=2
#SBATCH --output=slurm-%A_%a.out
set -euo pipefail
: "${EXPERIMENT:?EXPERIMENT must name the experiment file}"
: "${OUT:?OUT must name the output directory}"
FIRNLINE="${FIRNLINE:-$(dirname "$0")/../../bin/firnline.mjs}"
K="${SLURM_ARRAY_TASK_ID:?run this script as an array job (sbatch --array=1-N)}"
N="${SLURM_ARRAY_TASK_COUNT:-${SHARDS:?set SHARDS when Slurm does not give SLURM_ARRAY_TASK_COUNT}}"
JOBS="${SLURM_CPUS_PER_TASK:-1}"
# --resume: a requeued task reruns only the members it had not finished (their completion
# marker is missing); without an earlier attempt it runs them all.
exec node "$FIRNLINE" experiment "$EXPERIMENT" --out "$OUT/shard-$K" --shard "$K/$N" --jobs "$JOBS" --resume --quiet
