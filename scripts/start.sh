#!/usr/bin/env bash
# Sets everything up on a fresh Debian machine and runs Guyline with demo data on
# http://localhost:3000. A second run reuses the database, the packages and the build.
set -euo pipefail
cd "$(dirname "$0")/.."
source scripts/lib/ports.sh
source scripts/lib/setup.sh
source scripts/lib/background.sh

ensure_node
ensure_debian_packages psql:postgresql
ensure_node_modules
bash scripts/db.sh start demo

export NODE_ENV=production
export DATABASE_URL="$(bash scripts/db.sh url demo)"
export NEXTAUTH_URL="${NEXTAUTH_URL:-http://localhost:$GUYLINE_APP_PORT}"
export NEXTAUTH_SECRET="${NEXTAUTH_SECRET:-$(persistent_secret nextauth-secret)}"
export GUYLINE_DEV_TOOLS=on

npm run --silent db:migrate
npm run --silent db:seed
ensure_build

# The local mail server catches every message (see the development inbox); the worker sends
# queued mail and runs reminders. Both stop when this script stops.
start_mail_services demo "$GUYLINE_SMTP_DEMO_PORT"
app_pid=""
trap '[ -n "$app_pid" ] && kill "$app_pid" 2>/dev/null; stop_mail_services demo' EXIT
trap 'exit 130' INT TERM

echo "Guyline is starting on $NEXTAUTH_URL (demo accounts are in README.md)."
echo "Mail goes to the local mail server on port $GUYLINE_SMTP_DEMO_PORT: read it at $NEXTAUTH_URL/dev/inbox as a coordinator."
# In the background and waited for, so that a TERM to this script stops everything at once.
./node_modules/.bin/next start -p "$GUYLINE_APP_PORT" &
app_pid=$!
wait "$app_pid"
