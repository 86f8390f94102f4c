#!/bin/sh
# Starts Faultbench from its installation folder. There is no native launcher: Java 17+ runs the Equinox launcher jar.
#   ./faultbench.sh                                   the workbench
#   ./faultbench.sh -data DIR                         the workbench on workspace DIR
#   ./faultbench.sh -application org.faultbench.headless.batch --help     the headless batch analysis
HERE=$(cd "$(dirname "$0")" && pwd)
JAVA="${JAVA_HOME:+$JAVA_HOME/bin/}java"
LAUNCHER=$(ls "$HERE"/plugins/org.eclipse.equinox.launcher_*.jar 2>/dev/null | head -n 1)
if [ -z "$LAUNCHER" ]; then
  echo "faultbench.sh: no org.eclipse.equinox.launcher jar under $HERE/plugins" >&2
  exit 1
fi
# the batch application needs no display: keep AWT headless and skip the splash screen
case " $* " in
  *" -application org.faultbench.headless.batch "*) VMHEADLESS="-Djava.awt.headless=true"; NOSPLASH="-nosplash" ;;
  *) VMHEADLESS=""; NOSPLASH="" ;;
esac
exec "$JAVA" -Dosgi.requiredJavaVersion=17 $VMHEADLESS $FAULTBENCH_VMARGS -jar "$LAUNCHER" -install "$HERE" $NOSPLASH "$@"
