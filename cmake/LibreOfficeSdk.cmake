# Finds what building a UNO component needs from LibreOffice (the SDK's tools, headers and
# libraries, the office's type libraries) for the system being built for, and names that system
# as LibreOffice's extension manager does (desktop/source/deployment/misc/dp_platform.cxx).
#
# In:  COILWRIGHT_LO_SDK      the SDK directory (Debian: /usr/lib/libreoffice/sdk)
#      COILWRIGHT_LO_PROGRAM  the directory holding types.rdb and types/offapi.rdb
# Out: UNOIDL_WRITE CPPUMAKER UNO_INCLUDE UNO_LIBRARIES TYPES_RDB OFFAPI_RDB
#      UNO_DEFINITIONS   compile definitions the UNO headers expect (system, C++ bridge)
#      UNO_ENVIRONMENT   the C++ bridge's name, for the .components file
#      UNO_LIBRARY_SUFFIX  .so, .dll or .dylib
#      OXT_PLATFORM      the description.xml token (linux_x86_64, windows_x86_64, macosx_aarch64)
#      OXT_MANIFEST_PLATFORM  the manifest's platform= value (Linux_X86_64, ...)
include_guard(GLOBAL)
include(${CMAKE_CURRENT_LIST_DIR}/OxtPlatforms.cmake)

if(CMAKE_SYSTEM_PROCESSOR MATCHES "^(x86_64|AMD64|amd64|x64)$")
  set(uno_arch x86_64)
elseif(CMAKE_SYSTEM_PROCESSOR MATCHES "^(aarch64|arm64|ARM64)$")
  set(uno_arch aarch64)
else()
  message(FATAL_ERROR "No LibreOffice extension platform for the processor ${CMAKE_SYSTEM_PROCESSOR}: "
                      "configure with -DCOILWRIGHT_ADDIN=OFF to build only the engine.")
endif()

if(WIN32)
  set(uno_token_os windows)
  set(sdk_default "C:/Program Files/LibreOffice/sdk")
  set(program_default "C:/Program Files/LibreOffice/program")
  set(uno_definitions WIN32 WNT _DLL)
  set(uno_library_names isal icppu icppuhelper)
elseif(APPLE)
  set(uno_token_os macosx)
  # The SDK is a separate download (LibreOffice_<version>_MacOS_<arch>_sdk.dmg), put anywhere.
  set(sdk_default "")
  set(program_default "/Applications/LibreOffice.app/Contents/Resources")
  set(uno_definitions UNX GCC MACOSX)
  set(uno_library_names uno_sal uno_cppu uno_cppuhelpergcc3)
else()
  set(uno_token_os linux)
  set(sdk_default /usr/lib/libreoffice/sdk)
  set(program_default /usr/lib/libreoffice/program)
  set(uno_definitions UNX GCC LINUX)
  set(uno_library_names uno_sal uno_cppu uno_cppuhelpergcc3)
endif()
set(OXT_PLATFORM ${uno_token_os}_${uno_arch})
coilwright_oxt_platform(${OXT_PLATFORM} OXT_MANIFEST_PLATFORM UNO_ENVIRONMENT UNO_LIBRARY_SUFFIX)
# The C++ bridge: gcc3 for the Itanium C++ ABI (GCC, clang), mscx/msca for Microsoft's.
set(UNO_DEFINITIONS ${uno_definitions} CPPU_ENV=${UNO_ENVIRONMENT})

set(COILWRIGHT_LO_SDK "${sdk_default}" CACHE PATH "LibreOffice SDK directory")
set(COILWRIGHT_LO_PROGRAM "${program_default}" CACHE PATH
    "LibreOffice directory holding types.rdb and types/offapi.rdb")
set(sdk ${COILWRIGHT_LO_SDK})
set(program ${COILWRIGHT_LO_PROGRAM})

# Tools run on the build machine; headers and libraries are for the system built for.
find_program(UNOIDL_WRITE unoidl-write HINTS ${sdk}/bin ${program} ${program}/../MacOS NO_CMAKE_FIND_ROOT_PATH)
find_program(CPPUMAKER cppumaker HINTS ${sdk}/bin NO_CMAKE_FIND_ROOT_PATH)
# Debian moves the SDK's include/ to /usr/include/libreoffice.
find_path(UNO_INCLUDE sal/types.h HINTS ${sdk}/include /usr/include/libreoffice)
set(UNO_LIBRARIES "")
set(uno_missing "")
foreach(name ${uno_library_names})
  find_library(UNO_LIBRARY_${name} ${name} HINTS ${sdk}/lib ${program} ${program}/../Frameworks)
  if(UNO_LIBRARY_${name})
    list(APPEND UNO_LIBRARIES ${UNO_LIBRARY_${name}})
  else()
    list(APPEND uno_missing ${name})
  endif()
endforeach()
set(TYPES_RDB ${program}/types.rdb)
set(OFFAPI_RDB ${program}/types/offapi.rdb)

if(NOT UNOIDL_WRITE OR NOT CPPUMAKER OR NOT UNO_INCLUDE OR uno_missing
   OR NOT EXISTS ${TYPES_RDB} OR NOT EXISTS ${OFFAPI_RDB})
  message(FATAL_ERROR "The LibreOffice SDK is incomplete for ${OXT_PLATFORM} "
                      "(COILWRIGHT_LO_SDK=${sdk}, COILWRIGHT_LO_PROGRAM=${program}; "
                      "unoidl-write: ${UNOIDL_WRITE}, cppumaker: ${CPPUMAKER}, headers: ${UNO_INCLUDE}, "
                      "libraries missing: ${uno_missing}). On Debian install libreoffice-dev and "
                      "libreoffice-core (tools/setup.sh does it); elsewhere install LibreOffice and its "
                      "SDK and point -DCOILWRIGHT_LO_SDK=... (and -DCOILWRIGHT_LO_PROGRAM=...) at them; "
                      "or configure with -DCOILWRIGHT_ADDIN=OFF to build only the engine.")
endif()
