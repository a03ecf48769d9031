#!/usr/bin/env bash
# Whole-process timings of the speed issue's rows (`qchain step` from a cold JVM, output to a file), the new jar
# against an old one in the same run, interleaved. Usage, from the repository root:
#   OLD=/path/to/old/qchain.jar RUNS=5 bench/whole-process.sh > bench/target/whole-process.txt
# SET=continuous times the continuous-chain case instead (bench/models/repairable50.chain: avail, and step -t at 10
# times to 30 certified digits; no bench jar needed). SET=solves times issue 9's exact solves (the 300-state banded
# absorption and the 200-state dense long run of LinearSolveBench, with --brief; --max-digits for older jars).
# Needs the bench jar (mvn -B -q -o -Pbench -pl bench -am package -DskipTests) for the chain files and the CLI jar
# (./qchain builds it). SET=intime times `avail` on the formulas route for k-1 units in active parallel with
# one repair crew, k = 4..8 states, rates i*lam and mu (one chain: the steady-state formulas only, --max-time-states 0, as the baseline; then
# with A(t) and R(t) as formulas in t); no bench jar needed. Prints one line per run: case, jar, wall seconds, user+system CPU seconds, peak RSS.
set -euo pipefail
cd "$(dirname "$0")/.."
NEW=${NEW:-cli/target/qchain.jar}
OLD=${OLD:-$NEW}
RUNS=${RUNS:-5}
D=bench/target/chains
mkdir -p "$D" bench/target/out
L=-Dlog4j2.loggerContextFactory=org.apache.logging.log4j.simple.SimpleLoggerContextFactory
if [ "${SET:-}" = solves ]; then
java -cp bench/target/benchmarks.jar org.qchain.bench.LinearSolveBench 1 no "$D" > /dev/null
cases=(
  "version|--version"
  "absorb300|absorb $D/banded300.chain --brief --max-digits 1000000000"
  "absorb300json|absorb $D/banded300.chain --brief --format json --max-digits 1000000000"
  "longrun200json|longrun $D/dense200.chain --brief --format json --max-digits 1000000000"
)
elif [ "${SET:-}" = intime ]; then
cases=()
for k in 4 5 6 7 8; do
  f=$D/birth-death$k.chain
  {
    echo "# $((k - 1)) pumps of our own in active parallel, one repair crew; down when none runs"
    echo "chain continuous"
    echo "param lam in (0, inf)"
    echo "param mu in (0, inf)"
    printf 'states'; for ((i = 0; i < k; i++)); do printf ' S%d' $i; done; echo
    printf 'up'; for ((i = 0; i < k - 1; i++)); do printf ' S%d' $i; done; echo
    for ((i = 0; i < k - 1; i++)); do echo "S$i S$((i + 1)) $((k - 1 - i))*lam"; echo "S$((i + 1)) S$i mu"; done
  } > "$f"
  cases+=("steady$k|avail $f --max-time-states 0" "intime$k|avail $f --max-time-states 8")
done
elif [ "${SET:-}" = continuous ]; then
cases=(
  "version|--version"
  "avail50|avail bench/models/repairable50.chain --digits 30 --format json"
  "step-t50|step bench/models/repairable50.chain -t 1,2,5,10,20,50,100,200,500,1000 --digits 30 --format json"
)
else
java -cp bench/target/benchmarks.jar org.qchain.bench.Issue13Chains "$D"
cases=(
  "row1|step $D/dense20.chain -n 256 --format json --max-digits 1000000000"
  "row2|step $D/dense50.chain -n 64 --format json --max-digits 1000000000"
  "row3|step $D/sparse100.chain -n 1000000 --from S0 --to S1 --certified"
  "row3-exact|step $D/sparse100.chain -n 1000000 --from S0 --to S1"
  "sparse1000|step $D/sparse1000.chain -n 1000000 --from S0 --certified --format json"
  "row4|closed $D/closed12.chain"
  "row5|closed $D/closed20.chain"
)
fi
echo "# $(date -u +%FT%TZ) $(nproc) cores, load: $(cut -d' ' -f1-3 /proc/loadavg)"
for ((r = 1; r <= RUNS; r++)); do
  for c in "${cases[@]}"; do
    name=${c%%|*}; args=${c#*|}
    jars=("$NEW"); [ "$OLD" != "$NEW" ] && jars+=("$OLD")
    for jar in "${jars[@]}"; do
      tag=$([ "$jar" = "$NEW" ] && echo new || echo old)
      # shellcheck disable=SC2086
      /usr/bin/time -f "$name $tag %e %U %S %M" -o bench/target/out/time.txt \
        java $L -XX:+UseSerialGC -jar "$jar" $args > bench/target/out/$name-$tag.out 2>/dev/null || true
      read -r n t wall user sys rss < <(tail -n 1 bench/target/out/time.txt)
      printf '%s %s wall %.2f s cpu %.2f s rss %d MB\n' "$n" "$t" "$wall" "$(echo "$user + $sys" | bc)" $((rss / 1024))
    done
  done
done
echo "# end $(date -u +%FT%TZ) load: $(cut -d' ' -f1-3 /proc/loadavg)"
