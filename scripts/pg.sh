#!/usr/bin/env bash
# PostgreSQL cluster helpers for the project's own scripts (sourced, not run).
# A cluster per purpose ("dev", "test") lives outside the work tree when we run as root,
# because the postgres user may not be able to enter the clone's folder.
set -euo pipefail

# "return 0", not a bare "return": inside a trap handler (the EXIT cleanup) a bare return gives
# back the status from before the trap, which read as "not installed".
pg_bin_dir() {
  local d
  for d in /usr/lib/postgresql/*/bin; do [ -x "$d/initdb" ] && { echo "$d"; return 0; }; done
  command -v initdb >/dev/null 2>&1 && { dirname "$(command -v initdb)"; return 0; }
  return 1
}

pg_ensure_installed() {
  if ! pg_bin_dir >/dev/null 2>&1; then
    echo "› PostgreSQL server not found: installing Debian's postgresql package"
    local SUDO=""; [ "$(id -u)" -ne 0 ] && SUDO="sudo"
    $SUDO apt-get update -qq && DEBIAN_FRONTEND=noninteractive $SUDO apt-get install -y -qq postgresql >/dev/null
  fi
  PG_BIN="$(pg_bin_dir)"
}

# Run a PostgreSQL server binary as the right user.
pg_as_owner() {
  if [ "$(id -u)" -eq 0 ]; then runuser -u postgres -- "$@"; else "$@"; fi
}

# pg_cluster_dir NAME -> folder holding this clone's cluster NAME
pg_cluster_dir() {
  local name="$1" key
  key="$(printf '%s' "$PWD" | sha1sum | cut -c1-10)"
  if [ "$(id -u)" -eq 0 ]; then echo "/var/tmp/loamcast-pg/$key/$name"; else echo "$PWD/.local/pg/$name"; fi
}

port_in_use() { (exec 3<>"/dev/tcp/127.0.0.1/$1") 2>/dev/null && { exec 3>&- 3<&-; return 0; }; return 1; }

pg_password_stamp() { printf '%s' "$1" | sha1sum | cut -d' ' -f1; }

# A cluster outside the work tree outlives the clone: a new clone at the same path has new secrets
# (.local/secrets.env), and the old cluster would refuse them ("password authentication failed").
# The test and bench clusters are rebuilt on every run anyway, so they are made again; any other
# cluster holds someone's data, so we stop and say how to recover it.
pg_check_password() {
  local name="$1" dir="$2" password="$3"
  [ -f "$dir/data/PG_VERSION" ] || return 0
  [ "$(cat "$dir/password.sha1" 2>/dev/null)" = "$(pg_password_stamp "$password")" ] && return 0
  case "$name" in
    test|bench)
      echo "› PostgreSQL cluster '$name' in $dir was made with other secrets (an earlier clone here): making it again"
      pg_as_owner "$PG_BIN/pg_ctl" -D "$dir/data" -m immediate -w stop >/dev/null 2>&1 || true
      rm -rf "$dir/data" "$dir/password.sha1" ;;
    *)
      if [ -f "$dir/password.sha1" ]; then
        echo "✗ PostgreSQL cluster '$name' in $dir was made with another password than .local/secrets.env holds. Restore that file from the earlier clone, or delete $dir to start with an empty database." >&2
        return 1
      fi
      # Made before passwords were stamped: trust it once and stamp it (a mismatch still fails at connect).
      pg_password_stamp "$password" > "$dir/password.sha1" ;;
  esac
}

# pg_start NAME PORT PASSWORD: init the cluster on first use, start it, wait until ready.
pg_start() {
  local name="$1" port="$2" password="$3" dir
  pg_ensure_installed
  dir="$(pg_cluster_dir "$name")"
  mkdir -p "$dir"
  [ "$(id -u)" -eq 0 ] && chown postgres:postgres "$dir" && chmod 700 "$dir" && chmod 755 "$(dirname "$dir")" "$(dirname "$(dirname "$dir")")"
  pg_check_password "$name" "$dir" "$password" || return 1
  if [ ! -f "$dir/data/PG_VERSION" ]; then
    echo "› Creating PostgreSQL cluster '$name' in $dir"
    printf '%s\n' "$password" > "$dir/pwfile"
    [ "$(id -u)" -eq 0 ] && chown postgres:postgres "$dir/pwfile"
    pg_as_owner "$PG_BIN/initdb" -D "$dir/data" -U loamcast --pwfile="$dir/pwfile" \
      --auth-local=scram-sha-256 --auth-host=scram-sha-256 -E UTF8 --locale=C.UTF-8 >"$dir/initdb.log" 2>&1 \
      || { cat "$dir/initdb.log"; return 1; }
    rm -f "$dir/pwfile"
    pg_password_stamp "$password" > "$dir/password.sha1"
  fi
  if pg_as_owner "$PG_BIN/pg_ctl" -D "$dir/data" status >/dev/null 2>&1; then
    echo "› PostgreSQL '$name' already running"
    return 0
  fi
  if port_in_use "$port"; then
    echo "✗ Port $port (PostgreSQL '$name') is already taken by another program. Free it or set PGPORT." >&2
    return 1
  fi
  pg_as_owner "$PG_BIN/pg_ctl" -D "$dir/data" -l "$dir/server.log" -w -t 30 \
    -o "-c listen_addresses=127.0.0.1 -p $port -k $dir" start >/dev/null \
    || { tail -20 "$dir/server.log"; return 1; }
  echo "› PostgreSQL '$name' listening on 127.0.0.1:$port"
}

pg_stop() {
  local dir; [ -n "${PG_BIN:-}" ] || pg_ensure_installed; dir="$(pg_cluster_dir "$1")"
  [ -f "$dir/data/postmaster.pid" ] && pg_as_owner "$PG_BIN/pg_ctl" -D "$dir/data" -m fast -w stop >/dev/null 2>&1 || true
}

# pg_restart NAME [SECONDS_DOWN]: a fast restart (open sessions are terminated), used by the fault
# test (tests/integration/proof/postgres-restart.test.ts). With SECONDS_DOWN the server stays
# stopped that long before it starts again (PG_PORT and PG_PASSWORD from load_env). Either way
# the server keeps logging to its file, so the caller's pipes are not held open by it.
pg_restart() {
  local name="$1" down="${2:-0}" dir; pg_ensure_installed; dir="$(pg_cluster_dir "$name")"
  if [ "$down" = 0 ]; then
    pg_as_owner "$PG_BIN/pg_ctl" -D "$dir/data" -l "$dir/server.log" -m fast -w -t 30 restart >/dev/null
  else
    pg_as_owner "$PG_BIN/pg_ctl" -D "$dir/data" -m fast -w -t 30 stop >/dev/null
    sleep "$down"
    pg_start "$name" "$PG_PORT" "$PG_PASSWORD" >/dev/null
  fi
}
