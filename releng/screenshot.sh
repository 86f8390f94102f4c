#!/bin/sh
# Launches the built product under Xvfb, waits for the workbench window, takes a screenshot of the whole
# virtual screen and stops everything.   releng/screenshot.sh [output.png]   (default docs/workbench.png)
set -e
FAULTBENCH_ROOT=$(cd "$(dirname "$0")/.." && pwd)
. "$FAULTBENCH_ROOT/releng/scripts/ensure-system.sh"
. "$FAULTBENCH_ROOT/releng/scripts/product-dir.sh"
faultbench_ensure_packages $FAULTBENCH_PACKAGES imagemagick x11-utils
OUT=${1:-$FAULTBENCH_ROOT/docs/workbench.png}
[ -x "$FAULTBENCH_PRODUCT/faultbench.sh" ] || { echo "build the product first: releng/run-tests.sh or ./mvnw -B -DskipTests verify" >&2; exit 1; }
DISPLAY_NUM=:$(( 90 + $$ % 9 ))
Xvfb $DISPLAY_NUM -screen 0 1600x1000x24 -nolisten tcp >/dev/null 2>&1 &
XVFB=$!
WS=$(mktemp -d)
cp -r "$FAULTBENCH_ROOT/demo-workspace/." "$WS/" 2>/dev/null || true
trap 'kill $APP $XVFB 2>/dev/null; rm -rf "$WS"' EXIT
sleep 1
# -Dfaultbench.autorun runs the workspace's study on opening, so the picture shows results
# FAULTBENCH_EXTRA_VMARGS adds system properties (e.g. the perspective to start in); @WS@ stands for the workspace copy
EXTRA=$(printf '%s' "${FAULTBENCH_EXTRA_VMARGS:-}" | sed "s#@WS@#$WS#g")
DISPLAY=$DISPLAY_NUM FAULTBENCH_VMARGS="-Dfaultbench.autorun=true $EXTRA" "$FAULTBENCH_PRODUCT/faultbench.sh" -data "$WS" \
  -clearPersistedState >"$WS/console.log" 2>&1 &
APP=$!
for i in $(seq 1 60); do
  if DISPLAY=$DISPLAY_NUM xwininfo -root -tree 2>/dev/null | grep -q '"Faultbench'; then break; fi
  sleep 1
done
sleep ${FAULTBENCH_SCREENSHOT_WAIT:-40}
mkdir -p "$(dirname "$OUT")"
DISPLAY=$DISPLAY_NUM import -window root "$OUT"
echo "screenshot: $OUT"
