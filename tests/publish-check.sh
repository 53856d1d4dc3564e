#!/usr/bin/env bash
# Publishes trialc as README "Installing" says (one precompiled image, no tiering) and checks that it writes
# byte for byte what the plain Release build writes: check, compile (every sheet format), a simulation under
# de-DE on two threads, and a ledger's status, for every shipped example.
#   tests/publish-check.sh            # after dotnet build -c Release
set -euo pipefail
root=$(cd "$(dirname "$0")/.." && pwd)
work=$(mktemp -d)
trap 'rm -rf "$work"' EXIT
rid=$(dotnet --info | sed -n 's/^ *RID: *//p' | head -n 1)

dotnet build "$root/src/DesignCompiler.Cli" -c Release -v quiet -nologo > "$work/build.log"
dotnet publish "$root/src/DesignCompiler.Cli" -c Release -r "$rid" -o "$work/published" -v quiet -nologo >> "$work/build.log" \
  || { cat "$work/build.log" >&2; echo "publish-check: the README's publish command failed" >&2; exit 1; }
grep -q '"System.Runtime.TieredCompilation": false' "$work/published/trialc.runtimeconfig.json" \
  || { echo "publish-check: the published runtimeconfig does not turn tiering off" >&2; exit 1; }

run_all() { # $1 = trialc, $2 = output folder, $3 = a name for its ledger
  local t=$1 out=$2
  mkdir -p "$out"
  cd "$out" # paths printed in messages are relative, so both runs print the same
  for design in "$root"/examples/*.trial; do
    local name; name=$(basename "$design" .trial)
    "$t" check "$design" > "$out/$name.check" 2>&1 || true
    "$t" compile "$design" --out "$name-sheets" > "$out/$name.compile" 2>&1
    LC_ALL=de_DE.UTF-8 "$t" simulate "$design" --reps 40 --threads 2 --format json > "$out/$name.sim.json" 2> /dev/null
  done
  # A ledger: it and the sheets issued into it carry the time of issue, so what status prints from it is
  # compared instead.
  "$t" compile "$root/examples/cover-crops.trial" --ledger "$work/$3.ledger" --out "$work/$3-round1" > /dev/null
  "$t" status "$root/examples/cover-crops.trial" --ledger "$work/$3.ledger" --format json > "$out/status.json"
}

run_all "$root/src/DesignCompiler.Cli/bin/Release/net10.0/trialc" "$work/plain" plain
run_all "$work/published/trialc" "$work/pub" pub
if diff -r "$work/plain" "$work/pub" > "$work/diff.txt"; then
  echo "publish-check: the published trialc wrote the plain build's outputs byte for byte ($(find "$work/pub" -type f | wc -l) files)"
else
  head -n 40 "$work/diff.txt" >&2
  echo "publish-check: the published trialc's outputs differ from the plain build's" >&2
  exit 1
fi
