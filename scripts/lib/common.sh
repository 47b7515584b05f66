# Shared steps of start, test and the other scripts. Sourced, not run.
# Every helper is idempotent: run twice, it changes nothing the second time.

ROOT="$(cd "$(dirname "${BASH_SOURCE[0]}")/../.." && pwd)"
cd "$ROOT"

DATA_DIR="$ROOT/.data"
PGPORT="${PGPORT:-54329}"
PG_DIR="$DATA_DIR/pg"
PG_SOCKET_DIR="$DATA_DIR/pg-socket"
PG_LOG="$DATA_DIR/pg.log"
export EXPO_OFFLINE=1 EXPO_NO_TELEMETRY=1 EXPO_NO_NEW_ARCH_COMPAT_CHECK=1 EXPO_UNSTABLE_HEADLESS=1

say() { printf '\033[1m[strapsift]\033[0m %s\n' "$*" >&2; }
die() { printf '\033[31m[strapsift] %s\033[0m\n' "$*" >&2; exit 1; }

as_root() { [ "$(id -u)" = 0 ]; }

apt_install() {
  as_root || die "Missing Debian packages ($*); run: sudo apt-get install -y $*"
  say "installing Debian packages: $*"
  if ! DEBIAN_FRONTEND=noninteractive apt-get install -y -q "$@" >"$DATA_DIR/apt.log" 2>&1; then
    apt-get update -q >>"$DATA_DIR/apt.log" 2>&1 || true
    DEBIAN_FRONTEND=noninteractive apt-get install -y -q "$@" >>"$DATA_DIR/apt.log" 2>&1 \
      || die "apt-get install $* failed; see $DATA_DIR/apt.log"
  fi
}

# Dependencies follow the lock file: `npm ci` on a fresh clone; when the lock file changed under an
# existing node_modules, a non-destructive `npm install` (an `npm ci` would delete the folder while
# other processes may be using it). The stamp keeps the lock file's hash outside node_modules.
ensure_node_modules() {
  mkdir -p "$DATA_DIR"
  local stamp="$DATA_DIR/npm-lock.sha" want have=""
  want="$(sha1sum package-lock.json | cut -d' ' -f1)"
  [ -f "$stamp" ] && have="$(cat "$stamp")"
  if [ ! -d node_modules/.bin ] || [ ! -x node_modules/.bin/tsx ]; then
    say "installing dependencies (npm ci)"
    npm ci --no-audit --no-fund --loglevel=error || die "npm ci failed"
  elif [ "$want" != "$have" ]; then
    say "lock file changed: updating dependencies (npm install)"
    npm install --no-audit --no-fund --loglevel=error || die "npm install failed"
  else
    return 0
  fi
  sha1sum package-lock.json | cut -d' ' -f1 >"$stamp"
}

pg_bin() {
  local found
  found="$(ls -d /usr/lib/postgresql/*/bin 2>/dev/null | sort -V | tail -1)"
  if [ -z "$found" ] || [ ! -x "$found/initdb" ]; then
    apt_install postgresql >&2
    found="$(ls -d /usr/lib/postgresql/*/bin 2>/dev/null | sort -V | tail -1)"
    [ -x "$found/initdb" ] || die "PostgreSQL binaries not found after install"
  fi
  echo "$found"
}

# Runs a PostgreSQL tool as the postgres user when we are root (initdb refuses root).
pg_run() {
  if as_root; then runuser -u postgres -- "$@"; else "$@"; fi
}

