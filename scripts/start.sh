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
SMTP_PORT="${SMTP_PORT:-2525}"
if [ -z "${SMTP_HOST:-}" ] || [ "$SMTP_HOST" = 127.0.0.1 ]; then
  # No SMTP service configured: mail goes to the local fake, kept as files under .data/mail.
  start_fake_smtp "$SMTP_PORT" "$ROOT/.data/mail" "$ROOT/.data/fake-smtp.log"
  trap stop_fake_smtp EXIT
  MAIL_NOTE="E-mail goes to a local fake SMTP server on 127.0.0.1:$SMTP_PORT; messages are kept in .data/mail/."
else
  MAIL_NOTE="E-mail goes to $SMTP_HOST:$SMTP_PORT."
fi

cat <<INFO

  Linesmith is running at http://localhost:$PORT  (API docs: http://localhost:$PORT/api/docs)

  Demo sign-ins (demo only; password for all: linesmith-demo)
    owner@tidewater.example   Dana Whitcombe   admin
    fab@tidewater.example     Rafe Okonkwo     fabricator
    parts@tidewater.example   Maribel Soto     parts clerk
    lead@tidewater.example    Hollis Brandt    reviewer

  $MAIL_NOTE
  Stop with Ctrl+C. PostgreSQL keeps running on 127.0.0.1:$PGPORT (data in $PG_DATA_DIR).

INFO
# Not exec: the fake SMTP server stops with the app (trap above).
cd "$ROOT" && PORT="$PORT" DATABASE_URL="$DATABASE_URL" SMTP_PORT="$SMTP_PORT" APP_URL="${APP_URL:-http://localhost:$PORT}" node apps/api/dist/main.js
