#!/usr/bin/env bash
# Renders a report page (report.html) to a PNG screenshot with headless Chromium, to look at the
# layout without a desktop. Usage: scripts/render-report.sh REPORT_HTML OUT_PNG [WIDTH,HEIGHT]
# Installs Chromium from the distribution's packages if it is missing (needs root).
set -euo pipefail

if [ "$#" -lt 2 ]; then
  echo "usage: $0 REPORT_HTML OUT_PNG [WIDTH,HEIGHT]" >&2
  exit 2
fi
html="$1"
out="$2"
size="${3:-1300,3000}"
if [ ! -f "$html" ]; then
  echo "no such file: $html" >&2
  exit 2
fi

browser=""
for b in chromium chromium-browser; do
  if command -v "$b" >/dev/null 2>&1; then
    browser="$b"
    break
  fi
done
if [ -z "$browser" ]; then
  echo "chromium not found; installing it with apt-get" >&2
  apt-get update -q >&2
  DEBIAN_FRONTEND=noninteractive apt-get install -y -q chromium >&2
  browser=chromium
fi

profile="$(mktemp -d)"
trap 'rm -rf "$profile"' EXIT
abs_html="$(cd "$(dirname "$html")" && pwd)/$(basename "$html")"
mkdir -p "$(dirname "$out")"
abs_out="$(cd "$(dirname "$out")" && pwd)/$(basename "$out")"

"$browser" --headless --no-sandbox --disable-gpu --disable-quic --no-first-run \
  --disable-background-networking --disable-component-update --disable-sync \
  --hide-scrollbars --user-data-dir="$profile" \
  --screenshot="$abs_out" --window-size="$size" "file://$abs_html" >/dev/null 2>&1

if [ ! -s "$abs_out" ]; then
  echo "rendering failed: no screenshot written to $abs_out" >&2
  exit 1
fi
echo "$abs_out"
