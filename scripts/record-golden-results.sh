#!/usr/bin/env bash
# Re-records the golden results of the demo and the validation cases
# (src/test/resources/golden/*.json.gz) that GoldenResultsTest compares every build against.
# Use it only for an intended change of an answer, and say in the commit message what changed
# and why; a speed change must pass the test unchanged.
set -euo pipefail
cd "$(dirname "${BASH_SOURCE[0]}")/.."
mvn -B -q test -Dtest=GoldenResultsTest -Dflexmargin.golden.record=true -Dsurefire.failIfNoSpecifiedTests=false
git status --short src/test/resources/golden
