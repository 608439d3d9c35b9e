#!/usr/bin/env bash
# Sets up and runs Swapwright on one machine.
#   start     install what is missing, start a private MariaDB and the mail fake, migrate, seed, build, serve, play the demo story
#   test      the same set-up on a fresh test database, then every suite; exits non-zero on any failure
#   reset     stop everything and wipe the local data folder (.local/)
#   services  start the test services only and leave them running (for working on the API); prints the env file
#   bench     build, start a private MariaDB, the fakes and the API on fresh demo data, print the bench table, stop them
set -euo pipefail

ROOT="$(cd "$(dirname "$0")/.." && pwd)"
LOCAL="$ROOT/.local"
export PATH="$PATH:/usr/sbin:/usr/local/sbin"
cd "$ROOT"

say() { printf '\n== %s\n' "$*"; }
fail() { printf '\nERROR: %s\n' "$*" >&2; exit 1; }

# ---------------------------------------------------------------- machine set-up
ensure_debian_packages() {
  local missing=()
  command -v mariadbd >/dev/null 2>&1 || missing+=(mariadb-server)
  if [ "${NEED_CHROMIUM:-0}" = 1 ] && [ ! -x /usr/bin/chromium ]; then missing+=(chromium); fi
  [ ${#missing[@]} -eq 0 ] && return 0
  if [ "$(id -u)" != 0 ]; then
    fail "Swapwright needs Debian packages: ${missing[*]}. Run: sudo apt-get update && sudo apt-get install -y ${missing[*]}   then run this command again."
  fi
  say "Installing ${missing[*]} from Debian"
  apt-get update -q
  DEBIAN_FRONTEND=noninteractive apt-get install -y -q "${missing[@]}"
}

ensure_node_modules() {
  if [ ! -f node_modules/.package-lock.json ] || [ package-lock.json -nt node_modules/.package-lock.json ]; then
    say "Installing npm packages (npm ci)"
    npm ci --no-audit --no-fund
  fi
}

BUILD_STAMP="$LOCAL/build.stamp"

# True when a source, config or the lock changed since the last full build (or an output is missing).
sources_changed() {
  [ -f "$BUILD_STAMP" ] || return 0
  for out in shared/dist seed-data/dist api/dist web/dist; do [ -d "$out" ] || return 0; done
  [ -n "$(find shared/src seed-data/src api/src web/src web/public web/index.html package-lock.json \
    shared/package.json seed-data/package.json api/package.json web/package.json \
    shared/tsconfig*.json seed-data/tsconfig.json api/tsconfig*.json web/tsconfig.json web/vite.config.ts web/scripts \
    -newer "$BUILD_STAMP" -print -quit 2>/dev/null)" ]
}

build_all() {
  if ! sources_changed; then
    say "Build is up to date (nothing changed since the last one)"
    return 0
  fi
  say "Building shared, seed-data, api and web"
  # Stamp the start, so a file saved during the build still counts as changed next time.
  touch "$BUILD_STAMP.next"
  npm run build -w shared >/dev/null
  npm run build -w seed-data >/dev/null
  npm run build -w api >/dev/null
  npm run build -w web >"$LOCAL/web-build.log" 2>&1 || { cat "$LOCAL/web-build.log"; fail "web build failed"; }
  mv "$BUILD_STAMP.next" "$BUILD_STAMP"
}

free_port() { node "$ROOT/scripts/free-port.js" "$1"; }

# A test API port of this checkout's own (3100-3499, from its path), so checkouts side by side on one machine do not
# all reach for 3100 and answer each other's journeys.
test_api_port_base() { echo $((3100 + $(printf %s "$ROOT" | cksum | cut -d' ' -f1) % 400)); }

random_secret() { node -e "console.log(require('node:crypto').randomBytes(24).toString('hex'))"; }

# ---------------------------------------------------------------- private MariaDB
# db_start <profile> <default port> <database names...>; fresh data when FRESH_DB=1.
db_start() {
  local profile=$1 default_port=$2; shift 2
  DB_DIR="$LOCAL/$profile/mariadb"
  DB_SOCKET="$DB_DIR/mysqld.sock"
  if [ "${FRESH_DB:-0}" = 1 ]; then db_stop_dir "$DB_DIR"; rm -rf "$DB_DIR"; fi
  mkdir -p "$DB_DIR"
  [ -f "$DB_DIR/password" ] || random_secret >"$DB_DIR/password"
  DB_PASSWORD="$(cat "$DB_DIR/password")"
  if [ -f "$DB_DIR/mysqld.pid" ] && kill -0 "$(cat "$DB_DIR/mysqld.pid")" 2>/dev/null; then
    DB_PORT="$(cat "$DB_DIR/port")"
    echo "MariaDB already running on 127.0.0.1:$DB_PORT"
  else
    if [ ! -d "$DB_DIR/data/mysql" ]; then
      mariadb-install-db --no-defaults --datadir="$DB_DIR/data" --user=root \
        --auth-root-authentication-method=normal --skip-test-db >"$DB_DIR/install.log" 2>&1 \
        || { cat "$DB_DIR/install.log"; fail "mariadb-install-db failed"; }
    fi
    DB_PORT="$(free_port "$default_port")"
    echo "$DB_PORT" >"$DB_DIR/port"
    mariadbd --no-defaults --datadir="$DB_DIR/data" --port="$DB_PORT" --bind-address=127.0.0.1 \
      --socket="$DB_SOCKET" --pid-file="$DB_DIR/mysqld.pid" --user=root \
      --log-error="$DB_DIR/error.log" --skip-name-resolve --innodb-buffer-pool-size=128M \
      --character-set-server=utf8mb4 --collation-server=utf8mb4_unicode_ci &
    local tries=0
    until mariadb-admin --no-defaults --socket="$DB_SOCKET" -uroot ping >/dev/null 2>&1; do
      tries=$((tries + 1)); [ $tries -gt 300 ] && { cat "$DB_DIR/error.log"; fail "MariaDB did not start"; }
      sleep 0.1
    done
    echo "MariaDB running on 127.0.0.1:$DB_PORT (data in ${DB_DIR#$ROOT/})"
  fi
  local sql="CREATE USER IF NOT EXISTS 'swapwright'@'127.0.0.1' IDENTIFIED BY '$DB_PASSWORD';"
  for name in "$@"; do
    sql+="CREATE DATABASE IF NOT EXISTS \`$name\` CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci;"
    sql+="GRANT ALL ON \`$name\`.* TO 'swapwright'@'127.0.0.1';"
  done
  mariadb --no-defaults --socket="$DB_SOCKET" -uroot -e "$sql"
}

db_stop_dir() {
  local dir=$1
  if [ -f "$dir/mysqld.pid" ] && kill -0 "$(cat "$dir/mysqld.pid")" 2>/dev/null; then
    mariadb-admin --no-defaults --socket="$dir/mysqld.sock" -uroot shutdown >/dev/null 2>&1 || kill "$(cat "$dir/mysqld.pid")" 2>/dev/null || true
    local tries=0
    while [ -f "$dir/mysqld.pid" ] && [ $tries -lt 100 ]; do sleep 0.1; tries=$((tries + 1)); done
  fi
}

# ---------------------------------------------------------------- mail fake
mail_start() {
  local profile=$1 default_port=$2
  MAIL_DIR="$LOCAL/$profile/mail"
  mkdir -p "$MAIL_DIR"
  # a fake left by an earlier run of this profile goes first (each run starts its own)
  stop_pid_file "$MAIL_DIR/pid"
  SMTP_PORT="$(free_port "$default_port")"
  MAIL_HTTP_PORT="$(free_port $((SMTP_PORT + 1)))"
  MAIL_FAKE_SMTP_PORT=$SMTP_PORT MAIL_FAKE_HTTP_PORT=$MAIL_HTTP_PORT \
    node --import tsx scripts/fakes/mail-fake.ts >"$MAIL_DIR/mail.log" 2>&1 &
  MAIL_PID=$!
  echo "$MAIL_PID" >"$MAIL_DIR/pid"
  local tries=0
  until grep -q 'mail fake' "$MAIL_DIR/mail.log" 2>/dev/null; do
    tries=$((tries + 1)); [ $tries -gt 200 ] && { cat "$MAIL_DIR/mail.log"; fail "mail fake did not start"; }
    sleep 0.1
  done
  echo "Mail fake: SMTP 127.0.0.1:$SMTP_PORT, captured mail at http://127.0.0.1:$MAIL_HTTP_PORT/messages"
}

# ---------------------------------------------------------------- payment provider fake
# payment_start <profile> <default port> <api port>: the provider's API on 127.0.0.1, webhooks signed back to the API.
payment_start() {
  local profile=$1 default_port=$2 api_port=$3
  PAYMENT_DIR="$LOCAL/$profile/payments"
  mkdir -p "$PAYMENT_DIR"
  stop_pid_file "$PAYMENT_DIR/pid"
  PAYMENT_FAKE_PORT="$(free_port "$default_port")"
  [ -f "$PAYMENT_DIR/webhook-secret" ] || echo "whsec_$(random_secret)" >"$PAYMENT_DIR/webhook-secret"
  PAYMENT_SECRET_KEY="sk_test_local_$profile"
  PAYMENT_WEBHOOK_SECRET="$(cat "$PAYMENT_DIR/webhook-secret")"
  PAYMENT_FAKE_PORT=$PAYMENT_FAKE_PORT PAYMENT_SECRET_KEY=$PAYMENT_SECRET_KEY PAYMENT_WEBHOOK_SECRET=$PAYMENT_WEBHOOK_SECRET \
    PAYMENT_WEBHOOK_URL="http://127.0.0.1:$api_port/api/payments/webhook" \
    node --import tsx scripts/fakes/payment-fake.ts >"$PAYMENT_DIR/payments.log" 2>&1 &
  echo $! >"$PAYMENT_DIR/pid"
  local tries=0
  until grep -q 'payment fake' "$PAYMENT_DIR/payments.log" 2>/dev/null; do
    tries=$((tries + 1)); [ $tries -gt 200 ] && { cat "$PAYMENT_DIR/payments.log"; fail "payment fake did not start"; }
    sleep 0.1
  done
  echo "Payment fake: http://127.0.0.1:$PAYMENT_FAKE_PORT (test cards on the deposit form: 4242 4242 4242 4242 pays, 4000 0000 0000 0002 is declined)"
}

stop_pid_file() { [ -f "$1" ] && kill "$(cat "$1")" 2>/dev/null || true; rm -f "$1"; }

# ---------------------------------------------------------------- environment for the API
write_env() {
  local profile=$1 db_name=$2 api_port=$3 file="$LOCAL/$1/env.sh"
  [ -f "$LOCAL/$profile/jwt-secret" ] || random_secret >"$LOCAL/$profile/jwt-secret"
  cat >"$file" <<ENV
export NODE_ENV=${NODE_ENV_VALUE:-development}
export PORT=$api_port
export APP_URL=http://127.0.0.1:$api_port
export DB_HOST=127.0.0.1
export DB_PORT=$DB_PORT
export DB_USER=swapwright
export DB_PASSWORD=$DB_PASSWORD
export DB_NAME=$db_name
export JWT_SECRET=$(cat "$LOCAL/$profile/jwt-secret")
export SMTP_HOST=127.0.0.1
export SMTP_PORT=$SMTP_PORT
export MAIL_FROM="Swapwright <no-reply@swapwright.test>"
export MAIL_FAKE_URL=http://127.0.0.1:$MAIL_HTTP_PORT/messages
export PAYMENT_API_URL=http://127.0.0.1:${PAYMENT_FAKE_PORT:-12111}
export PAYMENT_SECRET_KEY=${PAYMENT_SECRET_KEY:-sk_test_local}
export PAYMENT_WEBHOOK_SECRET=${PAYMENT_WEBHOOK_SECRET:-whsec_local_unset}
# GET /api/dev/mail (owners only) relays the fake above; the test profile turns it on for the API suites.
export DEV_MAIL_ENABLED=${DEV_MAIL_ENABLED_VALUE:-false}
# Sign-in, sign-up and password-reset attempts per address and route per window; the suites sign in many times.
export AUTH_RATE_LIMIT=${AUTH_RATE_LIMIT_VALUE:-10}
export AUTH_RATE_WINDOW_SECONDS=60
export WEB_DIST_DIR=$ROOT/web/dist
# API processes sharing the port (node:cluster): auto = one per CPU core. The test profile runs one.
export API_WORKERS=${API_WORKERS:-${API_WORKERS_VALUE:-1}}
export UPLOAD_DIR=$LOCAL/$profile/uploads
ENV
  mkdir -p "$LOCAL/$profile/uploads"
  # shellcheck disable=SC1090
  source "$file"
}

migrate_and_seed() {
  say "Migrating database $DB_NAME"
  local log="$LOCAL/migrations-$DB_NAME.log"
  npm run -s migration:run -w api >"$log" 2>&1 || { cat "$log"; fail "migrations failed on $DB_NAME"; }
  local ran; ran="$(grep -c 'has been executed successfully' "$log" || true)"
  echo "$ran migration(s) applied (log: ${log#$ROOT/})"
  say "Loading demo data (once)"
  npm run -s seed -w api
}

wait_for_api() {
  local tries=0
  until node -e "fetch('http://127.0.0.1:$PORT/api/health').then((r) => process.exit(r.ok ? 0 : 1), () => process.exit(1))" 2>/dev/null; do
    tries=$((tries + 1)); [ $tries -gt 300 ] && fail "the API did not answer on port $PORT"
    if ! kill -0 "$API_PID" 2>/dev/null; then fail "the API stopped during start-up (see the lines above)"; fi
    sleep 0.1
  done
}

print_sign_ins() {
  node -e "
    const { DEMO_SIGN_INS } = require('@swapwright/seed-data');
    console.log('Demo sign-ins (password for all: ' + DEMO_SIGN_INS[0].password + '):');
    for (const s of DEMO_SIGN_INS) console.log('  ' + s.role.padEnd(11) + s.email);
  " 2>/dev/null || true
}

# ---------------------------------------------------------------- commands
cmd_start() {
  mkdir -p "$LOCAL/dev"
  ensure_debian_packages
  ensure_node_modules
  build_all
  db_start dev 3307 swapwright
  mail_start dev 2525
  local api_port; api_port="$(free_port "${SWAPWRIGHT_PORT:-3000}")"
  payment_start dev 12111 "$api_port"
  API_WORKERS_VALUE=auto write_env dev swapwright "$api_port"
  trap 'say "Stopping"; kill $API_PID 2>/dev/null || true; wait $API_PID 2>/dev/null || true; stop_pid_file "$MAIL_DIR/pid"; stop_pid_file "$PAYMENT_DIR/pid"; db_stop_dir "$DB_DIR"; echo "Stopped. Data kept in .local/dev (npm run reset wipes it)."' EXIT
  trap 'exit 0' INT TERM
  migrate_and_seed
  say "Starting the server"
  node api/dist/main.js &
  API_PID=$!
  wait_for_api
  say "Playing the demo story (once per database)"
  # Jobs at every stage, made through the API as the shop's people would; the test and bench databases never get it.
  npm run -s seed:story -w api || echo "The demo story did not finish (see above); the shop works without it."
  cat <<MSG

  Swapwright is running at  http://127.0.0.1:$PORT/
  API documentation:        http://127.0.0.1:$PORT/api/docs
  Captured e-mail:          $MAIL_FAKE_URL   (local only)

MSG
  print_sign_ins
  echo
  echo "Ready in ${SECONDS} s."
  echo "Press Ctrl-C to stop the server and the database (data is kept)."
  wait $API_PID
}

run_suite() {
  local name=$1; shift
  say "Suite: $name"
  if "$@"; then SUITES_PASSED+=("$name"); else SUITES_FAILED+=("$name"); fi
}

cmd_test() {
  local results="$LOCAL/test/results"
  rm -rf "$LOCAL/test"; mkdir -p "$results"
  NEED_CHROMIUM=1 ensure_debian_packages
  ensure_node_modules
  build_all
  FRESH_DB=1 db_start test 3317 swapwright_test swapwright_e2e
  mail_start test 2535
  API_PID=""
  local api_port; api_port="$(free_port "$(test_api_port_base)")"
  payment_start test 12121 "$api_port"
  trap 'kill $API_PID 2>/dev/null || true; stop_pid_file "$MAIL_DIR/pid"; stop_pid_file "$PAYMENT_DIR/pid"; db_stop_dir "$DB_DIR"' EXIT
  NODE_ENV_VALUE=test DEV_MAIL_ENABLED_VALUE=true AUTH_RATE_LIMIT_VALUE=10000 write_env test swapwright_test "$api_port"
  SUITES_PASSED=(); SUITES_FAILED=()

  run_suite typecheck npm run -s typecheck
  # The web's API types must match the API's OpenAPI document (regenerate with: npm run openapi).
  run_suite contract bash scripts/check-openapi.sh
  run_suite shared bash -c "cd shared && npx jest --ci --json --outputFile='$results/shared.json'"
  run_suite web bash -c "cd web && npx vitest run --reporter=default --reporter=json --outputFile.json='$results/web.json'"
  run_suite api bash -c "cd api && npx jest --ci --runInBand --json --outputFile='$results/api.json'"

  export DB_NAME=swapwright_e2e
  migrate_and_seed
  node api/dist/main.js >"$LOCAL/test/api-e2e.log" 2>&1 &
  API_PID=$!
  wait_for_api
  run_suite e2e bash -c "cd e2e && E2E_BASE_URL='http://127.0.0.1:$PORT' CHROMIUM_PATH=/usr/bin/chromium npx jest --ci --runInBand --json --outputFile='$results/e2e.json'"
  kill $API_PID 2>/dev/null || true

  say "Summary (${SECONDS} s in all)"
  node scripts/test-summary.js "$results" shared web api e2e
  echo "suites passed: ${SUITES_PASSED[*]:-none}; failed: ${SUITES_FAILED[*]:-none}"
  local totals; totals="$(node scripts/test-summary.js "$results" --totals shared web api e2e)"
  if [ ${#SUITES_FAILED[@]} -gt 0 ]; then echo "tests: $totals"; exit 1; fi
  echo "tests: $totals"
}

cmd_bench() {
  rm -rf "$LOCAL/bench"; mkdir -p "$LOCAL/bench"
  NEED_CHROMIUM=1 ensure_debian_packages
  ensure_node_modules
  build_all
  FRESH_DB=1 db_start bench 3337 swapwright_bench
  mail_start bench 2555
  API_PID=""
  local api_port; api_port="$(free_port 3300)"
  payment_start bench 12141 "$api_port"
  trap 'kill $API_PID 2>/dev/null || true; wait $API_PID 2>/dev/null || true; stop_pid_file "$MAIL_DIR/pid"; stop_pid_file "$PAYMENT_DIR/pid"; db_stop_dir "$DB_DIR"' EXIT
  # Production settings, as a shop would run it; the sign-in limit stays out of the way of the bench's own sign-ins.
  NODE_ENV_VALUE=production AUTH_RATE_LIMIT_VALUE=1000 API_WORKERS_VALUE=auto write_env bench swapwright_bench "$api_port"
  migrate_and_seed
  say "Starting the API (log: .local/bench/api.log)"
  node api/dist/main.js >"$LOCAL/bench/api.log" 2>&1 &
  API_PID=$!
  wait_for_api
  say "Measuring (about three minutes)"
  BENCH_BASE_URL="http://127.0.0.1:$PORT" CHROMIUM_PATH=/usr/bin/chromium node --import tsx scripts/bench/bench.ts
}

cmd_services() {
  mkdir -p "$LOCAL/test"
  ensure_debian_packages
  db_start test 3317 swapwright_test swapwright_e2e
  mail_start test 2535
  local api_port; api_port="$(free_port "$(test_api_port_base)")"
  payment_start test 12121 "$api_port"
  NODE_ENV_VALUE=test DEV_MAIL_ENABLED_VALUE=true AUTH_RATE_LIMIT_VALUE=10000 write_env test swapwright_test "$api_port"
  echo "Services running. Use: source .local/test/env.sh   (stop: bash scripts/stack.sh stop-services)"
}

# Runs chosen e2e journeys (or all) against a fresh e2e database, with the services `services` starts.
cmd_e2e() {
  cmd_services >/dev/null
  build_all
  # shellcheck disable=SC1091
  source "$LOCAL/test/env.sh"
  mariadb --no-defaults --socket="$LOCAL/test/mariadb/mysqld.sock" -uroot \
    -e "DROP DATABASE IF EXISTS swapwright_e2e; CREATE DATABASE swapwright_e2e CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci;"
  export DB_NAME=swapwright_e2e
  migrate_and_seed >/dev/null
  node api/dist/main.js >"$LOCAL/test/api-e2e.log" 2>&1 &
  API_PID=$!
  trap 'kill $API_PID 2>/dev/null || true' EXIT
  wait_for_api
  # another worktree's server may have taken the port meanwhile and answered the health check in our stead
  sleep 1
  kill -0 "$API_PID" 2>/dev/null || fail "the API could not listen on port $PORT (taken by another server since): run the same command again"
  (cd e2e && E2E_BASE_URL="http://127.0.0.1:$PORT" CHROMIUM_PATH=/usr/bin/chromium npx jest --ci --runInBand "$@")
}

cmd_stop_services() {
  stop_pid_file "$LOCAL/test/mail/pid"
  stop_pid_file "$LOCAL/test/payments/pid"
  db_stop_dir "$LOCAL/test/mariadb"
}

cmd_reset() {
  for dir in "$LOCAL"/*/mariadb; do [ -d "$dir" ] && db_stop_dir "$dir"; done
  for pid in "$LOCAL"/*/mail/pid "$LOCAL"/*/payments/pid; do [ -f "$pid" ] && stop_pid_file "$pid"; done
  rm -rf "$LOCAL"
  echo "Local data wiped (.local/). The next npm start loads the demo shop again."
}

case "${1:-}" in
  start) cmd_start ;;
  test) cmd_test ;;
  reset) cmd_reset ;;
  services) cmd_services ;;
  bench) cmd_bench ;;
  stop-services) cmd_stop_services ;;
  e2e) shift; cmd_e2e "$@" ;;
  *) echo "usage: stack.sh start|test|reset|services|stop-services|bench|e2e [journey files]" >&2; exit 2 ;;
esac
