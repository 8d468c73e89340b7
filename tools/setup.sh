#!/bin/sh
# Installs the Debian 12 packages Coilwright needs, only those missing (uses sudo when not root).
set -eu
# clang, libclang-rt-14-dev: sanitizer and libFuzzer build (tools/test.sh); binutils: nm and
# readelf for the security checks; valgrind: tools/soak.sh.
PACKAGES="cmake g++ make python3 zip
libreoffice-calc libreoffice-core libreoffice-dev libreoffice-script-provider-python python3-uno
libboost-dev libboost-math-dev libeigen3-dev googletest libgtest-dev
python3-numpy python3-scipy python3-mpmath poppler-utils
clang libclang-rt-14-dev binutils valgrind"
missing=""
for p in $PACKAGES; do
  dpkg-query -W -f='${Status}' "$p" 2>/dev/null | grep -q "install ok installed" || missing="$missing $p"
done
[ -z "$missing" ] && exit 0
echo "Installing:$missing"
SUDO=""
[ "$(id -u)" -ne 0 ] && SUDO="sudo"
$SUDO apt-get update -qq
# shellcheck disable=SC2086
DEBIAN_FRONTEND=noninteractive $SUDO apt-get install -y -qq --no-install-recommends $missing
