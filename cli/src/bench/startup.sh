#!/usr/bin/env bash
# Cold-start time of `qchain step` on a small model, for the JVM flag choices of the ./qchain launcher.
# Needs hyperfine (Debian: apt-get install hyperfine). Run from the repository root after `./qchain --version`
# (which builds the jar and the class-data archive). Figures go to docs/performance.md ("Start-up").
set -euo pipefail
cd "$(dirname "$0")/../../.."
./qchain --version >/dev/null
J=cli/target/qchain.jar
M=docs/examples/pump-station.chain
L=-Dlog4j2.loggerContextFactory=org.apache.logging.log4j.simple.SimpleLoggerContextFactory
hyperfine -N -w 5 -r "${RUNS:-30}" --export-markdown "${OUT:-/dev/stdout}" \
  "java -jar $J step $M -n 12" \
  "java -XX:+UseSerialGC -jar $J step $M -n 12" \
  "java -XX:TieredStopAtLevel=1 -jar $J step $M -n 12" \
  "java $L -XX:+UseSerialGC -XX:TieredStopAtLevel=1 -Xshare:auto -jar $J step $M -n 12" \
  "java $L -XX:+UseSerialGC -XX:TieredStopAtLevel=1 -Xshare:off -jar $J step $M -n 12" \
  "java $L -XX:+UseSerialGC -XX:TieredStopAtLevel=1 -Xshare:auto -XX:SharedArchiveFile=cli/target/qchain.jsa -jar $J step $M -n 12" \
  "java $L -XX:+UseSerialGC -Xshare:auto -XX:SharedArchiveFile=cli/target/qchain.jsa -jar $J step $M -n 12" \
  "./qchain step $M -n 12"
