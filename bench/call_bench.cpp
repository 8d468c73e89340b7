// call-bench: cost of the add-in's UNO-free call layer (argument checks, broadcasting, error
// cells, the engine) per cell, without LibreOffice. Prints "<case> <ns per cell>", medians of
// this thread's processor time over several passes:
//   scalar_cell   =LOOP_BZ(a;N;I;z) one call per cell through the full call (evaluate)
//   plain_cell    the same cells through the plain-number shortcut the add-in tries first
//                 (evaluate_plain); the ratio says what the shortcut saves
//   array_column  {=LOOP_BZ(a;N;I;z;r)} over a column of 100,000 off-axis points, one call
// What LibreOffice adds around each call is measured by bench/calc_bench.py.
#include <time.h>

#include <algorithm>
#include <cstdio>
#include <vector>

#include "core/catalogue.hpp"
#include "core/evaluate.hpp"

using namespace coilwright::sheet;

namespace {

double thread_seconds() {
    timespec ts{};
    clock_gettime(CLOCK_THREAD_CPUTIME_ID, &ts);
    return static_cast<double>(ts.tv_sec) + 1e-9 * static_cast<double>(ts.tv_nsec);
}

template <class F>
double median_ns_per_cell(F run, std::size_t cells, int repeat) {
    run();
    std::vector<double> t;
    for (int i = 0; i < repeat; ++i) {
        const double t0 = thread_seconds();
        run();
        t.push_back((thread_seconds() - t0) * 1e9 / static_cast<double>(cells));
    }
    std::sort(t.begin(), t.end());
    return t[t.size() / 2];
}

}  // namespace

int main() {
    const auto loop_bz = static_cast<std::size_t>(function_index("LOOP_BZ"));
    const std::size_t n = 100000;
    std::vector<double> zs(n), rs(n);
    for (std::size_t i = 0; i < n; ++i) {  // a box around the loop of radius 0.1 m
        zs[i] = -0.3 + 0.6 * static_cast<double>((i * 7919) % n) / static_cast<double>(n);
        rs[i] = 0.3 * static_cast<double>((i * 104729) % n) / static_cast<double>(n);
    }
    double sink = 0.0;

    const std::size_t cells = 50000;
    const double scalar = median_ns_per_cell(
        [&] {
            for (std::size_t i = 0; i < cells; ++i) {
                const Arg args[] = {Arg::number(0.1), Arg::number(100), Arg::number(1.5), Arg::number(zs[i]),
                                    Arg::missing()};
                sink += evaluate(loop_bz, args).values[0];
            }
        },
        cells, 9);
    std::printf("scalar_cell %.1f\n", scalar);
    const double plain = median_ns_per_cell(
        [&] {
            for (std::size_t i = 0; i < cells; ++i) {
                const double numbers[] = {0.1, 100, 1.5, zs[i], 0.0};
                double out = 0.0;
                if (evaluate_plain(loop_bz, numbers, 1u << 4, out)) sink += out;  // r omitted
            }
        },
        cells, 9);
    std::printf("plain_cell %.1f\n", plain);
    std::printf("plain_cell/scalar_cell %.2f\n", plain / scalar);

    std::vector<Cell> zc(n), rc(n);
    for (std::size_t i = 0; i < n; ++i) {
        zc[i] = Cell::of(zs[i]);
        rc[i] = Cell::of(rs[i]);
    }
    const Arg array_args[] = {Arg::number(0.1), Arg::number(100), Arg::number(1.5), Arg::array(n, 1, zc),
                              Arg::array(n, 1, rc)};
    const double array = median_ns_per_cell([&] { sink += evaluate(loop_bz, array_args).values[n - 1]; }, n, 9);
    std::printf("array_column %.1f\n", array);
    std::fprintf(stderr, "# checksum %.17g\n", sink);
    return 0;
}
