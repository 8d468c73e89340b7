#!/bin/sh
# Runs every test on a fresh Debian 12 machine: installs missing packages, builds, runs ctest
# (engine and call-layer unit tests, catalogue/README consistency, end-to-end tests in a
# private headless LibreOffice with the built extension installed).
set -eu
cd "$(dirname "$0")/.."
tools/setup.sh
tools/build.sh
ctest --test-dir build --output-on-failure -j2
