#!/usr/bin/env bash
#SBATCH --job-name=pithy-eval
#SBATCH --array=0-3
#SBATCH --cpus-per-task=2
#SBATCH --time=02:00:00
#SBATCH --output=pithy-eval-%A_%a.out
#
# One shard of a pithy evaluation per array task: pithy reads SLURM_ARRAY_TASK_ID and
# SLURM_ARRAY_TASK_COUNT itself and solves only its share of the tasks. Change the number of
# shards with --array on the sbatch command line (0-99 for 100 shards).
#
# Settings come from the environment, which sbatch passes on from the submitting shell:
#   TASKS        the folder of task JSON files (required)
#   RESULTS_DIR  where each shard writes shard-<array id>.jsonl (default: results)
#   PITHY        how to call pithy (default: pithy; e.g. "node /path/to/pithy/bin/pithy.js")
#   PITHY_FLAGS  the settings, the same for every shard (default: --time-limit 20 --attempts 2)
#
# A shard that is cancelled, times out or is killed keeps every finished task: submitting the
# same array again resumes each shard where it stopped.
set -euo pipefail
: "${TASKS:?set TASKS to the folder of task files}"
RESULTS_DIR=${RESULTS_DIR:-results}
PITHY=${PITHY:-pithy}
PITHY_FLAGS=${PITHY_FLAGS:---time-limit 20 --attempts 2}
mkdir -p "$RESULTS_DIR"
# exec: Slurm's SIGTERM at the time limit reaches pithy, which keeps what it finished.
# shellcheck disable=SC2086 # PITHY and PITHY_FLAGS are word lists
exec $PITHY eval "$TASKS" --jobs "${SLURM_CPUS_PER_TASK:-1}" --results "$RESULTS_DIR/shard-$SLURM_ARRAY_TASK_ID.jsonl" $PITHY_FLAGS
