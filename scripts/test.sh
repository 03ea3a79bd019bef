#!/usr/bin/env bash
# `npm test`: install what is missing, start a throwaway PostgreSQL on loopback, build the
# client, run every test (unit, API against the real database, browser tests in Debian's
# chromium) and end with a plain "N passed, N failed" line. Extra arguments go to vitest.
set -euo pipefail
ROOT=$(cd "$(dirname "${BASH_SOURCE[0]}")/.." && pwd)
cd "$ROOT"
source scripts/deps.sh
source scripts/pg.sh

export PG_TEST_PORT=${PG_TEST_PORT:-54311}
export TEST_DATABASE_ADMIN_URL="postgres://postgres@127.0.0.1:$PG_TEST_PORT/postgres"
export NODE_ENV=test

deps_npm
deps_chromium
deps_pdftotext
PGT=".data/pg-test-$PG_TEST_PORT"
pg_down "$ROOT/$PGT" || true
rm -rf "$PGT" "$PGT-sock"
pg_up "$PGT" "$PG_TEST_PORT"
trap 'pg_down "$ROOT/$PGT"' EXIT

echo "[equilibrist] building the client…"
npx vite build --logLevel warn

set +e
npx vitest run --reporter=default --reporter=json --outputFile=.data/vitest-$PG_TEST_PORT.json "$@"
code=$?
set -e
node -e '
  // A file that fails to load has no failed test but a failed suite: count it as a failure.
  const fs = require("fs");
  let r = { numPassedTests: 0, numFailedTests: 0, numPendingTests: 0, testResults: [] };
  try { r = JSON.parse(fs.readFileSync(process.argv[1], "utf8")); } catch {}
  const broken = (r.testResults || []).filter((f) => f.status === "failed" && f.assertionResults.length === 0).length;
  let failed = r.numFailedTests + broken;
  if (process.argv[2] !== "0" && failed === 0) failed = 1;
  console.log(`${r.numPassedTests} passed, ${failed} failed, ${r.numPendingTests} skipped`);
' ".data/vitest-$PG_TEST_PORT.json" "$code"
exit $code
