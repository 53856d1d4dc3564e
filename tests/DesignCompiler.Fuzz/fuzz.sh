#!/usr/bin/env bash
# Builds the fuzz harness, instruments it with SharpFuzz, seeds a corpus and runs afl-fuzz on one
# target for a fixed time, on one core, under nice. See README.md.
#   usage: tests/DesignCompiler.Fuzz/fuzz.sh TARGET [SECONDS] [WORK_DIR]
set -euo pipefail
target=${1:?usage: fuzz.sh TARGET [SECONDS] [WORK_DIR]}
seconds=${2:-1800}
repo=$(cd "$(dirname "$0")/../.." && pwd)
work=${3:-$repo/artifacts/fuzz}
bin=$work/bin
cd "$repo"

command -v afl-fuzz >/dev/null || { echo "fuzz.sh: afl-fuzz is missing; apt-get install -y afl++" >&2; exit 2; }
dotnet tool restore >/dev/null

# A fresh publish each time: SharpFuzz rewrites the assemblies in place and refuses to do it twice.
rm -rf "$bin"
dotnet publish tests/DesignCompiler.Fuzz -c Release -o "$bin" -v quiet -nologo
# Seeds first: instrumented code runs only under afl-fuzz.
seeds=$work/$target/seeds
rm -rf "$seeds" && mkdir -p "$seeds"
dotnet "$bin/DesignCompiler.Fuzz.dll" "$target" --write-seeds "$seeds"
case $target in
  design) for f in examples/*.trial tests/Cases/*/*.trial; do cp "$f" "$seeds/$(echo "${f#*/}" | tr / _)"; done ;;
esac

# The code under test and the parser-combinator library the grammar runs on; not the harness,
# the templates' engine or the runtime, whose branches would only dilute the coverage map.
for assembly in DesignCompiler.dll Sprache.dll; do dotnet sharpfuzz "$bin/$assembly"; done


findings=$work/$target/findings
# -t 1000: an input that takes over a second is a hang (the harness warms each fuzzing process up
# before afl's clock runs, so start-up is never timed; README.md says how). -m none: the .NET runtime
# reserves far more address space than afl's default memory limit allows.
export AFL_SKIP_BIN_CHECK=1 AFL_NO_AFFINITY=1 AFL_SKIP_CPUFREQ=1 AFL_I_DONT_CARE_ABOUT_MISSING_CRASHES=1 AFL_NO_UI=1
# Resume where an earlier run stopped, if there was one.
input=(-i "$seeds")
[ -d "$findings/default/queue" ] && input=(-i -)
# A dictionary of the input's tokens, when there is one.
dictionary=()
[ -f "tests/DesignCompiler.Fuzz/$target.dict" ] && dictionary=(-x "tests/DesignCompiler.Fuzz/$target.dict")
taskset -c 0 nice -n 10 afl-fuzz "${input[@]}" "${dictionary[@]}" -o "$findings" -t 1000 -m none -V "$seconds" \
  -- dotnet "$bin/DesignCompiler.Fuzz.dll" "$target"

echo "fuzz.sh: $target: $(grep -E '^execs_done' "$findings/default/fuzzer_stats")," \
  "crashes $(find "$findings/default/crashes" -type f -name 'id:*' | wc -l)," \
  "hangs $(find "$findings/default/hangs" -type f -name 'id:*' | wc -l)"
