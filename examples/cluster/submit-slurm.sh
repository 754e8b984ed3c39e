#!/usr/bin/env bash
# Submits the evaluation as a Slurm array job and the merge as a job that starts once every
# shard has succeeded. Arguments go to the array's sbatch (e.g. --array=0-99 --time=04:00:00).
#   TASKS=../shared/datasets/arc-agi-1-training examples/cluster/submit-slurm.sh --array=0-99
set -euo pipefail
here=$(cd "$(dirname "$0")" && pwd)
array=$(sbatch --parsable "$@" "$here/slurm-eval.sh")
array=${array%%;*}
merge=$(sbatch --parsable --dependency="afterok:$array" "$here/slurm-merge.sh")
echo "array job $array, merge job ${merge%%;*} (runs when every shard has succeeded)"
