#!/usr/bin/env bash
# Sweeps on Spark against the local runner, side by side in one run on the same machine: cases per second of
#   1. the example sweep (geometries/tourer-washout-taper.sweep.yaml, 63 heavy cases: stall, maximum lift), and
#   2. a 10 000-case Latin hypercube (benchmarks/sweeps/tourer-lhs-10000.sweep.yaml, linear results and the
#      stall onset: milliseconds a case),
# each by `./spanlift sweep --jobs N` and by `./spanlift-spark sweep --master local[N]` (N = 2 by default), wall
# time with the JVM start, and for Spark also the run alone (without starting Spark, from its summary line);
# and the processor time of each (user + system, all threads): on a machine shared with other work the wall
# times follow the load, while the processor time a case costs does not, or much less.
# Checks that both wrote the same bytes. About 6 minutes on 2 cores.
#
#   benchmarks/spark-sweep.sh [N]        results in benchmarks/target/spark-sweep.txt
set -euo pipefail
ROOT="$(cd "$(dirname "${BASH_SOURCE[0]}")/.." && pwd)"
cd "$ROOT"
N="${1:-2}"
OUT="benchmarks/target/spark-sweep"
mkdir -p "$OUT/local" "$OUT/spark"
report="benchmarks/target/spark-sweep.txt"
load() { cut -d' ' -f1 /proc/loadavg 2>/dev/null || echo '?'; }

./spanlift --version > /dev/null        # build both first, untimed
./spanlift-spark --version > /dev/null

TIMEFORMAT='%R %U %S'   # wall, user and system seconds of a timed command
{
  echo "== Sweeps on Spark local[$N] against spanlift sweep --jobs $N ($(nproc) cores, load average before: $(load))"
  printf '%-22s %6s %8s %8s %9s %9s %9s %10s %10s\n' sweep cases "local s" "spark s" "spark run" "local c/s" \
    "spark c/s" "local cpu" "spark cpu"
} | tee "$report"
for sweep in geometries/tourer-washout-taper.sweep.yaml benchmarks/sweeps/tourer-lhs-10000.sweep.yaml; do
  name="$(basename "$sweep" .sweep.yaml)"
  { time ./spanlift sweep "$sweep" --output "$OUT/local/$name.csv" --jobs "$N" --progress none \
      2> "$OUT/local/$name.err" || true; } 2> "$OUT/local/$name.time"
  { time ./spanlift-spark sweep "$sweep" --output "$OUT/spark/$name.csv" --master "local[$N]" --progress none \
      2> "$OUT/spark/$name.err" || true; } 2> "$OUT/spark/$name.time"
  for f in "$name.csv" "$name.ranked.csv" "$name.csv.manifest.json"; do
    cmp -s "$OUT/local/$f" "$OUT/spark/$f" || { echo "spark-sweep.sh: $f differs between the runs" >&2; exit 1; }
  done
  cases=$(($(wc -l < "$OUT/local/$name.csv") - 1))
  read -r ls lu lsys < "$OUT/local/$name.time"
  read -r ss su ssys < "$OUT/spark/$name.time"
  run=$(sed -n 's/.* run in \([0-9.]*\) s on Spark.*/\1/p' "$OUT/spark/$name.err")
  awk -v n="$name" -v c="$cases" -v l="$ls" -v s="$ss" -v r="$run" -v lc="$(awk -v a="$lu" -v b="$lsys" 'BEGIN { print a + b }')" \
      -v sc="$(awk -v a="$su" -v b="$ssys" 'BEGIN { print a + b }')" 'BEGIN {
    printf "%-22s %6d %8.1f %8.1f %9.1f %9.1f %9.1f %10.1f %10.1f\n", substr(n, 1, 22), c, l, s, r, c / l, c / s, lc, sc
    printf "%-22s spark/local: wall %.2f with the start, %.2f for the run alone (Spark started in %.1f s);", "", s / l, r / l, s - r
    printf " processor time %.2f (%.1f against %.1f ms a case)\n", sc / lc, 1000 * sc / c, 1000 * lc / c }' \
    | tee -a "$report"
  grep '^sweep:' "$OUT/spark/$name.err" | sed 's/^/    /' | tee -a "$report"
done
echo "(identical results, ranked summaries and manifests; load average after: $(load); saved in $report)" | tee -a "$report"
