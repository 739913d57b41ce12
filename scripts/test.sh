#!/usr/bin/env bash
# `npm test`: the same bootstrap as `npm start` but on its own fresh database, then
# typecheck, lint, unit, reference, API end-to-end and browser suites. Ends with one
# line "N passed, N failed" over all suites and exits non-zero on any failure.
source "$(dirname "$0")/lib.sh"
cd "$ROOT"

ensure_node_modules
ensure_postgres_running
[[ -x /usr/bin/chromium ]] || apt_install chromium
[[ -x /usr/bin/Rscript ]] && Rscript -e 'library(survey); library(MASS)' >/dev/null 2>&1 || apt_install r-cran-survey r-cran-mass
/usr/bin/python3 -c 'import scipy' >/dev/null 2>&1 || apt_install python3-scipy

TEST_DB="${PLUMBLINE_TEST_DB:-plumbline_test}"
ensure_database "$TEST_DB" --fresh
export DATABASE_URL; DATABASE_URL="$(database_url "$TEST_DB")"
export CHROMIUM_PATH=/usr/bin/chromium

RESULTS="$DATA_DIR/test-results"
rm -rf "$RESULTS"; mkdir -p "$RESULTS"

cleanup() { if [[ "$PG_STARTED_HERE" == 1 ]]; then stop_postgres >/dev/null; fi; }
trap cleanup EXIT

# A check that is not a Vitest suite counts as one test.
check() {
  local name="$1"; shift
  say "== $name"
  if "$@"; then echo '{"numPassedTests":1,"numFailedTests":0}' >"$RESULTS/$name.json"
  else echo '{"numPassedTests":0,"numFailedTests":1}' >"$RESULTS/$name.json"; fi
}

suite() {
  local name="$1"
  say "== $name"
  local code=0
  npx vitest run --project "$name" --reporter=default --reporter=json --outputFile="$RESULTS/$name.json" || code=$?
  [[ -s "$RESULTS/$name.json" ]] || echo '{"numPassedTests":0,"numFailedTests":0}' >"$RESULTS/$name.json"
  echo "$code" >"$RESULTS/$name.exit"
}

check typecheck-api npx tsc -p api/tsconfig.json --noEmit
check typecheck-pwa npx tsc -p pwa/tsconfig.json --noEmit
check typecheck-scripts npx tsc -p tsconfig.json --noEmit
check lint npx eslint --max-warnings=0 .
# The client's generated types (pwa/src/lib/api-types.ts) must match the API's OpenAPI document.
check api-types npx tsx scripts/api-types.ts --check
suite api-unit
suite reference
suite pwa-unit
suite api-e2e
check build bash -c 'source scripts/lib.sh && build_all'
suite browser

node -e '
  const fs = require("fs"), dir = process.argv[1];
  let passed = 0, failed = 0;
  for (const f of fs.readdirSync(dir).filter((f) => f.endsWith(".json"))) {
    const name = f.replace(/\.json$/, "");
    const r = JSON.parse(fs.readFileSync(dir + "/" + f, "utf8"));
    const exit = fs.existsSync(`${dir}/${name}.exit`) ? Number(fs.readFileSync(`${dir}/${name}.exit`, "utf8")) : 0;
    // A suite that crashed, failed to load a file or exited non-zero counts at least one failure.
    const bad = r.numFailedTests + (r.numRuntimeErrors || 0) || (exit !== 0 || r.numFailedTestSuites ? 1 : 0);
    passed += r.numPassedTests; failed += bad;
    if (bad) console.log("  failing: " + name);
  }
  console.log(`${passed} passed, ${failed} failed`);
  process.exit(failed ? 1 : 0);
' "$RESULTS"
