#!/bin/sh
# Runs every test on a fresh Debian 12 machine: installs missing packages, builds, runs ctest
# (engine and call-layer unit tests, catalogue/README consistency, security checks, end-to-end
# tests in a private headless LibreOffice with the built extension installed, including the
# bad-input matrix and a one-million-evaluation soak), then a second build of the engine and
# the call layer with clang, AddressSanitizer, UndefinedBehaviorSanitizer and LeakSanitizer:
# the unit tests again and a short libFuzzer run of every harness (tests/fuzz/).
set -eu
cd "$(dirname "$0")/.."
tools/setup.sh
tools/build.sh
ctest --test-dir build --output-on-failure -j2

log="${TMPDIR:-/tmp}/coilwright-sanitize.$$.log"
# -O1 with line tables only: sanitizer reports keep file and line, and the build takes far less
# time than -O2 with full debug information; the engine as a few large units (it is only tested).
cmake -S . -B build-sanitize -DCMAKE_CXX_COMPILER=clang++ -DCMAKE_BUILD_TYPE=RelWithDebInfo \
  -DCMAKE_CXX_FLAGS_RELWITHDEBINFO="-O1 -gline-tables-only" \
  -DCOILWRIGHT_ADDIN=OFF -DCOILWRIGHT_SANITIZE=ON -DCOILWRIGHT_FUZZ=ON -DCOILWRIGHT_UNITY_BUILD=ON \
  -DCOILWRIGHT_FUZZ_SECONDS="${COILWRIGHT_FUZZ_SECONDS:-30}" > "$log" 2>&1 || { cat "$log"; exit 1; }
cmake --build build-sanitize -j"$(nproc)" >> "$log" 2>&1 || { tail -50 "$log"; exit 1; }
rm -f "$log"
echo "built build-sanitize (ASan, UBSan, LeakSanitizer; libFuzzer harnesses)"
ASAN_OPTIONS=detect_leaks=1 UBSAN_OPTIONS=print_stacktrace=1 \
  ctest --test-dir build-sanitize --output-on-failure -j2
