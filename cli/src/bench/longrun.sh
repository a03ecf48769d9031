#!/usr/bin/env bash
# Wall time of a long exact run (`qchain step` on a dense 20-state chain, P^3000, about 3 s) with and without the
# C1-only start-up flag, for the JIT choice of the ./qchain launcher. Needs hyperfine (Debian: apt-get install
# hyperfine). The chain in dense20.csv is invented (rows with denominators 120 to 240, drawn once with a fixed seed).
# Figures go to docs/performance.md ("Start-up").
set -euo pipefail
cd "$(dirname "$0")/../../.."
./qchain --version >/dev/null
J=cli/target/qchain.jar
M=cli/src/bench/dense20.csv
L=-Dlog4j2.loggerContextFactory=org.apache.logging.log4j.simple.SimpleLoggerContextFactory
hyperfine -N -w 1 -r "${RUNS:-5}" --export-markdown "${OUT:-/dev/stdout}" \
  "java $L -XX:+UseSerialGC -XX:TieredStopAtLevel=1 -jar $J step $M -n 3000 --format json --max-digits 100000000" \
  "java $L -XX:+UseSerialGC -jar $J step $M -n 3000 --format json --max-digits 100000000"
