# Cross build for Windows x64 with Debian's mingw-w64 GCC (package g++-mingw-w64-x86-64-posix:
# the posix thread model gives std::thread and std::mutex). tools/test_windows.sh uses it and
# runs the results under wine.
#
# Headers and packages are searched only in the compiler's own sysroot and in
# COILWRIGHT_WINDOWS_PREFIX, a private prefix holding the header-only libraries (Boost.Math,
# Eigen) and a GoogleTest built with this compiler: nothing of the Linux /usr/include leaks in.
set(CMAKE_SYSTEM_NAME Windows)
set(CMAKE_SYSTEM_PROCESSOR x86_64)

set(MINGW_TRIPLE x86_64-w64-mingw32)
set(CMAKE_C_COMPILER ${MINGW_TRIPLE}-gcc-posix)
set(CMAKE_CXX_COMPILER ${MINGW_TRIPLE}-g++-posix)
set(CMAKE_RC_COMPILER ${MINGW_TRIPLE}-windres)

# try_compile runs inside a fresh project: pass the prefix on.
list(APPEND CMAKE_TRY_COMPILE_PLATFORM_VARIABLES COILWRIGHT_WINDOWS_PREFIX)
set(CMAKE_FIND_ROOT_PATH /usr/${MINGW_TRIPLE} ${COILWRIGHT_WINDOWS_PREFIX})
set(CMAKE_FIND_ROOT_PATH_MODE_PROGRAM NEVER)
set(CMAKE_FIND_ROOT_PATH_MODE_LIBRARY ONLY)
set(CMAKE_FIND_ROOT_PATH_MODE_INCLUDE ONLY)
set(CMAKE_FIND_ROOT_PATH_MODE_PACKAGE ONLY)

# Self-contained executables: the C++ runtime, libgcc and winpthread are linked in, so the
# .exe runs without copying DLLs next to it.
set(CMAKE_EXE_LINKER_FLAGS_INIT "-static -static-libgcc -static-libstdc++")

# Test programs run under wine (ctest and gtest discovery use this).
find_program(WINE_PROGRAM NAMES wine wine64)
if(WINE_PROGRAM)
  set(CMAKE_CROSSCOMPILING_EMULATOR ${WINE_PROGRAM})
endif()
