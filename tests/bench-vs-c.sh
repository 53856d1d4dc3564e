#!/usr/bin/env bash
# Compares trialc with the C and Python references (shared/reference beside the repository) on the same work,
# back to back in one run, and prints both timings and their ratio:
#   - the probability-matching simulation of configuration (a): 10 arms x 10 rounds x 100 plots, 2000 trials,
#     Beta(1,1) priors, p = 0.50 and 0.45 x 9, on one and two threads;
#   - P(best) of the reference's ten beta arms (the planner's settings, which are the reference's: 6 sd panels
#     checked to 1e-12; and the tighter 4 sd / 1e-13 ones the planner used before version 0.2);
#   - plain Python on 20 trials of (a), per trial;
#   - trialc check of a 1,000-arm design, less the start-up of checking a two-arm design.
# trialc is published for this platform as README "Installing" says (precompiled); TRIALC_BUILD=plain
# times the plain Release build instead.
# Timings on a shared machine are noisy: every measurement is repeated ROUNDS times (default 3), C and C#
# interleaved, and the median and the range are printed.
#   tests/bench-vs-c.sh                      # REFERENCE_DIR defaults to ../shared/reference beside the repo
#   ROUNDS=5 REFERENCE_DIR=/path/to/reference tests/bench-vs-c.sh
set -euo pipefail
root=$(cd "$(dirname "$0")/.." && pwd)
ref=${REFERENCE_DIR:-$root/../shared/reference}
rounds=${ROUNDS:-3}
reps=${REPS:-2000}
[ -f "$ref/thompson_sim.c" ] || { echo "bench-vs-c: no thompson_sim.c in $ref (set REFERENCE_DIR)" >&2; exit 2; }
work=$(mktemp -d)
trap 'rm -rf "$work"' EXIT

# The flags RESULTS.md uses.
gcc -O2 -march=native -fopenmp -Wall -Wextra -o "$work/thompson_sim" "$ref/thompson_sim.c" -lm
# trialc as README "Installing" has it: published for this machine, one precompiled image, no tiering.
# TRIALC_BUILD=plain measures the plain Release build instead (compiled on first use).
rid=$(dotnet --info | sed -n 's/^ *RID: *//p' | head -n 1)
if [ "${TRIALC_BUILD:-publish}" = plain ]; then
  dotnet build "$root/src/DesignCompiler.Cli" -c Release -v quiet -nologo > "$work/build.log"
  trialc="$root/src/DesignCompiler.Cli/bin/Release/net10.0/trialc"
else
  dotnet publish "$root/src/DesignCompiler.Cli" -c Release -r "$rid" -o "$work/trialc" -v quiet -nologo > "$work/build.log"
  trialc="$work/trialc/trialc"
fi
dotnet build "$root/tests/DesignCompiler.Benchmarks" -c Release -v quiet -nologo >> "$work/build.log"
bench="$root/tests/DesignCompiler.Benchmarks/bin/Release/net10.0/DesignCompiler.Benchmarks"
design="$root/tests/DesignCompiler.Benchmarks/Designs/reference-pm-a.trial"

# A 1,000-arm design and a two-arm one (start-up only), invented for the check timing.
{
  echo 'trial "Thousand line screen" {'; echo '  seed 5'; echo '  rounds 3'; echo '  outcome emerged: bernoulli'
  echo '  policy thompson'
  for i in $(seq 0 999); do printf '  arm L%04d "Line %d" prior beta(%d, %d)\n' "$i" "$i" $((1 + i % 5)) $((1 + i % 7)); done
  echo '  block east plots 1500'; echo '  block west plots 1500'
  echo '  limit every arm >= 1 plots per round'; echo '  limit every arm <= 2% per round'
  echo '  scenario "one better" { every arm 0.5 L0500 0.6 }'; echo '}'
} > "$work/thousand.trial"
printf 'trial "Two lines" {\n  seed 5\n  rounds 1\n  outcome emerged: bernoulli\n  arm L0 "Line 0" prior beta(1, 1)\n  arm L1 "Line 1" prior beta(1, 1)\n  plots 10 per round\n}\n' > "$work/one.trial"

