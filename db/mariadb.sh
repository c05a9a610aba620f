#!/usr/bin/env bash
# The project's private MariaDB server: Debian's mariadb-server, our own data directory, socket,
# pid file and port on 127.0.0.1, so it never touches a system server on 3306.
#
#   bash db/mariadb.sh start    install if missing, initialise, start (or reuse), create databases/users
#   bash db/mariadb.sh stop     stop the server this folder runs
#   bash db/mariadb.sh status   exit 0 when it answers
#
# Settings come from the environment (see .env.example); defaults below.
set -euo pipefail

ROOT="$(cd "$(dirname "${BASH_SOURCE[0]}")/.." && pwd)"
# Same settings as every other entry point: .env.example, then .env, then the real environment.
if command -v node >/dev/null; then eval "$(node "$ROOT/scripts/print-env.mjs" 'DB_*' DATA_DIR)"; fi
DATA_ROOT="${DATA_DIR:-.data}"
# A relative DATA_DIR (as in .env.example) is relative to the project, not to mariadbd's cwd.
case "$DATA_ROOT" in /*) ;; *) DATA_ROOT="$ROOT/$DATA_ROOT" ;; esac
DIR="$DATA_ROOT/mariadb"
DATADIR="$DIR/data"
SOCK="$DIR/mariadb.sock"
PID="$DIR/mariadb.pid"
LOG="$DIR/mariadb.log"
PORT="${DB_PORT:-3407}"
DB_NAME="${DB_NAME:-scalewright}"
DB_TEST_NAME="${DB_TEST_NAME:-scalewright_test}"
DB_USER="${DB_USER:-scalewright}"
DB_PASSWORD="${DB_PASSWORD:-scalewright-dev}"

log() { printf '[mariadb] %s\n' "$*" >&2; }

as_root() {
  if [ "$(id -u)" -eq 0 ]; then "$@"; elif command -v sudo >/dev/null; then sudo "$@"; else
    log "need root or sudo to run: $*"; exit 1
  fi
}

find_bin() {
  for name in "$@"; do
    for candidate in "$(command -v "$name" 2>/dev/null || true)" "/usr/sbin/$name" "/usr/bin/$name"; do
      if [ -n "$candidate" ] && [ -x "$candidate" ]; then echo "$candidate"; return 0; fi
    done
  done
  return 1
}

ensure_installed() {
  if find_bin mariadbd >/dev/null && find_bin mariadb >/dev/null; then return 0; fi
  log "mariadb-server is not installed; installing it with apt-get (one time)"
  as_root env DEBIAN_FRONTEND=noninteractive apt-get update -qq
  as_root env DEBIAN_FRONTEND=noninteractive apt-get install -y -qq --no-install-recommends \
    mariadb-server mariadb-client >/dev/null
}

client() { "$(find_bin mariadb)" --no-defaults --socket="$SOCK" -uroot "$@"; }
ping_server() { "$(find_bin mariadb-admin mysqladmin)" --no-defaults --socket="$SOCK" -uroot ping >/dev/null 2>&1; }

running_pid() {
  [ -f "$PID" ] || return 1
  local pid; pid="$(cat "$PID" 2>/dev/null || true)"
  [ -n "$pid" ] && kill -0 "$pid" 2>/dev/null || return 1
  # A killed server whose parent never reaped it still answers kill -0 as a zombie.
  [ "$(awk '{print $3}' "/proc/$pid/stat" 2>/dev/null)" != "Z" ] || return 1
  echo "$pid"
}

# A kill -9 leaves the pid file and socket behind; remove them when no live server owns them.
recover_stale() {
  if [ -f "$PID" ] && ! running_pid >/dev/null; then
    log "removing stale pid file from an earlier run"; rm -f "$PID"
  fi
  if [ -S "$SOCK" ] && ! ping_server; then
    log "removing stale socket from an earlier run"; rm -f "$SOCK"
  fi
}

init_datadir() {
  [ -d "$DATADIR/mysql" ] && return 0
  log "initialising a new data directory in $DATADIR"
  mkdir -p "$DATADIR"
  local user_opt=(); [ "$(id -u)" -eq 0 ] && user_opt=(--user=root)
  "$(find_bin mariadb-install-db mysql_install_db)" --no-defaults "${user_opt[@]}" --datadir="$DATADIR" \
    --auth-root-authentication-method=socket --skip-test-db >"$DIR/install.log" 2>&1 \
    || { log "mariadb-install-db failed; see $DIR/install.log"; exit 1; }
}

start_server() {
  local user_opt=(); [ "$(id -u)" -eq 0 ] && user_opt=(--user=root)
  log "starting mariadbd on 127.0.0.1:$PORT"
  # Temporary tables in a folder of our own: /tmp is shared with other programs that may clean it.
  mkdir -p "$DIR/tmp"
  # setsid: the server must outlive the shell that started it and not get the launcher's Ctrl-C.
  setsid "$(find_bin mariadbd)" --no-defaults "${user_opt[@]}" --datadir="$DATADIR" --socket="$SOCK" \
    --port="$PORT" --bind-address=127.0.0.1 --pid-file="$PID" --log-error="$LOG" --tmpdir="$DIR/tmp" \
    --skip-name-resolve --character-set-server=utf8mb4 --collation-server=utf8mb4_unicode_ci \
    --default-storage-engine=InnoDB --max-connections=500 --innodb-buffer-pool-size=256M \
    --innodb-flush-log-at-trx-commit=1 </dev/null >/dev/null 2>&1 &
  for _ in $(seq 1 150); do
    if ping_server; then return 0; fi
    sleep 0.1
  done
  log "mariadbd did not answer within 15 s; see $LOG"; tail -n 20 "$LOG" >&2 || true; exit 1
}

ensure_databases() {
  local pw="${DB_PASSWORD//\'/\'\'}"
  client <<SQL
CREATE DATABASE IF NOT EXISTS \`$DB_NAME\` CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci;
CREATE DATABASE IF NOT EXISTS \`$DB_TEST_NAME\` CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci;
CREATE USER IF NOT EXISTS '$DB_USER'@'127.0.0.1' IDENTIFIED BY '$pw';
CREATE USER IF NOT EXISTS '$DB_USER'@'localhost' IDENTIFIED BY '$pw';
ALTER USER '$DB_USER'@'127.0.0.1' IDENTIFIED BY '$pw';
ALTER USER '$DB_USER'@'localhost' IDENTIFIED BY '$pw';
GRANT ALL PRIVILEGES ON \`$DB_NAME\`.* TO '$DB_USER'@'127.0.0.1', '$DB_USER'@'localhost';
GRANT ALL PRIVILEGES ON \`$DB_TEST_NAME\`.* TO '$DB_USER'@'127.0.0.1', '$DB_USER'@'localhost';
GRANT ALL PRIVILEGES ON \`${DB_TEST_NAME}\_%\`.* TO '$DB_USER'@'127.0.0.1', '$DB_USER'@'localhost';
-- Restores of backups go to databases named <DB_NAME>_<something>.
GRANT ALL PRIVILEGES ON \`${DB_NAME}\_%\`.* TO '$DB_USER'@'127.0.0.1', '$DB_USER'@'localhost';
FLUSH PRIVILEGES;
SQL
}

cmd_start() {
  mkdir -p "$DIR"
  ensure_installed
  if running_pid >/dev/null && ping_server; then
    log "already running (pid $(running_pid)); reusing it"
  else
    recover_stale
    init_datadir
    start_server
  fi
  ensure_databases
  log "ready: 127.0.0.1:$PORT, databases $DB_NAME and $DB_TEST_NAME"
}

cmd_stop() {
  if ! running_pid >/dev/null; then log "not running"; recover_stale; return 0; fi
  local pid; pid="$(running_pid)"
  "$(find_bin mariadb-admin mysqladmin)" --no-defaults --socket="$SOCK" -uroot shutdown 2>/dev/null || kill "$pid"
  for _ in $(seq 1 100); do kill -0 "$pid" 2>/dev/null || { log "stopped"; return 0; }; sleep 0.1; done
  log "did not stop in 10 s; killing"; kill -9 "$pid" 2>/dev/null || true; recover_stale
}

case "${1:-start}" in
  start) cmd_start ;;
  stop) cmd_stop ;;
  status) if running_pid >/dev/null && ping_server; then echo "running (pid $(running_pid))"; else echo "stopped"; exit 1; fi ;;
  pid) running_pid ;;
  *) echo "usage: $0 start|stop|status|pid" >&2; exit 2 ;;
esac
