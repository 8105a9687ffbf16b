#!/usr/bin/env bash
# `npm run demo`: installs, migrates, seeds the invented demo region, builds and starts Leeway on the
# embedded database, then prints the address and the demo sign-ins. Stop it with Ctrl+C.
set -euo pipefail
cd "$(dirname "$0")/.."

bash scripts/install-deps.sh
node scripts/ensure-env.mjs
set -a; . ./.env; set +a
export LEEWAY_MODE=demo
PORT="${PORT:-3000}"

npm run --silent db:migrate
npm run --silent db:seed
node scripts/copy-map-worker.mjs
npx next build

node scripts/start-app.mjs --port "$PORT" &
app=$!
trap 'kill $app 2>/dev/null' EXIT INT TERM
node scripts/wait-for.mjs "http://localhost:$PORT/api/health"

cat <<TXT

Leeway is running at http://localhost:$PORT

Demo sign-ins (demo data only; never use these accounts in production):
  admin@leeway.example     leeway-admin     people, roles, outbox, audit trail, and everything a planner does
  planner@leeway.example   leeway-planner   edit scenarios and layers, publish, share for exercises
  trainer@leeway.example   leeway-trainer   scenarios shared for exercises, exports for drills
  council@leeway.example   leeway-council   published scenarios and the council summary

Press Ctrl+C to stop.
TXT
wait $app
