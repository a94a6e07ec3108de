#!/usr/bin/env bash
# `npm test`: installs what is missing, then hands over to scripts/test.ts.
set -euo pipefail
cd "$(dirname "${BASH_SOURCE[0]}")/.."
# shellcheck source=scripts/ensure-system.sh
source scripts/ensure-system.sh
export NEXT_TELEMETRY_DISABLED=1
exec node_modules/.bin/tsx scripts/test.ts "$@"
