#!/usr/bin/env bash
# npm test: the same set-up as npm start against a fresh test database, then every check:
# type-check, Vitest (libs, web), Jest (API unit + e2e), browser tests. Ends with one line
# `N passed, N failed`; exits non-zero on any failure.
source "$(dirname "$0")/lib/common.sh"
source "$(dirname "$0")/lib/server.sh"
set +e # run every step; the summary decides the exit code

REPORTS="$ROOT/artifacts/reports"
rm -rf "$REPORTS"; mkdir -p "$REPORTS" "$ROOT/artifacts/screenshots"
trap 'stop_server; stop_fake_smtp' EXIT
TEST_PORT="${TEST_PORT:-3100}"
TEST_DB=linesmith_test
STEPS=()

set -e
ensure_node_modules
start_postgres
psql_admin -d postgres -c "DROP DATABASE IF EXISTS $TEST_DB WITH (FORCE)"
ensure_database "$TEST_DB"
ensure_chromium
set +e
export DATABASE_URL
DATABASE_URL="$(database_url "$TEST_DB")"
export NODE_ENV=test

check() { # check <step> <command...>: a single pass/fail step (type-check, build)
  local step="$1"; shift
  log "$step"
  "$@"
  node "$ROOT/scripts/lib/check-report.mjs" "$REPORTS/$step.json" "$step" "$?"
  STEPS+=("$step")
}

vitest_step() { # vitest_step <step> <dir> [args...]
  local step="$1" dir="$2"; shift 2
  log "$step (vitest)"
  (cd "$dir" && npx vitest run --reporter=default --reporter=json --outputFile.json="$REPORTS/$step.json" "$@")
  STEPS+=("$step")
}

check build-libs build_libs
check typecheck-libs bash -c "cd '$ROOT' && npx tsc -p libs/catalog/tsconfig.test.json && npx tsc -p libs/routing/tsconfig.test.json"
check typecheck-api npx tsc -p "$ROOT/apps/api/tsconfig.json" --noEmit
check typecheck-web npx tsc -p "$ROOT/apps/web/tsconfig.json" --noEmit

vitest_step catalog "$ROOT/libs/catalog"
vitest_step routing "$ROOT/libs/routing"
vitest_step web "$ROOT/apps/web"

log "api (jest: unit and e2e against PostgreSQL)"
(cd "$ROOT/apps/api" && npx jest --runInBand --json --outputFile="$REPORTS/api.json")
STEPS+=(api)

check build-apps build_all
export SMTP_PORT="${TEST_SMTP_PORT:-2625}" MAIL_DIR="$ROOT/artifacts/mail" APP_URL="http://127.0.0.1:$TEST_PORT"
# The journeys sign in some 30 times within a minute from one address; the login limit itself is
# covered by the API tests (rate-limit.e2e-spec.ts).
export LOGIN_RATE_LIMIT=1000
if migrate_and_seed "$DATABASE_URL" && start_fake_smtp "$SMTP_PORT" "$MAIL_DIR" "$ROOT/artifacts/fake-smtp.log" &&
  start_server "$TEST_PORT" "$DATABASE_URL" "$ROOT/artifacts/server.log"; then
  log "browser tests (playwright-core + Debian chromium) against http://127.0.0.1:$TEST_PORT"
  (cd "$ROOT/apps/web" && LINESMITH_URL="http://127.0.0.1:$TEST_PORT" ARTIFACTS_DIR="$ROOT/artifacts" \
    npx vitest run -c vitest.browser.config.ts --reporter=default --reporter=json --outputFile.json="$REPORTS/browser.json")
fi
STEPS+=(browser)
stop_server
stop_fake_smtp

node "$ROOT/scripts/summarize.mjs" "$REPORTS" "${STEPS[@]}"
