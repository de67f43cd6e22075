#!/bin/bash
# Slurm job that merges the shards of scripts/slurm/experiment-array.sh once all array tasks
# ended well: sbatch --dependency=afterok:<array job id> --export=ALL,OUT=out/dir,SHARDS=N scripts/slurm/merge.sh
#SBATCH --job-name=firnline-merge
#SBATCH --output=slurm-%j-merge.out
set -euo pipefail
: "${OUT:?OUT must name the output directory}"
: "${SHARDS:?SHARDS must give the number of shards}"
FIRNLINE="${FIRNLINE:-$(dirname "$0")/../../bin/firnline.mjs}"
dirs=()
for k in $(seq 1 "$SHARDS"); do dirs+=("$OUT/shard-$k"); done
exec node "$FIRNLINE" merge "${dirs[@]}" --out "$OUT/all"
