#!/usr/bin/env bash
# A private MariaDB for Chillwright: its own data folder, socket and loopback port.
# Usage: scripts/db.sh up|down|status|url
#        scripts/db.sh backup [FILE]   consistent dump of DB_NAME (gzip); prints the file's path
#        scripts/db.sh restore FILE    replaces DB_NAME with the dump's contents
# Settings (env): DB_DIR, DB_PORT, DB_NAME, DB_USER, DB_PASSWORD, DB_START_TIMEOUT_S, BACKUP_DIR.
set -euo pipefail

REPO="$(cd "$(dirname "${BASH_SOURCE[0]}")/.." && pwd)"
DB_DIR="$(realpath -m "${DB_DIR:-$REPO/.data/mariadb}")"
DB_PORT="${DB_PORT:-3307}"
DB_NAME="${DB_NAME:-chillwright}"
DB_USER="${DB_USER:-chillwright}"
DB_PASSWORD="${DB_PASSWORD:-chillwright-dev}"
DB_START_TIMEOUT_S="${DB_START_TIMEOUT_S:-60}"
BACKUP_DIR="${BACKUP_DIR:-$REPO/.data/backups}"
export PATH="$PATH:/usr/sbin:/sbin"

SOCK="$DB_DIR/sock"
PID_FILE="$DB_DIR/pid"
LOG="$DB_DIR/mariadbd.log"

say() { echo "db.sh: $*" >&2; }
die() { say "error: $*"; exit 1; }

