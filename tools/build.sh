#!/bin/sh
# Configures and builds everything (engine, add-in, .oxt, tests, benchmarks) in build/.
set -eu
cd "$(dirname "$0")/.."
log="${TMPDIR:-/tmp}/coilwright-build.$$.log"
cmake -S . -B build -DCMAKE_BUILD_TYPE=Release "$@" > "$log" 2>&1 || { cat "$log"; exit 1; }
cmake --build build -j"$(nproc)" >> "$log" 2>&1 || { tail -50 "$log"; exit 1; }
rm -f "$log"
echo "built build/coilwright.oxt"
