#!/usr/bin/env bash
# Builds and runs the Spanlift benchmarks, then times the command-line tool JVM start included.
#
#   benchmarks/run.sh                 full default run (about 6-8 minutes on 2 cores)
#   benchmarks/run.sh --quick         smoke run: one short iteration each (about 1 minute)
#   benchmarks/run.sh --no-cli        JMH only;  --no-jmh: CLI timing only;  --no-build: use the jars as built
#   benchmarks/run.sh -- ARGS...      ARGS go to JMH (e.g. -- -p unknowns=500 'SystemBenchmark')
#
# Step 1 builds benchmarks/target/benchmarks.jar (a self-contained JMH jar; `java -jar` it for JMH's own
# command line) and vlm-cli/target/spanlift.jar, offline (-o) as the project's builds are.
# Step 2 runs every JMH benchmark in one go through org.spanlift.benchmarks.BenchmarkReport, which prints
# a summary table with the derived figures (GFLOP/s, shares, growth with size) measured in that one run.
# Defaults (set by annotations in the benchmark classes): one fork each; trainer 4 x 1 s warm-up and
# 5 x 1 s measurement; systems 2 x 1 s warm-up and 3 x 1 s measurement (at 2000 unknowns an iteration is
# a single multi-second call). Results: benchmarks/target/jmh-result.json and benchmark-report.txt.
# After JMH, when python3 with NumPy and SciPy is present, benchmarks/openblas_lu.py times OpenBLAS's LU (the
# machine's limit) on the same sizes and prints it beside the JMH LU figures.
# Step 3 times `spanlift solve geometries/trainer.wing.yaml` (9 alphas by default), JVM start included,
# with hyperfine when installed (apt-get install -y hyperfine), otherwise a loop of 10 runs timed with
# date +%s%N; it uses ./spanlift when that launcher exists, else java -jar vlm-cli/target/spanlift.jar.
# Then the jar's size, its start-up (--version), solve of the trainer at 100 x 10 per half (2000 panels) and at
# its default lattice (best of 3 each), and the planform sweep (benchmarks/planform.sweep.yaml) with
# --jobs 1 and 2 from the command line, JVM start included, with a check that both outputs are the same bytes.
# Beside the 2000-panel solve, when python3 with NumPy, SciPy and PyYAML is present, the plain NumPy script
# benchmarks/numpy_reference.py on the same file (best of 3, Python start included) and its time over spanlift's.
# The script is run by the interpreter python3 resolves to, so that a version manager's shim is not timed.
set -euo pipefail

ROOT="$(cd "$(dirname "${BASH_SOURCE[0]}")/.." && pwd)"
cd "$ROOT"
OUT="benchmarks/target"
WING="geometries/trainer.wing.yaml"
RUNS=10

build=1 jmh=1 cli=1 quick=0
jmh_args=()
while [ $# -gt 0 ]; do
  case "$1" in
    --quick) quick=1 ;;
    --no-cli) cli=0 ;;
    --no-jmh) jmh=0 ;;
    --no-build) build=0 ;;
    --) shift; jmh_args+=("$@"); break ;;
    -h|--help) sed -n '2,26p' "$0"; exit 0 ;;
    *) echo "run.sh: unknown option $1 (JMH arguments go after --)" >&2; exit 2 ;;
  esac
  shift
done
if [ "$quick" = 1 ]; then
  jmh_args=(-wi 1 -w 500ms -i 1 -r 500ms "${jmh_args[@]}")
fi

load() { cut -d' ' -f1 /proc/loadavg 2>/dev/null || echo '?'; }

if [ "$build" = 1 ]; then
  echo "== build (mvn -o -pl benchmarks,vlm-cli -am package -DskipTests)"
  mvn -q -B -o -pl benchmarks,vlm-cli -am package -DskipTests
fi
mkdir -p "$OUT"

