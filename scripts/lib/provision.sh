# Shared provisioning for `npm start` and `npm test` (sourced, not run).
# Installs what is missing (npm packages, PostgreSQL, Chromium for tests) and manages a
# private PostgreSQL cluster on loopback. Every step says what it does.

ROOT_DIR="$(cd "$(dirname "${BASH_SOURCE[0]}")/../.." && pwd)"
say() { printf '\033[36m[ionleaf]\033[0m %s\n' "$*"; }
die() { printf '\033[31m[ionleaf] %s\033[0m\n' "$*" >&2; exit 1; }
is_root() { [ "$(id -u)" = "0" ]; }

apt_install() {
  # apt_install PACKAGE... : installs Debian packages when we are root, else says how.
  if ! is_root; then
    die "Missing Debian packages: $*. Install them with: sudo apt-get update && sudo apt-get install -y $*"
  fi
  say "Installing Debian packages: $* (apt-get)"
  if [ ! -f /var/tmp/ionleaf-apt-updated ] || [ -n "$(find /var/tmp/ionleaf-apt-updated -mmin +720 2>/dev/null)" ]; then
    DEBIAN_FRONTEND=noninteractive apt-get update -qq >/dev/null && touch /var/tmp/ionleaf-apt-updated
  fi
  DEBIAN_FRONTEND=noninteractive apt-get install -y -qq "$@" >/dev/null || die "apt-get install $* failed"
}

ensure_node_modules() {
  local stamp="$ROOT_DIR/node_modules/.ionleaf-lock-hash"
  local want
  want="$(sha256sum "$ROOT_DIR/package-lock.json" | cut -d' ' -f1)"
  if [ -d "$ROOT_DIR/node_modules" ] && [ -f "$stamp" ] && [ "$(cat "$stamp")" = "$want" ]; then
    return 0
  fi
  say "Installing npm dependencies from package-lock.json (npm ci)"
  (cd "$ROOT_DIR" && npm ci --no-audit --no-fund --loglevel=error) || die "npm ci failed"
  echo "$want" >"$stamp"
}

