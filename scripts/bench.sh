#!/usr/bin/env bash
# npm run bench: benchmarks of the engine, the adapter solver and (with the database) the API.
source "$(dirname "$0")/lib/common.sh"
ensure_node_modules
cd "$ROOT" && node bench/run.mjs
