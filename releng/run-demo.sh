#!/bin/sh
# Runs Faultbench on the demo study in demo-workspace/.
#   releng/run-demo.sh              open the workbench on demo-workspace/ (needs a display; uses Xvfb when there is none)
#   releng/run-demo.sh --headless   run the batch analysis of the demo and write results to demo-workspace/results/
# Builds the product first when it is not there yet (tests skipped; run releng/run-tests.sh for those).
set -e
FAULTBENCH_ROOT=$(cd "$(dirname "$0")/.." && pwd)
. "$FAULTBENCH_ROOT/releng/scripts/ensure-system.sh"
. "$FAULTBENCH_ROOT/releng/scripts/product-dir.sh"
faultbench_ensure_packages $FAULTBENCH_PACKAGES
faultbench_check_java
if [ ! -x "$FAULTBENCH_PRODUCT/faultbench.sh" ] || [ -n "$FAULTBENCH_REBUILD" ]; then
  echo "faultbench: building the product (first run downloads the platform from Maven Central)"
  (cd "$FAULTBENCH_ROOT" && ./mvnw -B -q -DskipTests verify)
fi
DEMO="$FAULTBENCH_ROOT/demo-workspace"
if [ "$1" = "--headless" ]; then
  shift
  exec "$FAULTBENCH_PRODUCT/faultbench.sh" -application org.faultbench.headless.batch \
    analyze "$DEMO/studies/demo-study.json" --out "$DEMO/results" "$@"
fi
if [ -z "$DISPLAY" ]; then
  echo "faultbench: no DISPLAY; starting the workbench under Xvfb (use releng/screenshot.sh to look at it)"
  exec xvfb-run -a -s "-screen 0 1280x1024x24" "$FAULTBENCH_PRODUCT/faultbench.sh" -data "$DEMO" "$@"
fi
exec "$FAULTBENCH_PRODUCT/faultbench.sh" -data "$DEMO" "$@"
