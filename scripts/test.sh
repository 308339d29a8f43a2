#!/usr/bin/env bash
set -euo pipefail
cd "$(dirname "$0")/.."
source scripts/lib/ensure-node-modules.sh
exec node_modules/.bin/tsx scripts/test.ts "$@"
