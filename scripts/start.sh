#!/usr/bin/env bash
# `npm start`: installs what is missing, starts PostgreSQL and the mail catcher, migrates,
# seeds the demo scenario once, builds and serves Ionleaf on http://localhost:3000.
# `npm run dev` does the same with the development server. Ctrl-C stops everything.
# Data lives in .data/ (git-ignored) and is reused by the next start; nothing is wiped.
set -euo pipefail
source "$(dirname "${BASH_SOURCE[0]}")/lib/provision.sh"
cd "$ROOT_DIR"

MODE="production"; [ "${1:-}" = "--dev" ] && MODE="development"
APP_PORT="${PORT:-3000}"
PG_PORT="${IONLEAF_PG_PORT:-54329}"
SMTP_PORT="${IONLEAF_SMTP_PORT:-2525}"
MAIL_HTTP_PORT="${IONLEAF_MAIL_HTTP_PORT:-2580}"
STATE="$ROOT_DIR/.data"
mkdir -p "$STATE/logs" "$ROOT_DIR/uploads"

ensure_node_modules
ensure_postgres

for p in "$APP_PORT" "$SMTP_PORT" "$MAIL_HTTP_PORT"; do
  port_is_free "$p" || die "Port $p is already in use. Stop what uses it, or set PORT / IONLEAF_SMTP_PORT / IONLEAF_MAIL_HTTP_PORT."
done

# Secrets are made once per installation and kept with the data.
[ -s "$STATE/auth-secret" ] || node -e "process.stdout.write(require('crypto').randomBytes(32).toString('hex'))" >"$STATE/auth-secret"
[ -s "$STATE/db-password" ] || node -e "process.stdout.write(require('crypto').randomBytes(18).toString('hex'))" >"$STATE/db-password"
[ -s "$STATE/db-app-password" ] || node -e "process.stdout.write(require('crypto').randomBytes(18).toString('hex'))" >"$STATE/db-app-password"
chmod 600 "$STATE/auth-secret" "$STATE/db-password" "$STATE/db-app-password"

# The cluster lives outside the project folder, so the development server's file watcher never
# sees PostgreSQL writing (it would reload the page on every write). A cluster an earlier
# version made in .data/postgres is kept and used.
CLUSTER_NAME="ionleaf-$(printf %s "$ROOT_DIR" | sha1sum | cut -c1-10)-postgres"
if [ -f "$STATE/postgres/PG_VERSION" ]; then
  PGDATA_DIR="$STATE/postgres"
else
  PGDATA_DIR="$(pick_pg_data_dir "/var/lib/ionleaf/$CLUSTER_NAME" "$CLUSTER_NAME")"
fi

APP_PID=""; CATCHER_PID=""
cleanup() {
  trap "" INT TERM; trap - EXIT
  set +e
  say "Shutting down"
  [ -n "$APP_PID" ] && kill "$APP_PID" 2>/dev/null && wait "$APP_PID" 2>/dev/null
  [ -n "$CATCHER_PID" ] && kill "$CATCHER_PID" 2>/dev/null && wait "$CATCHER_PID" 2>/dev/null
  pg_cluster_stop "$PGDATA_DIR"
  say "Stopped. Data kept in $PGDATA_DIR"
}
trap cleanup EXIT INT TERM

pg_cluster_start "$PGDATA_DIR" "$PG_PORT" "$STATE/logs/postgres.log"
pg_ensure_database "$PG_PORT" ionleaf ionleaf "$(cat "$STATE/db-password")"
pg_ensure_login_role "$PG_PORT" ionleaf_app "$(cat "$STATE/db-app-password")"

# Two roles: `ionleaf` owns the tables and runs migrations; the app serves as `ionleaf_app`,
# which may not change the schema, switch off a guard, or update and delete kept records.
export DATABASE_OWNER_URL="postgres://ionleaf:$(cat "$STATE/db-password")@127.0.0.1:$PG_PORT/ionleaf"
export DATABASE_URL="postgres://ionleaf_app:$(cat "$STATE/db-app-password")@127.0.0.1:$PG_PORT/ionleaf"
export AUTH_SECRET="$(cat "$STATE/auth-secret")"
export_app_env "$APP_PORT" "$SMTP_PORT" "$MAIL_HTTP_PORT" "$ROOT_DIR/uploads"

say "Applying migrations"
node_modules/.bin/tsx scripts/migrate.ts
say "Seeding the demo scenario (once)"
node_modules/.bin/tsx --tsconfig tsconfig.scripts.json scripts/seed.ts

say "Starting the mail catcher (SMTP 127.0.0.1:$SMTP_PORT)"
start_mail_catcher "$SMTP_PORT" "$MAIL_HTTP_PORT" "$STATE/logs/mail-catcher.log" "$STATE/mail-catcher.json"

if [ "$MODE" = "production" ]; then
  say "Building the app (next build)"
  node node_modules/next/dist/bin/next build >"$STATE/logs/build.log" 2>&1 || { tail -40 "$STATE/logs/build.log" >&2; die "next build failed (log: .data/logs/build.log)"; }
  NODE_ENV=production node node_modules/next/dist/bin/next start -p "$APP_PORT" &
else
  node node_modules/next/dist/bin/next dev -p "$APP_PORT" &
fi
APP_PID=$!

wait_for_http "http://localhost:$APP_PORT/api/health" 120 || die "The app did not answer on port $APP_PORT"
node_modules/.bin/tsx scripts/print-demo-accounts.ts "$APP_URL"
wait "$APP_PID"
