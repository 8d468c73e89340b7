# The systems a Coilwright .oxt can carry a library for, named three ways: the description.xml
# token (LibreOffice's desktop/source/deployment/misc/dp_platform.cxx), the manifest's platform=
# value ($_OS_$_ARCH of that LibreOffice, compared ignoring case), the UNO C++ bridge named in
# the .components file, and the library's file suffix.
include_guard(GLOBAL)

function(coilwright_oxt_platform token out_manifest out_environment out_suffix)
  if(token STREQUAL "linux_x86_64")
    set(values Linux_X86_64 gcc3 .so)
  elseif(token STREQUAL "linux_aarch64")
    set(values Linux_AARCH64 gcc3 .so)
  elseif(token STREQUAL "windows_x86_64")
    set(values Windows_X86_64 mscx .dll)
  elseif(token STREQUAL "windows_aarch64")
    set(values Windows_AARCH64 msca .dll)
  elseif(token STREQUAL "macosx_x86_64")
    set(values MacOSX_X86_64 gcc3 .dylib)
  elseif(token STREQUAL "macosx_aarch64")
    set(values MacOSX_AARCH64 gcc3 .dylib)
  else()
    message(FATAL_ERROR "Unknown extension platform '${token}': one of linux_x86_64, linux_aarch64, "
                        "windows_x86_64, windows_aarch64, macosx_x86_64, macosx_aarch64.")
  endif()
  list(GET values 0 manifest)
  list(GET values 1 environment)
  list(GET values 2 suffix)
  set(${out_manifest} ${manifest} PARENT_SCOPE)
  set(${out_environment} ${environment} PARENT_SCOPE)
  set(${out_suffix} ${suffix} PARENT_SCOPE)
endfunction()
