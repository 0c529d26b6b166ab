#!/usr/bin/env bash
# Regenerates the committed sample report reports/ridgeline-mc7-demo/ from mode-tables/demo/
# (PNG charts only, as committed). `flexmargin demo` never touches it: it writes to reports/demo/.
# Review the result with `git diff --stat reports/` before committing it.
set -euo pipefail
root="$(cd -P "$(dirname "${BASH_SOURCE[0]}")/.." && pwd)"
cd "$root"
status=0
scripts/flexmargin sweep mode-tables/demo/demo-case.json --out reports/ridgeline-mc7-demo --no-svg --design-notches --time-domain-check --quiet \
  || status=$?
# exit 3 is expected: the demo's starting loop misses its requirements on purpose
if [ "$status" -ne 0 ] && [ "$status" -ne 3 ]; then
  echo "refresh-sample-report: flexmargin failed with exit code $status; the sample is unchanged" >&2
  exit "$status"
fi
echo "sample report refreshed: reports/ridgeline-mc7-demo/"
