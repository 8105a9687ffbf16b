#!/usr/bin/env bash
# `npm test`: every check Leeway has — type-check, lint, unit and verification tests (Vitest),
# a production build, and browser tests in Debian's Chromium against the real app and database.
# Ends with one line "N passed, N failed" summed over all of them.
set -uo pipefail
cd "$(dirname "$0")/.."

bash scripts/install-deps.sh --with-browser || exit 1
node scripts/ensure-env.mjs
set -a; . ./.env; set +a
export LEEWAY_MODE=demo
mkdir -p test-results tests/artifacts
rm -f test-results/*.json test-results/steps.txt

step() {
  local name=$1; shift
  echo "== $name"
  if "$@"; then echo "$name passed" >> test-results/steps.txt; else echo "$name failed" >> test-results/steps.txt; fi
}

step typecheck npx tsc --noEmit -p .
step lint npx eslint . --max-warnings 0
step vitest npx vitest run --reporter=default --reporter=json --outputFile.json=test-results/vitest.json

# The browser tests get a fresh database with the demo data.
rm -f data/e2e.db data/e2e.db-*
export DATABASE_URL=file:./data/e2e.db
step migrate npm run --silent db:migrate
step seed npm run --silent db:seed
node scripts/copy-map-worker.mjs
step build npx next build
step playwright npx playwright test

node scripts/test-summary.mjs