PG_STARTED_HERE=0
ensure_postgres() {
  mkdir -p "$DATA_DIR"
  local bin
  bin="$(pg_bin)"
  PG_BIN="$bin"
  if [ ! -f "$PG_DIR/PG_VERSION" ]; then
    say "creating a project-local PostgreSQL cluster in .data/pg"
    mkdir -p "$PG_DIR" "$PG_SOCKET_DIR"
    if as_root; then
      chown postgres:postgres "$PG_DIR" "$PG_SOCKET_DIR"
      chmod 700 "$PG_DIR"
      # Every parent must be traversable by the postgres user.
      local dir="$DATA_DIR"
      while [ "$dir" != "/" ]; do chmod o+x "$dir" 2>/dev/null || true; dir="$(dirname "$dir")"; done
    fi
    # Password authentication only (scram-sha-256), never trust: the superuser's password is generated
    # into .data/ and handed to initdb through a file only the postgres user reads, then removed.
    local pwfile
    pwfile="$(mktemp)"
    cat "$(superuser_password_file)" >"$pwfile"
    as_root && chown postgres "$pwfile"
    pg_run "$bin/initdb" -D "$PG_DIR" -U postgres --auth=scram-sha-256 --pwfile="$pwfile" -E UTF8 --locale=C.UTF-8 >"$DATA_DIR/initdb.log" 2>&1 \
      || { rm -f "$pwfile"; die "initdb failed; see .data/initdb.log"; }
    rm -f "$pwfile"
  fi
  mkdir -p "$PG_SOCKET_DIR"
  as_root && chown postgres:postgres "$PG_SOCKET_DIR"
  if pg_run "$bin/pg_ctl" -D "$PG_DIR" status >/dev/null 2>&1; then
    ensure_password_auth
    ensure_app_role
    return 0
  fi
  touch "$PG_LOG"; as_root && chown postgres:postgres "$PG_LOG"
  say "starting PostgreSQL on 127.0.0.1:$PGPORT"
  pg_run "$bin/pg_ctl" -D "$PG_DIR" -l "$PG_LOG" -w -t 60 \
    -o "-p $PGPORT -k $PG_SOCKET_DIR -c listen_addresses=127.0.0.1 -c fsync=on" start >/dev/null \
    || die "PostgreSQL did not start; see .data/pg.log"
  PG_STARTED_HERE=1
  ensure_password_auth
  ensure_app_role
}

# Secrets of the local cluster, generated once into .data/ (git-ignored), readable by this user only.
superuser_password_file() { generated_secret "$DATA_DIR/pg-superuser-password"; }
app_password_file() { generated_secret "$DATA_DIR/pg-app-password"; }
generated_secret() {
  local file="$1"
  if [ ! -s "$file" ]; then
    mkdir -p "$DATA_DIR"
    (umask 077 && od -An -tx1 -N24 /dev/urandom | tr -d ' \n' >"$file")
  fi
  echo "$file"
}

APP_ROLE=strapsift_app

# A cluster made before passwords (initdb --auth=trust) is moved over: the superuser gets its password
# while trust still lets us in, then every trust line in pg_hba.conf becomes scram-sha-256 and the
# server reloads. Idempotent: a cluster without trust lines is left alone.
ensure_password_auth() {
  local hba="$PG_DIR/pg_hba.conf"
  if pg_run grep -Eq '^[[:space:]]*(local|host)[^#]*[[:space:]]trust([[:space:]]|$)' "$hba"; then
    say "switching the local PostgreSQL from trust to password authentication"
    PGOPTIONS="-c client_min_messages=warning" "$PG_BIN/psql" -h 127.0.0.1 -p "$PGPORT" -U postgres -d postgres -v ON_ERROR_STOP=1 -qtA \
      -c "ALTER ROLE postgres PASSWORD '$(cat "$(superuser_password_file)")'" >/dev/null \
      || die "could not set the PostgreSQL superuser's password"
    pg_run sed -i -E 's/^([[:space:]]*(local|host)[^#]*[[:space:]])trust([[:space:]]|$)/\1scram-sha-256\3/' "$hba"
    pg_run "$PG_BIN/pg_ctl" -D "$PG_DIR" reload >/dev/null || die "PostgreSQL did not reload pg_hba.conf"
    sleep 0.3
  fi
}

# The app's own role: it can log in and owns the app's databases, nothing more (not a superuser,
# cannot create roles or databases). Its password follows .data/pg-app-password.
ensure_app_role() {
  local password
  password="$(cat "$(app_password_file)")"
  psql_admin -c "DO \$\$ BEGIN
      IF NOT EXISTS (SELECT 1 FROM pg_roles WHERE rolname = '$APP_ROLE') THEN
        CREATE ROLE $APP_ROLE LOGIN NOSUPERUSER NOCREATEDB NOCREATEROLE PASSWORD '$password';
      ELSE
        ALTER ROLE $APP_ROLE LOGIN NOSUPERUSER NOCREATEDB NOCREATEROLE PASSWORD '$password';
      END IF;
    END \$\$" >/dev/null || die "could not create the app's database role"
}

