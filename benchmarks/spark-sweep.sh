#!/usr/bin/env bash
# Sweeps on Spark against the local runner, side by side in one run on the same machine: cases per second of
#   1. the example sweep (geometries/tourer-washout-taper.sweep.yaml, 63 heavy cases: stall, maximum lift), and
#   2. a 10 000-case Latin hypercube (benchmarks/sweeps/tourer-lhs-10000.sweep.yaml, linear results and the
#      stall onset: milliseconds a case),
# each by `./spanlift sweep --jobs N` and by `./spanlift-spark sweep --master local[N]` (N = 2 by default), wall
# time with the JVM start, and for Spark also the run alone (without starting Spark, from its summary line).
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

secs() { awk -v a="$1" -v b="$2" 'BEGIN { printf "%.2f", (b - a) / 1e9 }'; }
{
  echo "== Sweeps on Spark local[$N] against spanlift sweep --jobs $N ($(nproc) cores, load average before: $(load))"
  printf '%-34s %7s %10s %10s %10s %12s %12s\n' sweep cases "local s" "spark s" "spark run" "local c/s" "spark c/s"
} | tee "$report"
for sweep in geometries/tourer-washout-taper.sweep.yaml benchmarks/sweeps/tourer-lhs-10000.sweep.yaml; do
  name="$(basename "$sweep" .sweep.yaml)"
  t0=$(date +%s%N)
  ./spanlift sweep "$sweep" --output "$OUT/local/$name.csv" --jobs "$N" --progress none 2> "$OUT/local/$name.err" || true
  t1=$(date +%s%N)
  ./spanlift-spark sweep "$sweep" --output "$OUT/spark/$name.csv" --master "local[$N]" --progress none \
    2> "$OUT/spark/$name.err" || true
  t2=$(date +%s%N)
  for f in "$name.csv" "$name.ranked.csv" "$name.csv.manifest.json"; do
    cmp -s "$OUT/local/$f" "$OUT/spark/$f" || { echo "spark-sweep.sh: $f differs between the runs" >&2; exit 1; }
  done
  cases=$(($(wc -l < "$OUT/local/$name.csv") - 1))
  ls=$(secs "$t0" "$t1"); ss=$(secs "$t1" "$t2")
  run=$(sed -n 's/.* run in \([0-9.]*\) s on Spark.*/\1/p' "$OUT/spark/$name.err")
  awk -v n="$name" -v c="$cases" -v l="$ls" -v s="$ss" -v r="$run" 'BEGIN {
    printf "%-34s %7d %10.1f %10.1f %10.1f %12.1f %12.1f\n", n, c, l, s, r, c / l, c / s
    printf "%-34s spark/local time: %.2f with the start, %.2f for the run alone (Spark started in %.1f s)\n", "", s / l, r / l, s - r }' \
    | tee -a "$report"
  grep '^sweep:' "$OUT/spark/$name.err" | sed 's/^/    /' | tee -a "$report"
done
echo "(identical results, ranked summaries and manifests; load average after: $(load); saved in $report)" | tee -a "$report"
