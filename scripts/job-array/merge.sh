#!/bin/sh
# After every task of the array: merges the part files in PARTS_DIR into one result (RESULT, JSON),
# plus whatever MERGE_ARGS asks for (e.g. --report report.html --figures figures).
set -eu
: "${PARTS_DIR:?set PARTS_DIR}"
# shellcheck disable=SC2086
exec ${RETURNRATE:-returnrate} merge "$PARTS_DIR"/*.part-*.json --json "${RESULT:-result.json}" ${MERGE_ARGS:-} --quiet
