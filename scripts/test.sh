#!/usr/bin/env bash
# npm test — every test, on a fresh machine, with one command: installs what is missing
# (MariaDB, Chromium and python3-iapws from Debian; Node packages), creates a fresh test
# database, then runs svelte-check, ESLint/Prettier, Vitest (unit, reference, integration)
# and Playwright against the built app in Debian's Chromium. Runs every stage even after a
# failure; exits non-zero if anything failed; the last line reads "N passed, N failed".
source "$(dirname "$0")/lib.sh"
require_node
set +e
cd "$ROOT"

TEST_DB="${STEAMWISP_TEST_DB_NAME:-steamwisp_test}"
REPORTS="$DATA_DIR/test-reports"
rm -rf "$REPORTS" && mkdir -p "$REPORTS"
passed=0 failed=0 skipped=0

# add_counts FILE — adds a JSON {passed, failed, skipped} summary to the totals.
add_counts() {
	local p f s
	read -r p f s < <(node -e '
		const r = JSON.parse(require("fs").readFileSync(process.argv[1], "utf8"));
		console.log(r.passed, r.failed, r.skipped);' "$1" 2>/dev/null || echo "0 1 0")
	passed=$((passed + p)) failed=$((failed + f)) skipped=$((skipped + s))
}
# stage NAME CMD… — a whole command counted as one test.
stage() {
	local name="$1"
	shift
	say "── $name"
	if "$@"; then passed=$((passed + 1)); else
		failed=$((failed + 1))
		say "FAILED: $name"
	fi
}

set -e
command -v chromium >/dev/null 2>&1 || apt_install "the browser for end-to-end tests (chromium)" chromium
/usr/bin/python3 -c 'import iapws' >/dev/null 2>&1 || apt_install "the reference steam library (python3-iapws)" python3-iapws
ensure_node_modules
db_was_running=0
bash scripts/db.sh status >/dev/null 2>&1 && db_was_running=1
bash scripts/db.sh fresh "$TEST_DB"
set +e
# Leave no server behind that this run started (CI expects none running).
[ "$db_was_running" = 1 ] || trap 'bash scripts/db.sh stop >/dev/null' EXIT

export STEAMWISP_DB_NAME="$TEST_DB"
stage "migrate and seed the test database" bash -c 'npx tsx scripts/migrate.ts && npx tsx scripts/seed.ts'
stage "svelte-check" npm run --silent check
stage "lint (Prettier + ESLint)" npm run --silent lint

say "── Vitest (unit, reference, integration)"
node_modules/.bin/vitest run --reporter=default --reporter=json --outputFile="$REPORTS/vitest.json"
node -e '
	const r = JSON.parse(require("fs").readFileSync(process.argv[1], "utf8"));
	const skipped = r.numPendingTests + r.numTodoTests;
	// A file that failed to load has no tests in it: count it as a failure.
	const broken = r.testResults.filter((f) => f.status === "failed" && f.assertionResults.length === 0).length;
	require("fs").writeFileSync(process.argv[2], JSON.stringify({ passed: r.numPassedTests, failed: r.numFailedTests + broken, skipped }));
	// What failed, for the end of the run (the last lines are what a CI log shows first).
	const lines = [];
	for (const f of r.testResults) {
		const file = require("path").relative(process.cwd(), f.name);
		if (f.status === "failed" && f.assertionResults.length === 0) lines.push(`Vitest ${file}: ${(f.message || "failed to load").split("\n")[0]}`);
		for (const a of f.assertionResults) {
			if (a.status !== "failed") continue;
			lines.push(`Vitest ${file} › ${a.fullName}: ${(a.failureMessages[0] || "").split("\n")[0].slice(0, 300)}`);
		}
	}
	require("fs").writeFileSync(process.argv[3], lines.map((l) => l + "\n").join(""));
' "$REPORTS/vitest.json" "$REPORTS/vitest-counts.json" "$REPORTS/failures.txt"
add_counts "$REPORTS/vitest-counts.json"

stage "build" node_modules/.bin/vite build --logLevel warn

say "── Playwright (Debian Chromium)"
PLAYWRIGHT_JSON_OUTPUT_NAME="$REPORTS/playwright.json" node_modules/.bin/playwright test --reporter=list,json
node -e '
	const fs = require("fs");
	let r;
	try { r = JSON.parse(fs.readFileSync(process.argv[1], "utf8")).stats; } catch { r = null; }
	const out = r ? { passed: r.expected, failed: r.unexpected + r.flaky, skipped: r.skipped } : { passed: 0, failed: 1, skipped: 0 };
	fs.writeFileSync(process.argv[2], JSON.stringify(out));
	let report = null;
	try { report = JSON.parse(fs.readFileSync(process.argv[1], "utf8")); } catch {}
	const lines = [];
	const walk = (suite, titles) => {
		for (const s of suite.suites || []) walk(s, [...titles, s.title]);
		for (const spec of suite.specs || []) {
			for (const t of spec.tests || []) {
				if (t.status === "expected" || t.status === "skipped") continue;
				const err = (t.results || []).map((x) => x.error && x.error.message).find(Boolean) || t.status;
				lines.push(`Playwright ${spec.file}:${spec.line} › ${[...titles, spec.title].filter(Boolean).join(" › ")}: ${String(err).split("\n")[0].slice(0, 300)}`);
			}
		}
	};
	if (report) for (const s of report.suites || []) walk(s, []);
	fs.appendFileSync(process.argv[3], lines.map((l) => l + "\n").join(""));
' "$REPORTS/playwright.json" "$REPORTS/playwright-counts.json" "$REPORTS/failures.txt"
add_counts "$REPORTS/playwright-counts.json"

if [ -s "$REPORTS/failures.txt" ]; then
	say "── What failed"
	cat "$REPORTS/failures.txt"
fi
summary="$passed passed, $failed failed"
[ "$skipped" -gt 0 ] && summary="$summary, $skipped skipped"
echo "$summary"
[ "$failed" -eq 0 ]