find_pg_bin() {
  local d
  for d in $(ls -d /usr/lib/postgresql/*/bin 2>/dev/null | sort -V -r); do
    if [ -x "$d/initdb" ] && [ -x "$d/pg_ctl" ] && [ -x "$d/postgres" ]; then echo "$d"; return 0; fi
  done
  return 1
}

ensure_postgres() {
  PG_BIN="$(find_pg_bin)" || { apt_install postgresql postgresql-client; PG_BIN="$(find_pg_bin)" || die "PostgreSQL binaries not found after install"; }
  command -v psql >/dev/null || apt_install postgresql-client
  export PG_BIN
}

ensure_chromium() {
  if [ -x /usr/bin/chromium ]; then return 0; fi
  apt_install chromium
}

# As root, PostgreSQL runs as the `postgres` user (initdb refuses root).
pg_run() {
  if is_root; then runuser -u postgres -- "$@"; else "$@"; fi
}

# pick_pg_data_dir PREFERRED FALLBACK_NAME: a data folder the server user can write.
pick_pg_data_dir() {
  local preferred="$1" fallback="/var/tmp/$2"
  if is_root; then
    mkdir -p "$preferred" 2>/dev/null && chown postgres:postgres "$preferred" 2>/dev/null
    if runuser -u postgres -- test -w "$preferred" 2>/dev/null; then echo "$preferred"; return 0; fi
    mkdir -p "$fallback" && chown postgres:postgres "$fallback" && chmod 700 "$fallback"
    echo "$fallback"
  elif mkdir -p "$preferred" 2>/dev/null && [ -w "$preferred" ]; then
    echo "$preferred"
  else
    mkdir -p "$fallback" && chmod 700 "$fallback"
    echo "$fallback"
  fi
}

# pg_cluster_start DATA PORT LOGFILE [extra server options]
pg_cluster_start() {
  local data="$1" port="$2" log="$3"; shift 3
  local sock="$data/socket"
  if [ ! -f "$data/PG_VERSION" ]; then
    say "Initialising a PostgreSQL cluster in $data"
    pg_run "$PG_BIN/initdb" -D "$data" -U postgres --auth=trust --encoding=UTF8 --locale=C.UTF-8 >"$log.initdb" 2>&1 \
      || { cat "$log.initdb" >&2; die "initdb failed"; }
  fi
  pg_run mkdir -p "$sock"
  if pg_run "$PG_BIN/pg_ctl" -D "$data" status >/dev/null 2>&1; then
    say "PostgreSQL already running on port $port"
    return 0
  fi
  rm -f "$data/postmaster.pid" 2>/dev/null || true
  touch "$log" && { is_root && chown postgres "$log"; true; }
  say "Starting PostgreSQL on 127.0.0.1:$port"
  pg_run "$PG_BIN/pg_ctl" -D "$data" -l "$log" -w -t 30 \
    -o "-p $port -h 127.0.0.1 -k $sock -c listen_addresses=127.0.0.1 $*" start >/dev/null \
    || { tail -20 "$log" >&2; die "PostgreSQL did not start (log: $log)"; }
}

pg_cluster_stop() {
  local data="$1"
  if [ -f "$data/PG_VERSION" ] && pg_run "$PG_BIN/pg_ctl" -D "$data" status >/dev/null 2>&1; then
    say "Stopping PostgreSQL"
    pg_run "$PG_BIN/pg_ctl" -D "$data" -m fast -w -t 30 stop >/dev/null 2>&1 || true
  fi
}

# pg_ensure_database PORT DBNAME ROLE PASSWORD
pg_ensure_database() {
  local port="$1" db="$2" role="$3" password="$4"
  local q="psql -h 127.0.0.1 -p $port -U postgres -d postgres -tAq"
  if [ "$($q -c "select 1 from pg_roles where rolname='$role'")" != "1" ]; then
    $q -c "create role \"$role\" login password '$password'" >/dev/null || die "could not create role $role"
  fi
  if [ "$($q -c "select 1 from pg_database where datname='$db'")" != "1" ]; then
    say "Creating database $db"
    $q -c "create database \"$db\" owner \"$role\"" >/dev/null || die "could not create database $db"
  fi
}

# pg_ensure_login_role PORT ROLE PASSWORD: a role that can sign in and owns nothing; the
# migration step (scripts/migrate.ts) grants it what the app needs. The password is set on
# every start, so the one kept in .data stays the one that works.
pg_ensure_login_role() {
  local port="$1" role="$2" password="$3"
  local q="psql -h 127.0.0.1 -p $port -U postgres -d postgres -tAq"
  if [ "$($q -c "select 1 from pg_roles where rolname='$role'")" != "1" ]; then
    $q -c "create role \"$role\" login" >/dev/null || die "could not create role $role"
  fi
  $q -c "alter role \"$role\" login nosuperuser nocreatedb nocreaterole password '$password'" >/dev/null ||
    die "could not set up role $role"
}

# port_is_free PORT
port_is_free() { ! (exec 3<>"/dev/tcp/127.0.0.1/$1") 2>/dev/null; }

# wait_for_http URL SECONDS
wait_for_http() {
  local url="$1" limit="$2" i=0
  until node -e "fetch(process.argv[1]).then(r=>process.exit(r.ok?0:1)).catch(()=>process.exit(1))" "$url"; do
    i=$((i + 1)); [ "$i" -ge $((limit * 2)) ] && return 1; sleep 0.5
  done
}

# export_app_env APP_PORT SMTP_PORT MAIL_HTTP_PORT UPLOAD_DIR: what the app reads (lib/env.ts)
# besides DATABASE_URL and AUTH_SECRET, which each script sets for its own database.
export_app_env() {
  export AUTH_TRUST_HOST=true
  export APP_URL="http://localhost:$1"
  export AUTH_URL="$APP_URL"
  export SMTP_HOST=127.0.0.1 SMTP_PORT="$2"
  export MAIL_CATCHER_URL="http://127.0.0.1:$3"
  export UPLOAD_DIR="$4"
  mkdir -p "$UPLOAD_DIR"
  export NEXT_TELEMETRY_DISABLED=1
}

# start_mail_catcher SMTP_PORT HTTP_PORT LOGFILE [STORE]: sets CATCHER_PID, waits until it answers.
start_mail_catcher() {
  node_modules/.bin/tsx scripts/mail-catcher.ts --smtp-port "$1" --http-port "$2" ${4:+--store "$4"} >"$3" 2>&1 &
  CATCHER_PID=$!
  wait_for_http "http://127.0.0.1:$2/health" 30 || die "the mail catcher did not start (log: $3)"
  # The answer must come from the catcher just started, not from another one on that port.
  kill -0 "$CATCHER_PID" 2>/dev/null || die "the mail catcher exited at start (log: $3)"
}
