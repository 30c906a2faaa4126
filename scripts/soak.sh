#!/usr/bin/env bash
# npm run soak (not part of npm test or CI): load, a PostgreSQL restart under load, and two clients
# editing one draft, against a fresh linesmith_soak database. PostgreSQL runs as a private cluster
# on its own port, so restarting it disturbs nobody else's database.
export PGPORT="${SOAK_PGPORT:-55442}"
source "$(dirname "$0")/lib/common.sh"
source "$(dirname "$0")/lib/server.sh"

SOAK_PORT="${SOAK_PORT:-3600}"
SOAK_DB=linesmith_soak
stop_private_postgres() { as_pg "$(pg_bin)/pg_ctl" -D "$PG_DATA_DIR" -m fast stop >/dev/null 2>&1 || true; }
trap 'stop_server; stop_private_postgres' EXIT

ensure_node_modules
start_postgres
psql_admin -d postgres -c "DROP DATABASE IF EXISTS $SOAK_DB WITH (FORCE)"
ensure_database "$SOAK_DB"
build_all
DATABASE_URL="$(database_url "$SOAK_DB")"
log "migrating and loading the demo shop into $SOAK_DB"
migrate_and_seed "$DATABASE_URL" >/dev/null
export LOGIN_RATE_LIMIT=100000 LOG_LEVEL=warn
start_server "$SOAK_PORT" "$DATABASE_URL" "$ROOT/artifacts/soak-server.log"
log "soak against http://127.0.0.1:$SOAK_PORT (PostgreSQL on 127.0.0.1:$PGPORT)"
soak_status=0
(cd "$ROOT" && LINESMITH_URL="http://127.0.0.1:$SOAK_PORT" node bench/soak/soak.mjs) || soak_status=$?
# 10,000 fuzz cases with a fresh seed each run (printed with any failure; FUZZ_SEED=<n> replays it).
FUZZ_SEED="${FUZZ_SEED:-$(( (RANDOM << 15) | RANDOM ))}"
log "fuzzing the API: 10,000 cases, FUZZ_SEED=$FUZZ_SEED"
fuzz_status=0
(cd "$ROOT/apps/api" && DATABASE_URL="$DATABASE_URL" FUZZ_RUNS=10000 FUZZ_SEED="$FUZZ_SEED" npx jest test/fuzz.e2e-spec.ts --runInBand) || fuzz_status=$?
exit $(( soak_status != 0 ? soak_status : fuzz_status ))