if [ "$jmh" = 1 ]; then
  echo "== JMH benchmarks (load average before: $(load))"
  java -cp "$OUT/benchmarks.jar" org.spanlift.benchmarks.BenchmarkReport \
    -rf json -rff "$OUT/jmh-result.json" "${jmh_args[@]}" | tee "$OUT/jmh-output.txt"
  # The summary is the tail of the output, from its heading on.
  sed -n '/^=== Spanlift benchmark summary/,$p' "$OUT/jmh-output.txt" > "$OUT/benchmark-report.txt"
  # The machine's limit, in the same run: OpenBLAS's LU through SciPy, side by side with the JMH figures.
  if command -v python3 > /dev/null && python3 -c 'import numpy, scipy.linalg' 2> /dev/null; then
    echo "== OpenBLAS LU through SciPy (load average before: $(load))"
    python3 benchmarks/openblas_lu.py "$OUT/jmh-result.json" | tee -a "$OUT/benchmark-report.txt"
    echo "  (load average after: $(load))" | tee -a "$OUT/benchmark-report.txt"
  else
    echo "(no python3 with NumPy and SciPy: OpenBLAS's LU not measured)" | tee -a "$OUT/benchmark-report.txt"
  fi
fi

if [ "$cli" = 1 ]; then
  if [ -x ./spanlift ]; then
    launcher=(./spanlift); how="./spanlift (launcher)"
  else
    launcher=(java -jar vlm-cli/target/spanlift.jar); how="java -jar vlm-cli/target/spanlift.jar (no ./spanlift launcher)"
  fi
  cmd="${launcher[*]} solve $WING"
  echo "== CLI wall time, JVM start included: $cmd (load average before: $(load))"
  "${launcher[@]}" solve "$WING" > /dev/null   # must succeed before it is timed
  mean_ms="" min_ms=""
  if command -v hyperfine > /dev/null; then
    tool="hyperfine, $RUNS runs after 2 warm-up runs"
    hyperfine -N --warmup 2 --runs "$RUNS" --export-csv "$OUT/cli-time.csv" "$cmd" \
      || hyperfine --warmup 2 --runs "$RUNS" --export-csv "$OUT/cli-time.csv" "$cmd"
    # CSV columns: command,mean,stddev,median,user,system,min,max (seconds)
    read -r mean_ms min_ms < <(awk -F, 'NR == 2 { printf "%.1f %.1f\n", $2 * 1000, $7 * 1000 }' "$OUT/cli-time.csv")
  else
    tool="loop of $RUNS runs timed with date +%s%N (hyperfine not installed), after 2 untimed runs"
    for _ in 1 2; do "${launcher[@]}" solve "$WING" > /dev/null; done
    : > "$OUT/cli-time.txt"
    for _ in $(seq "$RUNS"); do
      t0=$(date +%s%N)
      "${launcher[@]}" solve "$WING" > /dev/null
      t1=$(date +%s%N)
      echo $(( t1 - t0 )) >> "$OUT/cli-time.txt"
    done
    read -r mean_ms min_ms < <(awk '{ s += $1; if (NR == 1 || $1 < m) m = $1 } END { printf "%.1f %.1f\n", s / NR / 1e6, m / 1e6 }' "$OUT/cli-time.txt")
  fi
  {
    echo
    echo "CLI: $how"
    echo "  spanlift solve $WING (9 alphas), JVM start included, $tool"
    echo "  mean ${mean_ms} ms, min ${min_ms} ms (load average after: $(load))"
    # Side by side with the warm in-process sweep of the same wing measured above (if JMH ran).
    if [ -f "$OUT/jmh-result.json" ]; then
      sweep_ms=""
      if command -v jq > /dev/null; then
        sweep_ms=$(jq -r '.[] | select((.benchmark | endswith("TrainerBenchmark.sweep")) and .params.lattice == "32x8") | .primaryMetric.score / 1000' "$OUT/jmh-result.json" 2>/dev/null || true)
      elif command -v python3 > /dev/null; then
        sweep_ms=$(python3 -c 'import json,sys
for r in json.load(open(sys.argv[1])):
    if r["benchmark"].endswith("TrainerBenchmark.sweep") and r.get("params", {}).get("lattice") == "32x8":
        print(r["primaryMetric"]["score"] / 1000)' "$OUT/jmh-result.json" 2>/dev/null || true)
      fi
      if [ -n "$sweep_ms" ]; then
        awk -v c="$mean_ms" -v m="$min_ms" -v s="$sweep_ms" 'BEGIN {
          printf "  warm in-process, the same 9 alphas at the default 32 x 8 lattice (JMH, wall) %.2f ms:\n", s
          printf "  the CLI mean is %.0fx that, its min %.0fx;\n", c / s, m / s
          printf "  so %.0f%% of the CLI mean is JVM start, class loading, JIT warm-up, file reading and output\n", 100 * (c - s) / c }'
      fi
    fi
  } | tee -a "$OUT/benchmark-report.txt"