# Identifiers and strings go into SQL; refuse anything that would need quoting.
[[ "$DB_NAME" =~ ^[A-Za-z0-9_]+$ ]] || die "DB_NAME may hold only letters, digits and _"
[[ "$DB_USER" =~ ^[A-Za-z0-9_]+$ ]] || die "DB_USER may hold only letters, digits and _"
[[ "$DB_PASSWORD" != *"'"* && "$DB_PASSWORD" != *"\\"* ]] || die "DB_PASSWORD may not contain ' or \\"
[[ "$DB_PORT" =~ ^[0-9]+$ ]] || die "DB_PORT must be a number"
(( ${#SOCK} < 100 )) || die "socket path too long for a unix socket (${#SOCK} chars): $SOCK; use a shorter DB_DIR"

root_sql() { mariadb --no-defaults --socket="$SOCK" -uroot --batch --skip-column-names "$@"; }

# Alive and ours: after a reboot the pid in a stale file may belong to some other process.
pid_alive() {
  [[ -f "$PID_FILE" ]] || return 1
  local pid
  pid="$(cat "$PID_FILE" 2>/dev/null || true)"
  [[ "$pid" =~ ^[0-9]+$ ]] && kill -0 "$pid" 2>/dev/null || return 1
  [[ -r "/proc/$pid/cmdline" ]] || return 0
  local cmdline
  cmdline="$(tr '\0' ' ' <"/proc/$pid/cmdline")"
  [[ "$cmdline" == *"--datadir=$DB_DIR/data "* ]]
}

answers() { mariadb-admin --no-defaults --socket="$SOCK" -uroot --connect-timeout=2 ping >/dev/null 2>&1; }

is_up() { pid_alive && answers; }

ensure_server_installed() {
  command -v mariadbd >/dev/null 2>&1 && return 0
  [[ "$(id -u)" == 0 ]] || die "mariadbd is not installed; run as root (or apt-get install mariadb-server) first"
  say "installing mariadb-server with apt-get"
  apt-get update
  DEBIAN_FRONTEND=noninteractive apt-get install -y mariadb-server
  # Debian starts its own service on install; ours is separate, so the system one may stay or go.
  command -v mariadbd >/dev/null 2>&1 || die "mariadb-server installed but mariadbd not found"
}

initialise_data_dir() {
  mkdir -p "$DB_DIR"
  chmod 700 "$DB_DIR"
  [[ -d "$DB_DIR/data/mysql" ]] && return 0
  say "initialising $DB_DIR/data"
  # Its own tmpdir: several private servers on one machine must not share temporary files in /tmp.
  mkdir -p "$DB_DIR/tmp"
  mariadb-install-db --no-defaults --datadir="$DB_DIR/data" --tmpdir="$DB_DIR/tmp" --auth-root-authentication-method=normal \
    --skip-test-db >"$DB_DIR/install.log" 2>&1 || { tail -n 30 "$DB_DIR/install.log" >&2; die "mariadb-install-db failed"; }
}

start_server() {
  rm -f "$PID_FILE" "$SOCK"
  # setsid + nohup: the server outlives this script and holds none of the caller's pipes.
  # skip-name-resolve: root@localhost then matches only the socket, never a TCP client.
  mkdir -p "$DB_DIR/tmp"
  setsid nohup mariadbd --no-defaults --datadir="$DB_DIR/data" --tmpdir="$DB_DIR/tmp" --socket="$SOCK" --port="$DB_PORT" \
    --bind-address=127.0.0.1 --user=root --pid-file="$PID_FILE" --skip-name-resolve \
    --character-set-server=utf8mb4 --collation-server=utf8mb4_unicode_ci \
    >>"$LOG" 2>&1 </dev/null &
  local child=$! waited=0
  until answers; do
    if ! kill -0 "$child" 2>/dev/null && ! pid_alive; then
      tail -n 30 "$LOG" >&2
      die "mariadbd exited during start (is port $DB_PORT taken?)"
    fi
    if (( waited >= DB_START_TIMEOUT_S * 4 )); then
      tail -n 30 "$LOG" >&2
      die "mariadbd did not answer within ${DB_START_TIMEOUT_S}s"
    fi
    sleep 0.25
    waited=$((waited + 1))
  done
}

# mariadb-install-db leaves password-less root accounts for TCP hosts; keep root on the socket only.
drop_root_over_tcp() {
  local host
  while IFS= read -r host; do
    [[ -n "$host" ]] && root_sql -e "DROP USER IF EXISTS 'root'@'$host';"
  done < <(root_sql -e "SELECT host FROM mysql.user WHERE user = 'root' AND host <> 'localhost';")
}

create_database_and_user() {
  drop_root_over_tcp
  root_sql <<SQL
CREATE DATABASE IF NOT EXISTS \`$DB_NAME\` CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci;
CREATE USER IF NOT EXISTS '$DB_USER'@'127.0.0.1' IDENTIFIED BY '$DB_PASSWORD';
CREATE USER IF NOT EXISTS '$DB_USER'@'localhost' IDENTIFIED BY '$DB_PASSWORD';
ALTER USER '$DB_USER'@'127.0.0.1' IDENTIFIED BY '$DB_PASSWORD';
ALTER USER '$DB_USER'@'localhost' IDENTIFIED BY '$DB_PASSWORD';
GRANT ALL PRIVILEGES ON \`$DB_NAME\`.* TO '$DB_USER'@'127.0.0.1';
GRANT ALL PRIVILEGES ON \`$DB_NAME\`.* TO '$DB_USER'@'localhost';
FLUSH PRIVILEGES;
SQL
}

cmd_up() {
  ensure_server_installed
  initialise_data_dir
  if is_up; then
    say "already up (pid $(cat "$PID_FILE"), port $DB_PORT)"
  else
    pid_alive && die "pid $(cat "$PID_FILE") is alive but does not answer on $SOCK; see $LOG"
    start_server
    say "up (pid $(cat "$PID_FILE"), port $DB_PORT, dir $DB_DIR)"
  fi
  create_database_and_user
}

cmd_down() {
  if ! pid_alive; then
    rm -f "$PID_FILE"
    say "not running"
    return 0
  fi
  local pid waited=0
  pid="$(cat "$PID_FILE")"
  mariadb-admin --no-defaults --socket="$SOCK" -uroot shutdown >/dev/null 2>&1 || kill -TERM "$pid" 2>/dev/null || true
  while kill -0 "$pid" 2>/dev/null; do
    (( waited >= 240 )) && { say "still running after 60s; sending SIGKILL"; kill -KILL "$pid" 2>/dev/null || true; break; }
    sleep 0.25
    waited=$((waited + 1))
  done
  rm -f "$PID_FILE"
  say "down"
}

cmd_status() {
  if is_up; then
    echo "up pid=$(cat "$PID_FILE") port=$DB_PORT dir=$DB_DIR"
  else
    echo "down dir=$DB_DIR"
    return 3
  fi
}

urlencode() {
  local s="$1" out="" c i
  for ((i = 0; i < ${#s}; i++)); do
    c="${s:i:1}"
    case "$c" in [A-Za-z0-9._~-]) out+="$c" ;; *) out+="$(printf '%%%02X' "'$c")" ;; esac
  done
  printf '%s' "$out"
}

cmd_url() { echo "mariadb://$(urlencode "$DB_USER"):$(urlencode "$DB_PASSWORD")@127.0.0.1:$DB_PORT/$DB_NAME"; }

ensure_client_tools() {
  command -v mariadb-dump >/dev/null 2>&1 && return 0
  [[ "$(id -u)" == 0 ]] || die "mariadb-dump is not installed; run as root (or apt-get install mariadb-client) first"
  say "installing mariadb-client with apt-get"
  apt-get update
  DEBIAN_FRONTEND=noninteractive apt-get install -y mariadb-client
}

# A dump is whole only when mariadb-dump reached its closing comment.
dump_is_complete() { gzip -dc "$1" 2>/dev/null | tail -n 1 | grep -q '^-- Dump completed'; }

# One transaction's snapshot of every InnoDB table: the app may keep writing meanwhile.
cmd_backup() {
  is_up || die "the database is not running (scripts/db.sh up first)"
  ensure_client_tools
  local file="${1:-$BACKUP_DIR/$DB_NAME-$(date -u +%Y%m%dT%H%M%SZ).sql.gz}"
  mkdir -p "$(dirname "$file")"
  local partial="$file.partial"
  if ! ( umask 077
    mariadb-dump --no-defaults --socket="$SOCK" -uroot --single-transaction --quick --hex-blob \
      --routines --triggers --default-character-set=utf8mb4 "$DB_NAME" | gzip -6 >"$partial" ) \
    || ! dump_is_complete "$partial"; then
    rm -f "$partial"
    die "the dump of $DB_NAME did not complete"
  fi
  mv "$partial" "$file"
  say "backed up $DB_NAME to $file ($(du -h "$file" | cut -f1))"
  echo "$file"
}

# Drops DB_NAME and loads the dump into a new, empty database of the same name. The file is
# checked first, so a truncated or foreign file never costs the data that is there.
cmd_restore() {
  local file="${1:-}"
  [[ -n "$file" ]] || die "usage: $0 restore FILE (a .sql.gz made by $0 backup)"
  [[ -r "$file" ]] || die "cannot read $file"
  gzip -t "$file" 2>/dev/null || die "$file is not a gzip file, or it is damaged"
  local header
  header="$(gzip -dc "$file" 2>/dev/null | head -n 5 || true)"
  grep -q '^-- MariaDB dump' <<<"$header" || die "$file is not a mariadb-dump file"
  dump_is_complete "$file" || die "$file is incomplete (no closing line); nothing was changed"
  is_up || die "the database is not running (scripts/db.sh up first)"
  say "replacing $DB_NAME with $file; stop the app first so nobody writes meanwhile"
  root_sql <<SQL
DROP DATABASE IF EXISTS \`$DB_NAME\`;
CREATE DATABASE \`$DB_NAME\` CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci;
SQL
  gzip -dc "$file" | mariadb --no-defaults --socket="$SOCK" -uroot --default-character-set=utf8mb4 "$DB_NAME" \
    || die "loading $file failed part way; run restore again with a good file"
  # Database-level grants outlive DROP DATABASE; this keeps a restore onto a new server working too.
  create_database_and_user
  say "restored $DB_NAME from $file"
}

case "${1:-}" in
  up) cmd_up ;;
  down) cmd_down ;;
  status) cmd_status ;;
  url) cmd_url ;;
  backup) cmd_backup "${2:-}" ;;
  restore) cmd_restore "${2:-}" ;;
  *) echo "usage: $0 up|down|status|url|backup [FILE]|restore FILE" >&2; exit 2 ;;
esac
