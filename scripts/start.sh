#!/usr/bin/env bash
# `npm start`: install what is missing, start PostgreSQL and the SMTP fake on loopback, migrate,
# seed the demo lab, build the client when it changed, then serve the product with one worker.
# Ctrl-C stops the server, the worker, the fake and the database cleanly.
set -euo pipefail
ROOT=$(cd "$(dirname "${BASH_SOURCE[0]}")/.." && pwd)
cd "$ROOT"
source scripts/deps.sh
source scripts/pg.sh

export PORT=${PORT:-4310}
export PG_PORT=${PG_PORT:-54310}
export SMTP_PORT=${SMTP_PORT:-2525}
export DATABASE_URL=${DATABASE_URL:-postgres://postgres@127.0.0.1:$PG_PORT/equilibrist}
export APP_URL=${APP_URL:-http://127.0.0.1:$PORT}
export SESSION_SECRET=${SESSION_SECRET:-$( [ -f .data/session-secret ] && cat .data/session-secret || (mkdir -p .data && head -c 32 /dev/urandom | base64 | tee .data/session-secret) )}

deps_npm
pg_up .data/pg "$PG_PORT"
pg_createdb "$PG_PORT" equilibrist

pids=()
cleanup() {
  trap - INT TERM EXIT
  echo; echo "[equilibrist] stopping…"
  for p in "${pids[@]}"; do kill -TERM "$p" 2>/dev/null || true; done
  for p in "${pids[@]}"; do wait "$p" 2>/dev/null || true; done
  pg_down "$ROOT/.data/pg"
  echo "[equilibrist] stopped."
}
trap cleanup INT TERM EXIT

node --import tsx scripts/migrate.ts
sign_ins=$(node --import tsx scripts/seed.ts)
echo "$sign_ins"

hash=$(cat vite.config.ts package-lock.json $(find src shared -type f | sort) | sha256sum | cut -c1-16)
if [ ! -f dist/.build-hash ] || [ "$(cat dist/.build-hash)" != "$hash" ]; then
  echo "[equilibrist] building the client…"
  npx vite build --logLevel warn
  echo "$hash" > dist/.build-hash
fi

node --import tsx server/mail/fake-smtp.main.ts & pids+=($!)
node --import tsx server/index.ts & pids+=($!)
if [ -f server/worker.ts ]; then node --import tsx server/worker.ts & pids+=($!); fi
# Repeat the demo sign-ins once the server answers, so they are the last thing on screen.
node -e '
  const url = `http://127.0.0.1:${process.env.PORT}/api/health`;
  const until = Date.now() + 30000;
  (async () => {
    while (Date.now() < until) {
      try { if ((await fetch(url)).ok) process.exit(0); } catch {}
      await new Promise((r) => setTimeout(r, 250));
    }
    process.exit(1);
  })();
' && echo "$sign_ins" && echo "[equilibrist] open $APP_URL — Ctrl-C stops the server and the database."
wait -n "${pids[@]}"
