#!/bin/sh
# Builds the engine, the UNO-free call layer and their GoogleTest suites for Windows x64 with
# Debian's mingw-w64 cross compiler and runs them under wine (console programs: no display).
# Installs what it needs, only if missing (uses sudo when not root). Everything it makes stays in
# build-windows/: GoogleTest built from Debian's sources (/usr/src/googletest) with the cross
# compiler, a private include prefix holding only Boost and Eigen (header only), and the wine
# prefix. Ends with ctest's summary line.
set -eu
cd "$(dirname "$0")/.."
root=$(pwd)

PACKAGES="cmake make python3 g++-mingw-w64-x86-64-posix wine64 wine
googletest libboost-dev libboost-math-dev libeigen3-dev"
missing=""
for p in $PACKAGES; do
  dpkg-query -W -f='${Status}' "$p" 2>/dev/null | grep -q "install ok installed" || missing="$missing $p"
done
if [ -n "$missing" ]; then
  echo "Installing:$missing"
  SUDO=""
  [ "$(id -u)" -ne 0 ] && SUDO="sudo"
  $SUDO apt-get update -qq
  # shellcheck disable=SC2086
  DEBIAN_FRONTEND=noninteractive $SUDO apt-get install -y -qq --no-install-recommends \
    -o DPkg::Lock::Timeout=600 $missing
fi

out="$root/build-windows"
prefix="$out/prefix"
toolchain="$root/cmake/mingw-w64-x86_64.cmake"
jobs="$(nproc)"
log="${TMPDIR:-/tmp}/coilwright-windows.$$.log"
: > "$log"
fail() { tail -60 "$log"; rm -f "$log"; exit 1; }

# Header-only libraries by link, so the cross compiler sees them and nothing else of /usr/include.
mkdir -p "$prefix/include"
ln -sfn /usr/include/boost "$prefix/include/boost"
ln -sfn /usr/include/eigen3 "$prefix/include/eigen3"

# GoogleTest from Debian's sources, built once with the cross compiler into the prefix.
if [ ! -f "$prefix/lib/cmake/GTest/GTestConfig.cmake" ]; then
  cmake -S /usr/src/googletest -B "$out/googletest" -DCMAKE_TOOLCHAIN_FILE="$toolchain" \
    -DCOILWRIGHT_WINDOWS_PREFIX="$prefix" -DCMAKE_BUILD_TYPE=Release \
    -DCMAKE_INSTALL_PREFIX="$prefix" -DBUILD_GMOCK=OFF -Dgtest_disable_pthreads=OFF \
    >> "$log" 2>&1 || fail
  cmake --build "$out/googletest" -j"$jobs" --target install >> "$log" 2>&1 || fail
fi

# -O1: these programs check results, not speed, and compile in far less time than at -O3; the
# engine as a few large units.
cmake -S . -B "$out/coilwright" -DCMAKE_TOOLCHAIN_FILE="$toolchain" \
  -DCOILWRIGHT_WINDOWS_PREFIX="$prefix" -DCMAKE_BUILD_TYPE=Release -DCOILWRIGHT_ADDIN=OFF \
  -DCMAKE_CXX_FLAGS_RELEASE="-O1 -DNDEBUG" -DCOILWRIGHT_UNITY_BUILD=ON \
  >> "$log" 2>&1 || fail
cmake --build "$out/coilwright" -j"$jobs" >> "$log" 2>&1 || fail
rm -f "$log"
echo "built build-windows/coilwright (engine, call layer, tests: Windows x64 executables)"

# A private, quiet wine: its own prefix, no debug channels, no Mono/Gecko installer prompts.
WINEPREFIX="$out/wineprefix"
WINEDEBUG=-all
WINEDLLOVERRIDES="mscoree,mshtml="
export WINEPREFIX WINEDEBUG WINEDLLOVERRIDES
unset DISPLAY WAYLAND_DISPLAY || true
if [ ! -f "$WINEPREFIX/system.reg" ]; then
  wineboot --init > /dev/null 2>&1 || true
fi
status=0
ctest --test-dir "$out/coilwright" --output-on-failure -V -j1 || status=$?
wineserver -k 2> /dev/null || true
exit "$status"
