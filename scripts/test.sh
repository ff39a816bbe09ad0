#!/usr/bin/env bash
# Sets everything up, then runs every check: type-check, lint, unit tests, integration tests
# against the real PostgreSQL, and browser tests in Debian's Chromium against a production
# build. Ends with one line "N passed, N failed" and exits non-zero on any failure.
set -uo pipefail
cd "$(dirname "$0")/.."
source scripts/lib/ports.sh
source scripts/lib/setup.sh
source scripts/lib/background.sh
set -e

ensure_node
ensure_debian_packages psql:postgresql chromium:chromium nec2c:nec2c
ensure_node_modules
# The machine is left as found: a test cluster this run starts is stopped at the end, so it
# never holds the port against the next run from another clone.
cluster_was_running=0
bash scripts/db.sh status test >/dev/null 2>&1 && cluster_was_running=1
bash scripts/db.sh start test
clean_up() {
  stop_mail_services e2e
  [ "$cluster_was_running" = 1 ] || bash scripts/db.sh stop test >/dev/null
}
trap clean_up EXIT

reports=".data/test-reports"
rm -rf "$reports"; mkdir -p "$reports"
db_url_base="$(bash scripts/db.sh url test)"
db_root="${db_url_base%/*}"

# Fresh databases every run: one for integration tests, one seeded with the demo for the browser.
recreate_database() {
  PGPASSWORD=guyline psql "$db_root/postgres" -qc "drop database if exists $1 with (force)" -c "create database $1" >/dev/null
}
recreate_database guyline_test
recreate_database guyline_e2e

export NODE_ENV=test
export NEXTAUTH_SECRET="test-secret-for-guyline-only"
export GUYLINE_DEV_TOOLS=on
set +e

failed_steps=()
step() {
  local name="$1"; shift
  echo; echo "== $name"
  if ! "$@"; then failed_steps+=("$name"); fi
}

step "type-check" npx tsc --noEmit
step "lint" npx eslint . --max-warnings=0
step "unit tests" npx vitest run --project unit --reporter=default --reporter=json --outputFile.json="$reports/unit.json"
step "integration tests" env DATABASE_URL="$db_root/guyline_test" NEXTAUTH_URL="http://localhost:$GUYLINE_TEST_APP_PORT" \
  npx vitest run --project integration --reporter=default --reporter=json --outputFile.json="$reports/integration.json"

e2e_env=(DATABASE_URL="$db_root/guyline_e2e" NEXTAUTH_URL="http://localhost:$GUYLINE_TEST_APP_PORT")
step "browser set-up" env "${e2e_env[@]}" bash -c 'npm run --silent db:migrate && npm run --silent db:seed'
step "production build" env NODE_ENV=production bash -c 'source scripts/lib/setup.sh && ensure_build'
# The browser tests read the mail the app sends: the local mail server and the worker run
# against the e2e database while they do.
step "mail services" env "${e2e_env[@]}" bash -c 'source scripts/lib/ports.sh && source scripts/lib/background.sh && start_mail_services e2e "$GUYLINE_SMTP_TEST_PORT"'
step "browser tests" env "${e2e_env[@]}" PLAYWRIGHT_JSON_OUTPUT_NAME="$reports/e2e.json" npx playwright test --reporter=list,json

echo
[ ${#failed_steps[@]} -gt 0 ] && echo "Failed steps: ${failed_steps[*]}"
node scripts/lib/test-summary.mjs "$reports" "${#failed_steps[@]}" "type-check:$([[ " ${failed_steps[*]} " == *" type-check "* ]] && echo 1 || echo 0)" "lint:$([[ " ${failed_steps[*]} " == *" lint "* ]] && echo 1 || echo 0)"
