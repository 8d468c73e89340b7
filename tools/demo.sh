#!/bin/sh
# The main job on a fresh Debian 12 machine: install missing packages, build the extension,
# install it into LibreOffice, recalculate the demo workbook with it and leave a PDF and a
# CSV table in build/demo/. Set COILWRIGHT_NO_INSTALL=1 to skip installing into LibreOffice.
set -eu
cd "$(dirname "$0")/.."
tools/setup.sh
tools/build.sh
if [ "${COILWRIGHT_NO_INSTALL:-0}" != 1 ]; then
  tools/install_extension.sh build/coilwright.oxt || echo "(not installed into LibreOffice; the demo still runs)"
fi
/usr/bin/python3 tools/recalc_workbook.py --out-dir build/demo sheets/helmholtz_rig.ods
echo "Look at build/demo/helmholtz_rig.pdf (and .csv)."
