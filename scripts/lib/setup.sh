# Shared set-up for scripts/start.sh and scripts/test.sh: what a fresh Debian machine lacks.
# Sourced, not run. Idempotent: a second run finds everything in place and returns quickly.

as_admin() {
  if [ "$(id -u)" -eq 0 ]; then "$@"; else sudo "$@"; fi
}

# Installs the Debian packages that provide the given commands, when a command is missing.
#   ensure_debian_packages chromium:chromium nec2c:nec2c
ensure_debian_packages() {
  local missing=() pair command package
  for pair in "$@"; do
    command="${pair%%:*}"; package="${pair#*:}"
    command -v "$command" >/dev/null 2>&1 || missing+=("$package")
  done
  if [ ${#missing[@]} -gt 0 ]; then
    echo "Installing Debian packages: ${missing[*]}"
    as_admin apt-get update -qq
    DEBIAN_FRONTEND=noninteractive as_admin apt-get install -y -qq "${missing[@]}" >/dev/null
  fi
}

ensure_node() {
  if ! command -v node >/dev/null 2>&1; then
    echo "Node.js 20.19 or newer is needed (see README.md)." >&2
    exit 1
  fi
}

# npm ci when node_modules is missing or older than the lock file.
ensure_node_modules() {
  if [ ! -f node_modules/.package-lock.json ] || [ package-lock.json -nt node_modules/.package-lock.json ]; then
    echo "Installing npm packages (npm ci)..."
    npm ci --no-audit --no-fund --loglevel=error
  fi
}

# Builds the production bundle unless the sources are unchanged since the last build.
ensure_build() {
  local stamp_file=".next/guyline-source-hash" current
  current=$(git ls-files -s -- src public package-lock.json next.config.ts postcss.config.mjs tsconfig.json 2>/dev/null | git hash-object --stdin)
  current="$current-$(git diff --no-ext-diff -- src public next.config.ts | git hash-object --stdin)-$(git ls-files --others --exclude-standard -- src public | xargs -r cat 2>/dev/null | git hash-object --stdin)"
  if [ -f .next/BUILD_ID ] && [ -f "$stamp_file" ] && [ "$(cat "$stamp_file")" = "$current" ]; then
    echo "Production build is up to date."
    return
  fi
  echo "Building Guyline (next build)..."
  npx next build
  echo "$current" > "$stamp_file"
}

# A secret that stays the same between runs of this checkout (sessions survive a restart).
persistent_secret() {
  local file=".data/$1"
  mkdir -p .data
  [ -s "$file" ] || (umask 077; head -c 32 /dev/urandom | base64 | tr -d '\n=' > "$file")
  cat "$file"
}
