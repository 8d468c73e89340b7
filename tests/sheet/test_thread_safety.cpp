// The engine and the call layer keep no mutable global state: every catalogue function gives
// bit-identical results (values, error cells, messages) from several threads at once as from one.
// Run under the sanitizer build (ASan, UBSan) in tools/test.sh; tools/soak.sh adds ThreadSanitizer.
#include <gtest/gtest.h>

#include <algorithm>
#include <atomic>
#include <bit>
#include <cstdint>
#include <thread>
#include <vector>

#include "core/catalogue.hpp"
#include "core/evaluate.hpp"

using namespace coilwright::sheet;

namespace {

// The results are compared, not the time: the call layer's deadline, which depends on how
// loaded the machine is, stays out of it.
constexpr double kNoDeadline = 3600.0;

struct Call {
    std::size_t function;
    std::vector<Arg> args;
};

// Deterministic mixes of sensible and bad values, so both results and errors are compared.
constexpr double kValues[] = {0.1, 0.05, 0.2, 1.0, 2.0, 10.0, 0.3, 0.02, 0.0, -0.05, 1e-3, 0.15, 5.0, -1.0};

double pick(std::uint64_t& state) {
    state = state * 6364136223846793005ULL + 1442695040888963407ULL;  // Knuth's MMIX LCG
    return kValues[(state >> 33) % std::size(kValues)];
}

Arg coil_table(std::uint64_t& state) {
    // One loop and one thin solenoid: a valid table whatever the function does with it.
    std::vector<Cell> cells;
    for (double v : {0.1, 0.1, 0.0, 0.0, 10.0, 1.0, 0.2, 0.2, 0.3, pick(state), 5.0, 2.0}) cells.push_back(Cell::of(v));
    return Arg::array(2, 6, std::move(cells));
}

std::vector<Call> make_calls() {
    std::vector<Call> calls;
    std::uint64_t state = 12345;
    const auto specs = function_specs();
    for (std::size_t f = 0; f < specs.size(); ++f) {
        for (int variant = 0; variant < 40; ++variant) {
            Call call{f, {}};
            for (std::size_t a = 0; a < specs[f].arg_count; ++a) {
                const ArgSpec& spec = specs[f].args[a];
                if (spec.kind == ArgKind::Table) {
                    call.args.push_back(coil_table(state));
                } else if (variant % 4 == 0 && a + 1 == specs[f].arg_count) {
                    std::vector<Cell> column;  // an array call: a column of 16
                    for (int k = 0; k < 16; ++k) column.push_back(Cell::of(pick(state)));
                    call.args.push_back(Arg::array(16, 1, std::move(column)));
                } else {
                    call.args.push_back(Arg::number(pick(state)));
                }
            }
            calls.push_back(std::move(call));
        }
    }
    return calls;
}

bool same(const CallResult& a, const CallResult& b) {
    return a.error == b.error && a.message == b.message && a.is_array == b.is_array && a.rows == b.rows &&
           a.cols == b.cols && a.errors == b.errors &&
           std::equal(a.values.begin(), a.values.end(), b.values.begin(), b.values.end(),
                      [](double x, double y) { return std::bit_cast<std::uint64_t>(x) == std::bit_cast<std::uint64_t>(y); });
}

}  // namespace

TEST(ThreadSafety, ConcurrentCallsGiveTheSingleThreadedResults) {
    const std::vector<Call> calls = make_calls();
    std::vector<CallResult> expected;
    std::size_t computed = 0;
    for (const Call& c : calls) {
        expected.push_back(evaluate_within(c.function, c.args, kNoDeadline));
        computed += expected.back().error == CellError::None;
    }
    ASSERT_GT(computed, calls.size() / 4) << "the mix should mostly compute";

    // Enough overlap; heavy functions (region searches) dominate the time. The sanitizer build
    // looks for memory errors and undefined behaviour, which one overlapping round exercises as
    // well as four (tools/soak.sh runs ThreadSanitizer on the full count).
#ifdef COILWRIGHT_SANITIZED_BUILD
    constexpr int kThreads = 2, kRounds = 1;
#else
    constexpr int kThreads = 4, kRounds = 4;
#endif
    std::atomic<std::size_t> mismatches{0};
    std::vector<std::thread> threads;
    for (int t = 0; t < kThreads; ++t)
        threads.emplace_back([&, t] {
            for (int round = 0; round < kRounds; ++round)
                for (std::size_t k = 0; k < calls.size(); ++k) {
                    // Each thread walks the calls from a different start, so they overlap differently.
                    const std::size_t i = (k + static_cast<std::size_t>(t) * 7919) % calls.size();
                    if (!same(evaluate_within(calls[i].function, calls[i].args, kNoDeadline), expected[i])) ++mismatches;
                }
        });
    for (auto& th : threads) th.join();
    EXPECT_EQ(mismatches.load(), 0u);
    std::printf("thread safety: %zu calls x %d rounds x %d threads, %zu mismatches\n", calls.size(), kRounds,
                kThreads, mismatches.load());
}
