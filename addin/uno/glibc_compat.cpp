// The add-in must load on the oldest Linux the LibreOffice it declares supports (glibc 2.17,
// see addin/package/description.xml.in), though it is built on a newer one (Debian 12: glibc
// 2.36), whose linker binds each C library function to its newest version. The few functions
// whose newest version is younger than 2.17 are bound here to their first version instead:
// the linker's --wrap=NAME (addin/CMakeLists.txt) sends every reference to NAME, the statically
// linked C++ runtime's included, to __wrap_NAME below, which calls NAME@GLIBC_2.2.5. The newer
// glibc keeps those versions and runs the same code under them (the maths functions differ only
// in how they report a domain error or an overflow through errno, which the engine never reads:
// it checks arguments before and results after; memcpy@2.2.5 also allows overlapping buffers).
// A test (tests/security) reads the built library's needs.
#include <pthread.h>

#include <cstddef>

#if defined(__x86_64__) && defined(__GLIBC__)

extern "C" {

void* coilwright_memcpy_v1(void*, const void*, std::size_t);
double coilwright_log_v1(double);
double coilwright_pow_v1(double, double);
double coilwright_hypot_v1(double, double);
double coilwright_exp_v1(double);
double coilwright_exp2_v1(double);
double coilwright_log2_v1(double);
int coilwright_pthread_once_v1(pthread_once_t*, void (*)());
__asm__(".symver coilwright_memcpy_v1, memcpy@GLIBC_2.2.5");
__asm__(".symver coilwright_log_v1, log@GLIBC_2.2.5");
__asm__(".symver coilwright_pow_v1, pow@GLIBC_2.2.5");
__asm__(".symver coilwright_hypot_v1, hypot@GLIBC_2.2.5");
__asm__(".symver coilwright_exp_v1, exp@GLIBC_2.2.5");
__asm__(".symver coilwright_exp2_v1, exp2@GLIBC_2.2.5");
__asm__(".symver coilwright_log2_v1, log2@GLIBC_2.2.5");
__asm__(".symver coilwright_pthread_once_v1, pthread_once@GLIBC_2.2.5");  // in libpthread before glibc 2.34

void* __wrap_memcpy(void* to, const void* from, std::size_t n) { return coilwright_memcpy_v1(to, from, n); }
double __wrap_log(double x) { return coilwright_log_v1(x); }
double __wrap_pow(double x, double y) { return coilwright_pow_v1(x, y); }
double __wrap_hypot(double x, double y) { return coilwright_hypot_v1(x, y); }
double __wrap_exp(double x) { return coilwright_exp_v1(x); }
double __wrap_exp2(double x) { return coilwright_exp2_v1(x); }
double __wrap_log2(double x) { return coilwright_log2_v1(x); }
int __wrap_pthread_once(pthread_once_t* once, void (*init)()) { return coilwright_pthread_once_v1(once, init); }

// glibc 2.32 tells whether the process has one thread only, letting the C++ runtime skip atomic
// operations; 0 ("maybe several") keeps them always, which is correct anywhere and what
// LibreOffice, with its many threads, gets anyway.
char __wrap___libc_single_threaded = 0;

}  // extern "C"

#endif
