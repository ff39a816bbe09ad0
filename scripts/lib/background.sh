# Background services for scripts/start.sh and scripts/test.sh: the local mail server and the
# worker. Sourced, not run. Each service keeps its pid in .data/<name>.pid, so a later run stops
# one left over from an earlier run before starting it again.

stop_background() {
  local pidfile=".data/$1.pid" pid
  [ -f "$pidfile" ] || return 0
  pid=$(cat "$pidfile")
  if kill -0 "$pid" 2>/dev/null; then
    kill "$pid" 2>/dev/null || true
    for _ in $(seq 1 50); do kill -0 "$pid" 2>/dev/null || break; sleep 0.2; done
    kill -9 "$pid" 2>/dev/null || true
  fi
  rm -f "$pidfile"
}

#   start_background NAME LOG_FILE COMMAND...   COMMAND must be a program, not a shell
#   function (a function would run in a subshell, and the pid would be the subshell's).
start_background() {
  local name="$1" log="$2"; shift 2
  stop_background "$name"
  mkdir -p .data
  "$@" >"$log" 2>&1 &
  echo $! > ".data/$name.pid"
}

#   wait_for_port PORT NAME LOG_FILE: up to 30 s for a service to listen on 127.0.0.1:PORT.
wait_for_port() {
  local port="$1" name="$2" log="$3"
  for _ in $(seq 1 150); do
    if (exec 3<>"/dev/tcp/127.0.0.1/$port") 2>/dev/null; then return 0; fi
    sleep 0.2
  done
  echo "The $name did not start; its log ($log) says:" >&2
  tail -n 20 "$log" >&2
  return 1
}

#   start_mail_services PREFIX SMTP_PORT: the local mail server and the worker, with the
#   current DATABASE_URL, NEXTAUTH_URL and NEXTAUTH_SECRET.
start_mail_services() {
  local prefix="$1" port="$2"
  # TypeScript entry points run in one node process (tsx as a loader, no wrapper process).
  start_background "$prefix-mail-server" ".data/$prefix-mail-server.log" node --import tsx scripts/mail-server.ts "$port"
  wait_for_port "$port" "local mail server" ".data/$prefix-mail-server.log"
  SMTP_HOST=127.0.0.1 SMTP_PORT="$port" start_background "$prefix-worker" ".data/$prefix-worker.log" node --import tsx scripts/worker.ts
}

stop_mail_services() {
  stop_background "$1-worker"
  stop_background "$1-mail-server"
}