# Hands a database and everything already in it to the app's role (databases made before the role
# existed hold tables owned by postgres).
grant_database() {
  local name="$1"
  psql_admin -c "ALTER DATABASE \"$name\" OWNER TO $APP_ROLE" >/dev/null
  PGPASSWORD="$(cat "$(superuser_password_file)")" PGOPTIONS="-c client_min_messages=warning" \
    "$PG_BIN/psql" -h 127.0.0.1 -p "$PGPORT" -U postgres -d "$name" -v ON_ERROR_STOP=1 -qtA -c "DO \$\$
      DECLARE item record;
      BEGIN
        EXECUTE 'ALTER SCHEMA public OWNER TO $APP_ROLE';
        FOR item IN SELECT c.relname, c.relkind FROM pg_class c JOIN pg_namespace n ON n.oid = c.relnamespace
                     WHERE n.nspname = 'public' AND c.relkind IN ('r', 'S', 'v', 'm', 'p')
                       AND pg_get_userbyid(c.relowner) <> '$APP_ROLE'
                       -- a sequence behind a serial column follows its table
                       AND NOT EXISTS (SELECT 1 FROM pg_depend d WHERE d.objid = c.oid AND d.deptype IN ('a', 'i')) LOOP
          EXECUTE format('ALTER %s public.%I OWNER TO $APP_ROLE',
            CASE item.relkind WHEN 'S' THEN 'SEQUENCE' WHEN 'v' THEN 'VIEW' WHEN 'm' THEN 'MATERIALIZED VIEW' ELSE 'TABLE' END, item.relname);
        END LOOP;
      END \$\$" >/dev/null || die "could not hand database $name to the app's role"
}

stop_postgres_if_started() {
  if [ "$PG_STARTED_HERE" = 1 ]; then
    say "stopping PostgreSQL"
    pg_run "$PG_BIN/pg_ctl" -D "$PG_DIR" -m fast -w stop >/dev/null 2>&1 || true
    PG_STARTED_HERE=0
  fi
}

psql_admin() {
  PGPASSWORD="$(cat "$(superuser_password_file)")" PGOPTIONS="-c client_min_messages=warning" \
  "$PG_BIN/psql" -h 127.0.0.1 -p "$PGPORT" -U postgres -d postgres -v ON_ERROR_STOP=1 -qtA "$@"
}

ensure_database() {
  local name="$1"
  if [ "$(psql_admin -c "SELECT 1 FROM pg_database WHERE datname = '$name'")" != "1" ]; then
    say "creating database $name"
    psql_admin -c "CREATE DATABASE \"$name\" OWNER $APP_ROLE" >/dev/null
  fi
  grant_database "$name"
}

recreate_database() {
  local name="$1"
  psql_admin -c "DROP DATABASE IF EXISTS \"$name\" WITH (FORCE)" >/dev/null
  psql_admin -c "CREATE DATABASE \"$name\" OWNER $APP_ROLE" >/dev/null
}

# The app connects as its own role with the generated password; the superuser is for these scripts only.
database_url() { echo "postgres://$APP_ROLE:$(cat "$(app_password_file)")@127.0.0.1:$PGPORT/$1"; }
# For rigs that create and drop their own databases (load, bench).
admin_database_url() { echo "postgres://postgres:$(cat "$(superuser_password_file)")@127.0.0.1:$PGPORT/$1"; }

run_migrations() {
  node --import tsx node_modules/typeorm/cli.js migration:run -d server/db/data-source.ts >"$DATA_DIR/migrate.log" 2>&1 \
    || { cat "$DATA_DIR/migrate.log" >&2; die "migrations failed"; }
}

# The web export is slow (about a minute cold), so it only runs when a client file changed.
ensure_web_export() {
  local stamp="dist/.strapsift-export"
  if [ -f "$stamp" ] && [ -z "$(find app src shared assets app.json babel.config.js metro.config.js package-lock.json scripts/web-export.sh scripts/web \
        -newer "$stamp" -type f -print -quit 2>/dev/null)" ]; then
    return 0
  fi
  bash scripts/web-export.sh || die "web export failed"
}

ensure_chromium() {
  if [ ! -x /usr/bin/chromium ]; then
    apt_install chromium
  fi
}

# The camera's test cards are drawn in free fonts from Debian as well as the app's own; without them the
# cards use the fonts that are there (fewer digit shapes), so a missing package only warns when not root.
ensure_card_fonts() {
  local missing=()
  [ -f /usr/share/fonts/truetype/dejavu/DejaVuSansMono.ttf ] || missing+=(fonts-dejavu-core)
  [ -f /usr/share/fonts/truetype/liberation/LiberationMono-Regular.ttf ] || missing+=(fonts-liberation)
  [ ${#missing[@]} -eq 0 ] && return 0
  if as_root; then apt_install "${missing[@]}"; else say "fonts for the camera's test cards missing (${missing[*]}); cards use the app's font only"; fi
}
