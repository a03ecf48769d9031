#!/usr/bin/env bash
# The test suite at full size: every property at its @Property tries, including those that the default build runs
# with fewer (@QuickTries in the exact module's tests; see DEVELOPERS.md, "Tests"). Slower than `mvn -B verify`;
# run it before a release and after changes to the engines those properties check. Usage, from anywhere:
#   bench/long-check.sh            # all modules
#   bench/long-check.sh -pl exact  # extra Maven arguments are passed on
set -euo pipefail
cd "$(dirname "$0")/.."
exec mvn -B -o verify -Dqchain.tries=full "$@"
