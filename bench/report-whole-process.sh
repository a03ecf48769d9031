#!/usr/bin/env bash
# whole-process timings of qchain report on the 20-state dense chain, with baselines in the same run
cd "$(dirname "$0")/.."
# the chain: java -cp bench/target/benchmarks.jar org.qchain.bench.Issue13Chains DIR writes DIR/dense20.chain
DIR=${1:-/tmp/qchain-report-bench}
mkdir -p "$DIR"
[ -f "$DIR/dense20.chain" ] || java -cp bench/target/benchmarks.jar org.qchain.bench.Issue13Chains "$DIR" >/dev/null
M=$DIR/dense20.chain
echo "start $(date -u +%H:%M:%S) load $(cut -d' ' -f1-3 /proc/loadavg)"
for i in 1 2 3 4 5; do
  /usr/bin/time -f "check %e s" ./qchain check $M > /dev/null
  /usr/bin/time -f "step-n10 %e s" ./qchain step $M -n 10 > /dev/null
  /usr/bin/time -f "report-html %e s %M KB" ./qchain report $M -o $DIR/d20.html
  /usr/bin/time -f "report-md %e s" ./qchain report $M -o $DIR/d20.md
  /usr/bin/time -f "report-tex %e s" ./qchain report $M -o $DIR/d20.tex
done
echo "end $(date -u +%H:%M:%S) load $(cut -d' ' -f1-3 /proc/loadavg)"