now() { date +%s.%N; }
json() { python3 -c "import json,sys; print(json.load(open(sys.argv[1]))[sys.argv[2]])" "$1" "$2"; }
: > "$work/results"
for r in $(seq 1 "$rounds"); do
  for t in 1 2; do
    "$work/thompson_sim" pm 10 10 100 "$reps" 1 "$t" > "$work/c.json"
    echo "c_sim_t$t $(json "$work/c.json" seconds)" >> "$work/results"
    "$trialc" simulate "$design" --reps "$reps" --threads "$t" --format json --bench --skip-equal > /dev/null 2> "$work/cs.txt"
    echo "cs_sim_t$t $(sed -n 's/.* in \([0-9.]*\) s .*/\1/p' "$work/cs.txt")" >> "$work/results"
  done
  "$work/thompson_sim" pbest --reps 20000 > "$work/c.json"
  echo "c_pbest $(json "$work/c.json" us_per_vector)" >> "$work/results"
  "$bench" --reference-timing 20000 > "$work/cs.txt"
  echo "cs_pbest $(sed -n 's/^pbest planner: \([0-9.]*\) us.*/\1/p' "$work/cs.txt")" >> "$work/results"
  echo "cs_pbest_tight $(sed -n 's/^pbest tight: \([0-9.]*\) us.*/\1/p' "$work/cs.txt")" >> "$work/results"
  python3 "$ref/thompson_sim.py" pm 10 10 100 20 1 > "$work/py.json"
  echo "py_rep $(python3 -c "import json,sys; print(json.load(open(sys.argv[1]))['seconds'] / 20)" "$work/py.json")" >> "$work/results"
  a=$(now); "$trialc" check "$work/one.trial" > /dev/null; b=$(now); "$trialc" check "$work/thousand.trial" > /dev/null; c=$(now)
  echo "check_startup $(echo "$b - $a" | bc -l)" >> "$work/results"
  echo "check_1000 $(echo "$c - $b" | bc -l)" >> "$work/results"
done

python3 - "$work/results" "$reps" "${TRIALC_BUILD:-publish}" <<'PY'
import sys, statistics
rows = {}
for line in open(sys.argv[1]):
    k, v = line.split()
    rows.setdefault(k, []).append(float(v))
reps = int(sys.argv[2])
med = lambda k: statistics.median(rows[k])
rng = lambda k: f"{min(rows[k]):.4g}-{max(rows[k]):.4g}"
def line(what, c, cs, unit):
    print(f"{what:44s} C {med(c):9.4g} {unit} ({rng(c)})   C# {med(cs):9.4g} {unit} ({rng(cs)})   C#/C {med(cs)/med(c):5.2f}")
print(f"medians of {len(rows['c_pbest'])} interleaved runs (range in brackets); trialc build: {sys.argv[3]}")
line(f"pm (a), {reps} trials, 1 thread", "c_sim_t1", "cs_sim_t1", "s")
line(f"pm (a), {reps} trials, 2 threads", "c_sim_t2", "cs_sim_t2", "s")
line("P(best) 10 beta arms, 1e-12 (planner)", "c_pbest", "cs_pbest", "us")
line("P(best) 10 beta arms, tighter 1e-13", "c_pbest", "cs_pbest_tight", "us")
print(f"{'trialc speed-up from 1 to 2 threads':44s} {med('cs_sim_t1')/med('cs_sim_t2'):5.2f} (C: {med('c_sim_t1')/med('c_sim_t2'):.2f})")
per_trial = med('cs_sim_t1') / reps
print(f"{'Python pm (a), s per trial':44s} {med('py_rep'):.4g} s; trialc 1 thread {per_trial:.4g} s: {med('py_rep')/per_trial:.0f}x faster")
print(f"{'trialc check, 1,000 arms, less start-up':44s} {med('check_1000') - med('check_startup'):.3f} s (start-up {med('check_startup'):.3f} s)")
PY
