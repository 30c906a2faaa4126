# Start and stop the built API (which also serves the built web app). Source after common.sh.

# start_server <port> <database url> <log file>: starts in the background, waits for /api/health.
start_server() {
  local port="$1" url="$2" logfile="$3"
  mkdir -p "$(dirname "$logfile")"
  ( cd "$ROOT" && PORT="$port" DATABASE_URL="$url" exec node apps/api/dist/main.js ) >"$logfile" 2>&1 &
  SERVER_PID=$!
  export SERVER_PID
  for _ in $(seq 1 100); do
    if curl -fsS "http://127.0.0.1:$port/api/health" >/dev/null 2>&1; then return 0; fi
    kill -0 "$SERVER_PID" 2>/dev/null || break
    sleep 0.2
  done
  log "the server did not come up on port $port; last lines of $logfile:"
  tail -n 30 "$logfile" || true
  return 1
}

stop_server() {
  if [ -n "${SERVER_PID:-}" ] && kill -0 "$SERVER_PID" 2>/dev/null; then
    kill "$SERVER_PID" 2>/dev/null || true
    wait "$SERVER_PID" 2>/dev/null || true
  fi
  SERVER_PID=
}

# Build what changed: the libs (incremental), the API and the web app when their sources are newer
# than their output.
stale() { # stale <dist marker> <source dirs...>
  local marker="$1"; shift
  [ ! -e "$marker" ] && return 0
  [ -n "$(find "$@" -newer "$marker" -type f -print -quit 2>/dev/null)" ]
}

build_all() {
  build_libs
  if stale "$ROOT/apps/api/dist/main.js" "$ROOT/apps/api/src" "$ROOT/libs/catalog/src" "$ROOT/libs/routing/src" "$ROOT/apps/api/package.json"; then
    log "building the API"
    (cd "$ROOT" && npm run -s build -w @linesmith/api)
  fi
  if stale "$ROOT/apps/web/dist/index.html" "$ROOT/apps/web/src" "$ROOT/apps/web/index.html" "$ROOT/libs/catalog/src" "$ROOT/libs/routing/src" "$ROOT/apps/web/vite.config.ts"; then
    log "building the web app"
    (cd "$ROOT" && npm run -s build -w @linesmith/web)
  fi
}

migrate_and_seed() { # migrate_and_seed <database url>
  (cd "$ROOT/apps/api" && DATABASE_URL="$1" node dist/database/seed.js)
}
