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

# The local stand-in for the SMTP service: accepts every message on loopback and keeps it as an
# .eml file under $MAIL_DIR (default .data/mail). start_fake_smtp <port> <mail dir> <log file>.
start_fake_smtp() {
  local port="$1" dir="$2" logfile="$3"
  mkdir -p "$(dirname "$logfile")" "$dir"
  ( cd "$ROOT" && FAKE_SMTP_PORT="$port" MAIL_DIR="$dir" exec node apps/api/dist/mail/fake-smtp-server.js ) >"$logfile" 2>&1 &
  SMTP_PID=$!
  export SMTP_PID
  for _ in $(seq 1 50); do
    (exec 3<>"/dev/tcp/127.0.0.1/$port") 2>/dev/null && return 0
    kill -0 "$SMTP_PID" 2>/dev/null || break
    sleep 0.1
  done
  log "the fake SMTP server did not start on port $port; see $logfile"
  return 1
}

stop_fake_smtp() {
  if [ -n "${SMTP_PID:-}" ] && kill -0 "$SMTP_PID" 2>/dev/null; then
    kill "$SMTP_PID" 2>/dev/null || true
    wait "$SMTP_PID" 2>/dev/null || true
  fi
  SMTP_PID=
}
