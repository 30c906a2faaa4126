#!/usr/bin/env bash
# npm run bench: benchmarks of the engine, the adapter solver, the API (against PostgreSQL), the
# spreadsheet export, the web bundle and the sketch editor. Prints one table and writes
# bench/results.json. Uses a fresh linesmith_bench database and a private port.
source "$(dirname "$0")/lib/common.sh"
source "$(dirname "$0")/lib/server.sh"

BENCH_PORT="${BENCH_PORT:-3500}"
BENCH_DB=linesmith_bench
trap stop_server EXIT

ensure_node_modules
start_postgres
psql_admin -d postgres -c "DROP DATABASE IF EXISTS $BENCH_DB WITH (FORCE)"
ensure_database "$BENCH_DB"
ensure_chromium
build_all
DATABASE_URL="$(database_url "$BENCH_DB")"
log "migrating and loading the demo shop into $BENCH_DB"
migrate_and_seed "$DATABASE_URL" >/dev/null
# Sign-ins are not what is measured; request logging at info would measure the log writer.
export LOGIN_RATE_LIMIT=100000 LOG_LEVEL=warn
start_server "$BENCH_PORT" "$DATABASE_URL" "$ROOT/artifacts/bench-server.log"
log "benchmarks against http://127.0.0.1:$BENCH_PORT"
cd "$ROOT" && LINESMITH_URL="http://127.0.0.1:$BENCH_PORT" node bench/run.mjs
