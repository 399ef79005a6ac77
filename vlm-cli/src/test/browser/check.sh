#!/usr/bin/env bash
# Browser check of Spanlift's HTML pages: renders the report and the comparison in headless Chromium,
# takes a screenshot of each and fails when a screenshot is blank, when the page logs a console error,
# when it tries to fetch anything, or when it references anything outside itself. Also checks that
# two separate runs of the program write byte-identical SVG and HTML.
#
# Needs Java 17 and Chromium (installed with apt-get when missing; run as root). Builds the jar when it
# is missing. Output goes to vlm-cli/target/browser-check/ (override with OUT=...).
set -euo pipefail

here="$(cd "$(dirname "$0")" && pwd)"
module="$(cd "$here/../../.." && pwd)"
root="$(cd "$module/.." && pwd)"
jar="$module/target/spanlift.jar"
out="${OUT:-$module/target/browser-check}"
geo="$root/geometries"

if [ ! -f "$jar" ]; then
    (cd "$root" && mvn -q -B -pl vlm-cli -am package -DskipTests)
fi
if ! command -v chromium >/dev/null 2>&1; then
    export DEBIAN_FRONTEND=noninteractive
    apt-get update -qq
    apt-get install -y -qq --no-install-recommends chromium fonts-dejavu-core >/dev/null
fi

rm -rf "$out"
mkdir -p "$out"
spanlift() { java -Djava.awt.headless=true -jar "$jar" "$@"; }

spanlift report "$geo/trainer.wing.yaml" --output "$out/report.html"
spanlift compare "$geo/trainer.wing.yaml" "$geo/tourer.wing.yaml" "$geo/rectangular.wing.yaml" \
    "$geo/sailplane.wing.yaml" --output "$out/compare.html"

failures=0
fail() { echo "FAIL $*"; failures=$((failures + 1)); }

# Determinism across processes: the same input gives the same bytes.
spanlift report "$geo/trainer.wing.yaml" --output "$out/report-again.html"
cmp -s "$out/report.html" "$out/report-again.html" || fail "report.html differs between two runs"
for what in planform span-load lift polar; do
    spanlift plot "$geo/tourer.wing.yaml" --what "$what" --output "$out/$what-1.svg"
    spanlift plot "$geo/tourer.wing.yaml" --what "$what" --output "$out/$what-2.svg"
    cmp -s "$out/$what-1.svg" "$out/$what-2.svg" || fail "$what SVG differs between two runs"
done

chrome() {
    local profile
    profile="$(mktemp -d)"
    # Any host name resolves to nothing, so an attempted fetch fails loudly in the log instead of leaving.
    chromium --headless --no-sandbox --disable-gpu --disable-background-networking \
        --disable-component-update --disable-sync --no-first-run --user-data-dir="$profile" \
        --host-resolver-rules="MAP * ~NOTFOUND" --hide-scrollbars "$@"
    rm -rf "$profile"
}

for page in report compare; do
    html="$out/$page.html"
    url="file://$html"
    chrome --enable-logging=stderr --v=0 --window-size=1200,2600 --virtual-time-budget=5000 \
        --screenshot="$out/$page.png" "$url" >"$out/$page.stdout" 2>"$out/$page.log" || true
    [ -s "$out/$page.png" ] || fail "$page: no screenshot"
    chrome --dump-dom --virtual-time-budget=5000 "$url" >"$out/$page.dom.html" 2>/dev/null || true
    [ -s "$out/$page.dom.html" ] || fail "$page: no DOM dump"

    # Console errors and failed loads, as Chromium logs them.
    if grep -E 'CONSOLE|Uncaught|net::ERR_|Failed to load|Refused to' "$out/$page.log" >"$out/$page.errors"; then
        fail "$page: console errors or failed requests:"; cat "$out/$page.errors"
    fi
    # Nothing outside the page: no scripts, no linked files, no external URL anywhere in the DOM.
    if grep -Eio '<script|<link|<iframe|<img|@import' "$out/$page.dom.html" | head -3 >"$out/$page.external"; [ -s "$out/$page.external" ]; then
        fail "$page: the page loads other resources:"; cat "$out/$page.external"
    fi
    if grep -Eo '(src|href)="[^#"][^"]*"|url\([^#)][^)]*\)|https?://[^"<> ]+' "$out/$page.dom.html" \
            | grep -v '^https\?://www\.w3\.org/' >"$out/$page.urls"; then
        fail "$page: references outside the page:"; head -5 "$out/$page.urls"
    fi
    # Every figure made it into the rendered DOM.
    figures=$(grep -o '<svg' "$out/$page.dom.html" | wc -l)
    want=$([ "$page" = report ] && echo 4 || echo 3)
    [ "$figures" -ge "$want" ] || fail "$page: $figures figures in the DOM, expected $want"
done

java "$here/PixelCheck.java" "$out/report.png" "$out/compare.png" || fail "blank screenshot"

if [ "$failures" -gt 0 ]; then
    echo "browser check: $failures failed"
    exit 1
fi
echo "browser check: report and comparison render, no console errors, no fetches, deterministic"
