#!/bin/sh
# Builds everything and runs all tests: model unit tests (JUnit 5, plain JVM), architecture checks and the
# workbench UI tests under a virtual X display. Also produces the product and the p2 repository.
# Extra arguments go to Maven, e.g.  releng/run-tests.sh -o   (offline)
set -e
FAULTBENCH_ROOT=$(cd "$(dirname "$0")/.." && pwd)
. "$FAULTBENCH_ROOT/releng/scripts/ensure-system.sh"
faultbench_ensure_packages $FAULTBENCH_PACKAGES
faultbench_check_java
cd "$FAULTBENCH_ROOT"
exec xvfb-run -a -s "-screen 0 1280x1024x24" ./mvnw -B clean verify "$@"
