#!/usr/bin/env bash
# Runs the browser tests alone (for development): fresh e2e database, production build, Playwright.
# Extra arguments go to Playwright, e.g. `bash scripts/e2e.sh tests/e2e/roles.spec.ts`.
set -euo pipefail
cd "$(dirname "$0")/.."
node scripts/ensure-env.mjs
set -a; . ./.env; set +a
export LEEWAY_MODE=demo DATABASE_URL=file:./data/e2e.db
rm -f data/e2e.db data/e2e.db-*
npm run --silent db:migrate
npm run --silent db:seed
node scripts/copy-map-worker.mjs
[ "${SKIP_BUILD:-}" = 1 ] || npx next build
npx playwright test "$@"
