#!/usr/bin/env bash
# npm run dev: the API with the TypeScript compiler in watch mode and the Vite dev server
# (hot reload, proxying /api to the API).
source "$(dirname "$0")/lib/common.sh"
source "$(dirname "$0")/lib/server.sh"

export API_PORT="${API_PORT:-3001}"
ensure_node_modules
start_postgres
ensure_database linesmith
export DATABASE_URL="${DATABASE_URL:-$(database_url linesmith)}"
build_libs
(cd "$ROOT" && npm run -s build -w @linesmith/api)
(cd "$ROOT/apps/api" && node dist/database/seed.js)

cleanup() { kill 0 2>/dev/null || true; }
trap cleanup EXIT INT TERM
export SMTP_PORT="${SMTP_PORT:-2525}" APP_URL="${APP_URL:-http://localhost:${PORT:-5173}}"
start_fake_smtp "$SMTP_PORT" "$ROOT/.data/mail" "$ROOT/.data/fake-smtp.log"
(cd "$ROOT" && npx tsc -b -w libs/catalog libs/routing --preserveWatchOutput >/dev/null) &
(cd "$ROOT/apps/api" && npx tsc -p tsconfig.build.json -w --preserveWatchOutput >/dev/null) &
(cd "$ROOT/apps/api" && PORT="$API_PORT" node --watch-path=dist dist/main.js) &
(cd "$ROOT/apps/web" && npx vite --port "${PORT:-5173}") &
wait
