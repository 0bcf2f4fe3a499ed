#!/bin/sh
# One task of a job array: analyses part TASK_ID (0-based) of INPUT in chunks of CHUNK symbols and
# writes its part file (returnrate.part/1) into PARTS_DIR. Under Slurm, TASK_ID defaults to
# SLURM_ARRAY_TASK_ID. RETURNRATE_ARGS holds reading and analysis options (the same in every task).
# The number of tasks is "parts" of: returnrate analyze INPUT --chunk CHUNK $RETURNRATE_ARGS --plan
set -eu
task="${TASK_ID:-${SLURM_ARRAY_TASK_ID:-}}"
: "${task:?set TASK_ID, or run as a Slurm array task}"
: "${INPUT:?set INPUT}" "${CHUNK:?set CHUNK}" "${PARTS_DIR:?set PARTS_DIR}"
# RETURNRATE may be a command with arguments (e.g. "node /opt/returnrate/bin/returnrate.mjs").
# shellcheck disable=SC2086
exec ${RETURNRATE:-returnrate} analyze "$INPUT" ${RETURNRATE_ARGS:-} --chunk "$CHUNK" --parts-out "$PARTS_DIR" --part "$task" --quiet
