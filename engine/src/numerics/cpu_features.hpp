// What the processor the engine runs on can do, asked once at run time (the extension is built
// for any x86-64 processor and picks faster code where the processor has it).
#pragma once

namespace coilwright::internal {

// Whether this build has copies of code for processors with AVX2 and FMA (GCC or Clang on
// x86-64), and whether the processor it runs on has both.
#if defined(__x86_64__) && (defined(__GNUC__) || defined(__clang__)) && !defined(_MSC_VER)
#define COILWRIGHT_HAVE_AVX2_FMA_CODE 1
#endif
bool processor_has_avx2_fma();

// The same for eight-lane copies with AVX-512 (F and DQ; FMA too), where the compiler makes them
// with compiler vector types. Not for Windows: its x64 ABI keeps the stack 16-byte aligned and
// GCC does not realign it for 64-byte spills.
#if defined(COILWRIGHT_HAVE_AVX2_FMA_CODE) && !defined(_WIN32)
#define COILWRIGHT_HAVE_AVX512_CODE 1
#endif
bool processor_has_avx512();

}  // namespace coilwright::internal
