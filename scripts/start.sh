#!/usr/bin/env bash
# Sets everything up on a fresh Debian machine and runs Guyline with demo data on
# http://localhost:3000. A second run reuses the database, the packages and the build.
set -euo pipefail
cd "$(dirname "$0")/.."
source scripts/lib/ports.sh
source scripts/lib/setup.sh

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

echo "Guyline is starting on $NEXTAUTH_URL (demo accounts are in README.md)."
exec npx next start -p "$GUYLINE_APP_PORT"
