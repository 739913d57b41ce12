#!/usr/bin/env bash
# `npm start`: dependencies, PostgreSQL on loopback, migrations, demo data, builds,
# then the API (which also serves the built PWA). Ctrl-C stops what this run started.
source "$(dirname "$0")/lib.sh"
cd "$ROOT"

ensure_node_modules
ensure_postgres_running
DB_NAME="${PLUMBLINE_DB_NAME:-plumbline}"
ensure_database "$DB_NAME"
export DATABASE_URL; DATABASE_URL="$(database_url "$DB_NAME")"
export JWT_SECRET; JWT_SECRET="${JWT_SECRET:-$(jwt_secret)}"
export HOST="${HOST:-127.0.0.1}" PORT="${PORT:-3000}"
export PWA_DIST="$ROOT/pwa/dist"
export LOG_LEVEL="${LOG_LEVEL:-warn}"   # LOG_LEVEL=info logs every request
# Mail goes to the local fake unless SMTP_URL names a real server.
if [[ -z "${SMTP_URL:-}" ]]; then
  ensure_mail_fake_running
  export SMTP_URL="smtp://127.0.0.1:$MAIL_FAKE_SMTP_PORT"
  MAILBOX_LINE="  Mail it sends (invitations, password resets): http://127.0.0.1:$MAIL_FAKE_WEB_PORT   (maildev, a local fake)"
else
  MAILBOX_LINE="  Mail goes to $SMTP_URL"
fi

API_PID=
cleanup() {
  trap - INT TERM EXIT
  set +e
  if [[ -n "$API_PID" ]]; then kill "$API_PID" 2>/dev/null; wait "$API_PID" 2>/dev/null; fi
  if [[ "$PG_STARTED_HERE" == 1 ]]; then stop_postgres; fi
  if [[ "$MAIL_FAKE_STARTED_HERE" == 1 ]]; then stop_mail_fake; fi
}
trap cleanup INT TERM EXIT

build_all
npx tsx scripts/migrate.ts || die "migrations failed"
node api/dist/demo/seed.js || die "seeding the demo data failed"

node api/dist/main.js &
API_PID=$!
for _ in $(seq 1 100); do
  if node -e 'fetch(process.argv[1]).then((r) => process.exit(r.ok ? 0 : 1), () => process.exit(1))' \
    "http://$HOST:$PORT/api/health"; then break; fi
  kill -0 "$API_PID" 2>/dev/null || die "the API stopped during start-up (see the lines above)"
  sleep 0.2
done
cat <<MSG

  Plumbline is running at http://$HOST:$PORT   (API docs: http://$HOST:$PORT/api/docs)
$MAILBOX_LINE

  Demo sign-ins (password for all: plumbline-demo)
    admin@vellmoor.example        admin: people and roles
    lead@vellmoor.example         project lead: set-up, balance, benchmarks
    supervisor@vellmoor.example   supervisor: quota board, review queue
    interviewer@vellmoor.example  interviewer: log contacts, outbox
    client@vellmoor.example       client: read-only progress

  Ctrl-C stops the API$( [[ $PG_STARTED_HERE == 1 ]] && echo ", PostgreSQL" )$( [[ $MAIL_FAKE_STARTED_HERE == 1 ]] && echo " and the mail fake" ).
MSG
wait "$API_PID"