fi
if [ "$cli" = 1 ]; then
  # Start-up, jar size, and the planform sweep from the command line, JVM start included; the sweep's output
  # must be the same bytes whatever --jobs.
  ms() { local t0 t1; t0=$(date +%s%N); "$@" > /dev/null 2>&1; t1=$(date +%s%N); echo $(( (t1 - t0) / 1000000 )); }
  best() { local b="" t; for _ in 1 2 3; do t=$(ms "$@"); if [ -z "$b" ] || [ "$t" -lt "$b" ]; then b=$t; fi; done; echo "$b"; }
  {
    echo
    echo "Jar and start-up (load average before: $(load))"
    echo "  vlm-cli/target/spanlift.jar: $(( $(stat -c %s vlm-cli/target/spanlift.jar) / 1024 )) KiB"
    echo "  ${launcher[*]} --version: best of 3 $(best "${launcher[@]}" --version) ms wall (JVM start and class loading)"
    sed 's/^    mirror: true$/    mirror: true\n    lattice: {strips: 100, rows: 10}/' "$WING" > "$OUT/trainer-2000.wing.yaml"
    "${launcher[@]}" solve "$OUT/trainer-2000.wing.yaml" > /dev/null   # must succeed before it is timed
    t2000=$(best "${launcher[@]}" solve "$OUT/trainer-2000.wing.yaml")
    echo "  solve of the trainer at 100 x 10 per half (2000 panels): best of 3 $t2000 ms wall"
    # The interpreter python3 resolves to (a version manager's shim in front of it is not timed).
    py=$(python3 -c 'import numpy, scipy.linalg, yaml, sys; print(sys.executable)' 2> /dev/null || true)
    if [ -n "$py" ]; then
      if "$py" benchmarks/numpy_reference.py "$OUT/trainer-2000.wing.yaml" > /dev/null; then
        tpy=$(best "$py" benchmarks/numpy_reference.py "$OUT/trainer-2000.wing.yaml")
        tplain=$(best "$py" benchmarks/numpy_reference.py --whole "$OUT/trainer-2000.wing.yaml")
        awk -v p="$tpy" -v w="$tplain" -v j="$t2000" 'BEGIN {
          printf "  the same in NumPy/SciPy (benchmarks/numpy_reference.py, full span, Python start included):\n"
          printf "    assembled in one broadcast (--whole, the plain way): best of 3 %d ms wall; NumPy time / spanlift time %.2f\n", w, w / j
          printf "    assembled in blocks of rows (tuned): best of 3 %d ms wall; NumPy time / spanlift time %.2f\n", p, p / j }'
      else
        echo "  benchmarks/numpy_reference.py failed: the NumPy reference not timed"
      fi
    else
      echo "  (no python3 with NumPy, SciPy and PyYAML: the NumPy reference not timed)"
    fi
    echo "  solve of the trainer at its default lattice (512 panels): best of 3 $(best "${launcher[@]}" solve "$WING") ms wall"
    echo "Planform sweep from the command line, JVM start included (benchmarks/planform.sweep.yaml, 429 cases)"
    for j in 1 2; do
      t=$(best "${launcher[@]}" sweep benchmarks/planform.sweep.yaml --jobs "$j" -o "$OUT/planform-jobs$j.csv")
      awk -v j="$j" -v t="$t" 'BEGIN { printf "  --jobs %d: best of 3 %d ms wall, %.0f cases/s\n", j, t, 429 / (t / 1000) }'
    done
    if cmp -s "$OUT/planform-jobs1.csv" "$OUT/planform-jobs2.csv"; then
      echo "  outputs of --jobs 1 and --jobs 2: identical bytes"
    else
      echo "  outputs of --jobs 1 and --jobs 2: DIFFER"
    fi
    echo "  (load average after: $(load))"
  } | tee -a "$OUT/benchmark-report.txt"
fi
[ -f "$OUT/benchmark-report.txt" ] && echo "(summary saved in $OUT/benchmark-report.txt)"
