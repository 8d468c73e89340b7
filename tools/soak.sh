#!/bin/sh
# Long robustness runs, too slow for every CI run (tools/test.sh runs the short versions):
#   calc      ten million add-in evaluations in one LibreOffice session, soffice.bin memory
#   valgrind  memcheck (leaks and invalid accesses) over the engine and call-layer unit tests
#   tsan      ThreadSanitizer build of the call layer; the multi-threaded evaluation test
#   fuzz      every libFuzzer harness for FUZZ_SECONDS (default 600) each, ASan and UBSan
# Usage: tools/soak.sh [calc|valgrind|tsan|fuzz]...   (no argument: all four)
set -eu
cd "$(dirname "$0")/.."
parts="${*:-calc valgrind tsan fuzz}"
tools/setup.sh

for part in $parts; do
  case "$part" in
  calc)
    tools/build.sh
    /usr/bin/python3 tools/soak_calc.py --evaluations "${SOAK_EVALUATIONS:-10000000}" --max-growth-mib 16
    ;;
  valgrind)
    tools/build.sh
    # Valgrind computes long double in 64 bits, so Boost.Math's references (which promote to
    # long double) lose digits under it: the one test checking cel against them to 4e-16 is skipped.
    for t in engine_tests sheet_tests; do
      bin=$(find build/tests -name "$t" -type f | head -1)
      valgrind --quiet --leak-check=full --show-leak-kinds=definite,indirect,possible \
        --errors-for-leak-kinds=definite,indirect,possible --error-exitcode=1 "$bin" --gtest_brief=1 \
        --gtest_filter=-BulirschCel.FirstAndSecondKindMatchBoost
      echo "valgrind $t: no leaks, no invalid accesses"
    done
    ;;
  tsan)
    cmake -S . -B build-tsan -DCMAKE_CXX_COMPILER=clang++ -DCMAKE_BUILD_TYPE=RelWithDebInfo \
      -DCOILWRIGHT_ADDIN=OFF -DCMAKE_CXX_FLAGS=-fsanitize=thread -DCMAKE_EXE_LINKER_FLAGS=-fsanitize=thread >/dev/null
    cmake --build build-tsan -j"$(nproc)" --target sheet_tests >/dev/null
    TSAN_OPTIONS=halt_on_error=1 build-tsan/tests/sheet/sheet_tests --gtest_filter='ThreadSafety.*'
    ;;
  fuzz)
    cmake -S . -B build-sanitize -DCMAKE_CXX_COMPILER=clang++ -DCMAKE_BUILD_TYPE=RelWithDebInfo \
      -DCOILWRIGHT_ADDIN=OFF -DCOILWRIGHT_SANITIZE=ON -DCOILWRIGHT_FUZZ=ON >/dev/null
    cmake --build build-sanitize -j"$(nproc)" >/dev/null
    for harness in build-sanitize/tests/fuzz/fuzz_*; do
      [ -x "$harness" ] || continue
      name=$(basename "$harness")
      mkdir -p "build-sanitize/tests/fuzz/corpus/$name" build-sanitize/tests/fuzz/artifacts
      "$harness" -max_total_time="${FUZZ_SECONDS:-600}" -timeout=10 -rss_limit_mb=2048 -print_final_stats=1 \
        -artifact_prefix="build-sanitize/tests/fuzz/artifacts/$name-" "build-sanitize/tests/fuzz/corpus/$name" \
        2>&1 | grep -E "^(Done|stat::|==|SUMMARY|artifact)" || true
      if ls build-sanitize/tests/fuzz/artifacts/"$name"-* >/dev/null 2>&1; then
        echo "$name: findings in build-sanitize/tests/fuzz/artifacts/"; exit 1
      fi
      echo "$name: no findings"
    done
    ;;
  *) echo "unknown part: $part (calc, valgrind, tsan, fuzz)"; exit 2 ;;
  esac
done
