#!/usr/bin/env bash
# npm start: install what is missing, start PostgreSQL, migrate, load the demo shop, serve the app.
source "$(dirname "$0")/lib/common.sh"
source "$(dirname "$0")/lib/server.sh"

PORT="${PORT:-3000}"
ensure_node_modules
start_postgres
ensure_database linesmith
DATABASE_URL="${DATABASE_URL:-$(database_url linesmith)}"
build_all
log "migrating and loading the demo shop"
migrate_and_seed "$DATABASE_URL"

cat <<INFO

  Linesmith is running at http://localhost:$PORT  (API docs: http://localhost:$PORT/api/docs)

  Demo sign-ins (demo only; password for all: linesmith-demo)
    owner@tidewater.example   Dana Whitcombe   admin
    fab@tidewater.example     Rafe Okonkwo     fabricator
    parts@tidewater.example   Maribel Soto     parts clerk
    lead@tidewater.example    Hollis Brandt    reviewer

  Stop with Ctrl+C. PostgreSQL keeps running on 127.0.0.1:$PGPORT (data in $PG_DATA_DIR).

INFO
cd "$ROOT" && PORT="$PORT" DATABASE_URL="$DATABASE_URL" exec node apps/api/dist/main.js
