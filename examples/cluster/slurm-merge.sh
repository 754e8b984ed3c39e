#!/usr/bin/env bash
#SBATCH --job-name=pithy-merge
#SBATCH --cpus-per-task=1
#SBATCH --time=00:15:00
#SBATCH --output=pithy-merge-%j.out
#
# Merges the shards of slurm-eval.sh into RESULTS_DIR/merged.jsonl and prints the summary of
# the whole run; submit it as a job that depends on the array (submit-slurm.sh does). It fails,
# naming them, when shards or tasks are missing, a task appears twice, or the shards' settings
# differ. Same environment as slurm-eval.sh.
set -euo pipefail
: "${TASKS:?set TASKS to the folder of task files}"
RESULTS_DIR=${RESULTS_DIR:-results}
PITHY=${PITHY:-pithy}
# shellcheck disable=SC2086
exec $PITHY merge "$RESULTS_DIR"/shard-*.jsonl --tasks "$TASKS" --output "$RESULTS_DIR/merged.jsonl"
