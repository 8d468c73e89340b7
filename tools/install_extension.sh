#!/bin/sh
# Installs (or updates) the built extension into this machine's LibreOffice: for the current
# user, or for every user when run as root (unopkg refuses per-user installs as root).
# LibreOffice must not be running while unopkg works.
set -eu
oxt="${1:-build/coilwright.oxt}"
if pgrep -x soffice.bin > /dev/null 2>&1; then
  echo "LibreOffice is running: close it, then run: unopkg add -f $oxt" >&2
  exit 1
fi
if [ "$(id -u)" -eq 0 ]; then
  unopkg add --shared -f --suppress-license "$oxt"
  echo "installed $oxt for all users"
else
  unopkg add -f --suppress-license "$oxt"
  echo "installed $oxt for $(id -un)"
fi
