#!/usr/bin/env bash
# Renders every HTML output in headless Chromium, to PNG and PDF, and checks that each page is not
# blank and prints on the pages it should: the crew sheet and the worked letterhead template one
# page per block, the round report and the status page on one or two pages. Covers every shipped
# example's round 1, and for the cover-crop trial a round 2 compiled from recorded results.
# Run by .ci/run, which installs Debian's chromium package where it can.
set -euo pipefail
cd "$(dirname "$0")/.."
trialc="dotnet src/DesignCompiler.Cli/bin/Release/net10.0/trialc.dll"
letterhead=examples/templates/letterhead-de.html.sbn
out=$(mktemp -d)
trap 'rm -rf "$out"' EXIT
failures=0

# check NAME HTML MIN_PAGES MAX_PAGES
check() {
  local name=$1 html=$2 min=$3 max=$4
  local flags=(--headless --no-sandbox --disable-gpu --disable-background-networking --disable-component-update
               --disable-sync --no-first-run --disable-quic --user-data-dir="$out/profile")
  timeout 120 chromium "${flags[@]}" --window-size=1000,1400 --screenshot="$out/$name.png" "file://$html" >/dev/null 2>&1 || true
  timeout 120 chromium "${flags[@]}" --no-pdf-header-footer --print-to-pdf="$out/$name.pdf" "file://$html" >/dev/null 2>&1 || true
  local pages png
  pages=$(python3 -c "import re,sys; print(len(re.findall(rb'/Type\s*/Page[^s]', open(sys.argv[1],'rb').read())))" "$out/$name.pdf" 2>/dev/null || echo 0)
  png=$(stat -c %s "$out/$name.png" 2>/dev/null || echo 0)
  # A blank 1000 x 1400 screenshot compresses to a few kilobytes; a sheet is far larger.
  if [ "$png" -lt 20000 ]; then echo "browser check: $name: screenshot looks blank ($png bytes)"; failures=$((failures + 1)); fi
  if [ "$pages" -lt "$min" ] || [ "$pages" -gt "$max" ]; then
    echo "browser check: $name: $pages printed pages, expected $min to $max"; failures=$((failures + 1))
  fi
  echo "browser check: $name: $pages pages (expected $min-$max), screenshot $png bytes"
}

for design in examples/*.trial; do
  name=$(basename "$design" .trial)
  $trialc compile "$design" --out "$out/$name" --template "$letterhead" >/dev/null
  sheet="$out/$name/$name-round1.html"
  blocks=$(grep -c '<section class="page"' "$sheet")
  check "$name-sheet" "$sheet" "$blocks" "$blocks"
  check "$name-letterhead" "$out/$name/$name-round1.letterhead-de.html" "$blocks" "$blocks"
  check "$name-report" "$out/$name/$name-round1-report.html" 1 2
done

# A round compiled from recorded results: the report's charts have a history, and status has a page.
trial="$out/ledger"
mkdir -p "$trial"
cp examples/cover-crops.trial "$trial/"
$trialc compile "$trial/cover-crops.trial" --ledger "$trial/cc.ledger" --out "$trial/round1" >/dev/null
python3 - "$trial/round1/cover-crops-round1.csv" "$trial/returned.csv" <<'PY'
import csv, random, sys
random.seed(7)
rows = list(csv.reader(open(sys.argv[1], newline='', encoding='utf-8')))
with open(sys.argv[2], 'w', newline='', encoding='utf-8') as f:
    w = csv.writer(f, lineterminator='\r\n')
    for row in rows:
        if row and row[0].isdigit():
            row[7] = '1' if random.random() < {'OV': 0.6, 'RC': 0.75, 'MP': 0.35, 'BP': 0.5}[row[5]] else '0'
        w.writerow(row)
PY
$trialc record "$trial/cover-crops.trial" --ledger "$trial/cc.ledger" "$trial/returned.csv" >/dev/null
$trialc compile "$trial/cover-crops.trial" --ledger "$trial/cc.ledger" --out "$trial/round2" >/dev/null
blocks=$(grep -c '<section class="page"' "$trial/round2/cover-crops-round2.html")
check "cover-crops-round2-sheet" "$trial/round2/cover-crops-round2.html" "$blocks" "$blocks"
check "cover-crops-round2-report" "$trial/round2/cover-crops-round2-report.html" 1 2
$trialc status "$trial/cover-crops.trial" --ledger "$trial/cc.ledger" --format html --out "$trial/status.html"
check "cover-crops-status" "$trial/status.html" 1 2

if [ -n "${BROWSER_CHECK_KEEP:-}" ]; then mkdir -p "$BROWSER_CHECK_KEEP" && cp "$out"/*.png "$out"/*.pdf "$BROWSER_CHECK_KEEP"/; fi
if [ "$failures" -gt 0 ]; then echo "browser check: $failures failures"; exit 1; fi
echo "browser check: every page renders; crew sheets and the letterhead print one page per block"
