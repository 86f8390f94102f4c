#!/bin/sh
# Screenshots of every stage perspective of the built product on a copy of the demo workspace, into docs/:
#   releng/screenshots.sh        docs/perspective-map-sheet.png, -fault-review, -stratigraphy, -trap-study
# Each perspective starts fresh (-clearPersistedState); the Map Sheet one opens the demo map sheet (scan and digitized features) in the map editor and
# the others run the demo study once so results show (-Dfaultbench.autorun).
set -e
FAULTBENCH_ROOT=$(cd "$(dirname "$0")/.." && pwd)
for stage in map-sheet:mapSheet fault-review:faultReview stratigraphy:stratigraphy trap-study:trapStudy; do
  name=${stage%%:*}
  id=org.faultbench.app.perspective.${stage##*:}
  extra="-Dfaultbench.perspective=$id"
  [ "$name" = map-sheet ] && extra="$extra -Dfaultbench.openMap=@WS@/maps/demo.mapsheet.json"
  FAULTBENCH_EXTRA_VMARGS="$extra" FAULTBENCH_SCREENSHOT_WAIT=${FAULTBENCH_SCREENSHOT_WAIT:-35} \
    sh "$FAULTBENCH_ROOT/releng/screenshot.sh" "$FAULTBENCH_ROOT/docs/perspective-$name.png"
done
