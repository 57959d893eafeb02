#!/usr/bin/env bash
# The server the end-to-end tests drive: the production build on a fresh, seeded data dir.
set -euo pipefail
export SLIPWAY_DATA_DIR="${SLIPWAY_DATA_DIR:-$PWD/.e2e-data}"
export NEXT_TELEMETRY_DISABLED=1
# A second invented club, so the route-guard tests can check cross-club refusals.
export SLIPWAY_SEED_SECOND_CLUB=1
rm -rf "$SLIPWAY_DATA_DIR"
mkdir -p "$SLIPWAY_DATA_DIR"
SLIPWAY_SEED_LOAD_ATHLETES=44 node_modules/.bin/tsx --conditions=react-server scripts/seed.ts
exec node node_modules/next/dist/bin/next start -H 127.0.0.1 -p "${PORT:-3100}"
