#!/usr/bin/env bash
# Renders every shipped example's HTML crew sheet in headless Chromium, to PNG and PDF, and
# checks that the page is not blank and that the PDF has one page per block.
# Run by .ci/run only where chromium is installed (Debian package 'chromium').
set -euo pipefail
cd "$(dirname "$0")/.."
trialc="dotnet src/DesignCompiler.Cli/bin/Release/net10.0/trialc.dll"
out=$(mktemp -d)
trap 'rm -rf "$out"' EXIT
failures=0
for design in examples/*.trial; do
  name=$(basename "$design" .trial)
  $trialc compile "$design" --out "$out/$name" >/dev/null
  html="$out/$name/$name-round1.html"
  flags=(--headless --no-sandbox --disable-gpu --disable-background-networking --disable-component-update
         --disable-sync --no-first-run --disable-quic --user-data-dir="$out/profile-$name")
  timeout 120 chromium "${flags[@]}" --window-size=1000,1400 --screenshot="$out/$name.png" "file://$html" >/dev/null 2>&1 || true
  timeout 120 chromium "${flags[@]}" --no-pdf-header-footer --print-to-pdf="$out/$name.pdf" "file://$html" >/dev/null 2>&1 || true
  blocks=$(grep -c '<section class="page"' "$html")
  pages=$(python3 -c "import re,sys; print(len(re.findall(rb'/Type\s*/Page[^s]', open(sys.argv[1],'rb').read())))" "$out/$name.pdf" 2>/dev/null || echo 0)
  png=$(stat -c %s "$out/$name.png" 2>/dev/null || echo 0)
  # A blank 1000 x 1400 screenshot compresses to a few kilobytes; a sheet is far larger.
  if [ "$png" -lt 20000 ]; then echo "browser check: $name: screenshot looks blank ($png bytes)"; failures=$((failures + 1)); fi
  if [ "$pages" -ne "$blocks" ]; then echo "browser check: $name: $pages printed pages for $blocks blocks"; failures=$((failures + 1)); fi
  echo "browser check: $name: $blocks blocks, $pages pages, screenshot $png bytes"
done
if [ "$failures" -gt 0 ]; then echo "browser check: $failures failures"; exit 1; fi
echo "browser check: all sheets render, one printed page per block"
