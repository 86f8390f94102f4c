#!/bin/sh
# Sourced by the run scripts: makes sure Java 17+, Xvfb and GTK 3 are present.
# As root it installs what is missing with apt-get; otherwise it says what to install and stops.

faultbench_missing_packages() {
  missing=""
  command -v java >/dev/null 2>&1 || missing="$missing openjdk-17-jdk-headless"
  for p in "$@"; do
    dpkg-query -W -f='${Status}' "$p" 2>/dev/null | grep -q "install ok installed" || missing="$missing $p"
  done
  echo "$missing"
}

# usage: faultbench_ensure_packages pkg...   (Debian package names)
faultbench_ensure_packages() {
  missing=$(faultbench_missing_packages "$@")
  [ -z "$missing" ] && return 0
  if [ "$(id -u)" = "0" ] && command -v apt-get >/dev/null 2>&1; then
    echo "faultbench: installing$missing"
    export DEBIAN_FRONTEND=noninteractive
    apt-get update -qq >/dev/null && apt-get install -y -qq --no-install-recommends $missing >/dev/null || {
      echo "faultbench: apt-get install$missing failed" >&2; return 1; }
  else
    echo "faultbench: missing system packages:$missing" >&2
    echo "  install them with: sudo apt-get install -y$missing" >&2
    return 1
  fi
}

faultbench_check_java() {
  v=$(java -XshowSettings:properties -version 2>&1 | sed -n 's/^ *java.specification.version = //p')
  case "$v" in
    1.*|9|1[0-6]|"") echo "faultbench: Java 17 or newer is needed (found '${v:-none}')" >&2; return 1 ;;
  esac
}

# Packages for building, UI tests and screenshots under a virtual display.
FAULTBENCH_PACKAGES="xvfb xauth libgtk-3-0 fonts-dejavu-core"
