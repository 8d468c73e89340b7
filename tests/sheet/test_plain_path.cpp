// evaluate_plain, the shortcut for a cell of plain numbers, against the full call: wherever it
// answers, its number is evaluate()'s bit for bit; it answers every successful single-number
// call of a function of numbers; it never answers a call that fails.
#include <gtest/gtest.h>

#include <bit>
#include <cstdint>
#include <limits>
#include <vector>

#include "core/catalogue.hpp"
#include "core/evaluate.hpp"
#include "core/registry.hpp"

using namespace coilwright::sheet;

namespace {

// Sensible values, zeros, negatives, a subnormal and a huge one: results and errors alike.
constexpr double kValues[] = {0.1, 0.05, 0.2, 1.0, 2.0, 10.0, 0.3, 0.02, 0.0, -0.05, 1e-3, 0.15,
                              5.0, -1.0, 3.0, 0.5, 1e-310, 1e308, 20.0, 100.0, 0.01};

double pick(std::uint64_t& state) {
    state = state * 6364136223846793005ULL + 1442695040888963407ULL;  // Knuth's MMIX LCG
    return kValues[(state >> 33) % std::size(kValues)];
}

// Calls per function (fewer in the sanitizer build, where every call costs several times more and
// the paths, not their count, matter).
#ifdef COILWRIGHT_SANITIZED_BUILD
constexpr int kVariants = 60;
#else
constexpr int kVariants = 160;
#endif

bool all_numbers(const FunctionSpec& spec) {
    for (std::size_t a = 0; a < spec.arg_count; ++a)
        if (spec.args[a].kind != ArgKind::Number) return false;
    return true;
}

}  // namespace

TEST(PlainPath, AgreesWithTheFullCallBitForBit) {
    const auto specs = function_specs();
    std::uint64_t state = 2024;
    std::size_t answered = 0, functions_answered = 0, functions_of_numbers = 0;
    for (std::size_t f = 0; f < specs.size(); ++f) {
        const FunctionSpec& spec = specs[f];
        functions_of_numbers += all_numbers(spec);
        std::size_t answered_here = 0;
        for (int variant = 0; variant < kVariants; ++variant) {
            std::vector<double> numbers(spec.arg_count);
            std::vector<Arg> args;
            std::uint32_t omitted = 0;
            for (std::size_t a = 0; a < spec.arg_count; ++a) {
                const ArgSpec& as = spec.args[a];
                const bool leave_out = as.optional && variant % 3 == 0;
                if (as.kind == ArgKind::Table) {
                    args.push_back(Arg::missing());  // the plain path never takes a table
                } else if (leave_out) {
                    omitted |= std::uint32_t{1} << a;
                    args.push_back(Arg::missing());
                } else {
                    numbers[a] = pick(state);
                    args.push_back(Arg::number(numbers[a]));
                }
            }
            double plain = std::numeric_limits<double>::quiet_NaN();
            const bool took = evaluate_plain(f, numbers, omitted, plain);
            const CallResult full = evaluate(f, args);
            const bool full_number = full.error == CellError::None && !full.is_text && !full.is_array &&
                                     full.values.size() == 1 && full.errors.at(0) == CellError::None;
            if (took) {
                ++answered_here;
                ASSERT_TRUE(full_number) << spec.name << " variant " << variant << ": " << full.message;
                EXPECT_EQ(std::bit_cast<std::uint64_t>(plain), std::bit_cast<std::uint64_t>(full.values[0]))
                    << spec.name << " variant " << variant;
            } else if (full_number && all_numbers(spec) && implementations()[f].plain) {
                ADD_FAILURE() << spec.name << " variant " << variant << ": a plain call the shortcut left out";
            }
        }
        answered += answered_here;
        functions_answered += answered_here > 0;
    }
    // Sensible values succeed often enough for most functions of numbers.
    EXPECT_GT(functions_answered, functions_of_numbers / 2) << "functions the shortcut answered";
    EXPECT_GT(answered, 500u);
}

TEST(PlainPath, LeavesOutWhatItCannotDecide) {
    const int loop = function_index("LOOP_BZ");
    ASSERT_GE(loop, 0);
    const auto f = static_cast<std::size_t>(loop);
    double out = 0.0;
    // radius, turns, current, z, [r]: a good call, then each way out.
    EXPECT_TRUE(evaluate_plain(f, std::vector<double>{0.1, 10, 1, 0.02, 0.0}, 0, out));
    EXPECT_TRUE(evaluate_plain(f, std::vector<double>{0.1, 10, 1, 0.02, 0.0}, 1u << 4, out));   // r omitted
    EXPECT_FALSE(evaluate_plain(f, std::vector<double>{0.1, 10, 1, 0.02, 0.0}, 1u << 3, out));  // z required
    EXPECT_FALSE(evaluate_plain(f, std::vector<double>{0.1, 10, 1, 0.02}, 0, out));             // wrong count
    EXPECT_FALSE(evaluate_plain(f, std::vector<double>{-0.1, 10, 1, 0.02, 0.0}, 0, out));       // engine error
    EXPECT_FALSE(evaluate_plain(f, std::vector<double>{0.1, 10, 1, 0.0, 0.1}, 0, out));         // on the wire
    EXPECT_FALSE(evaluate_plain(f, std::vector<double>{0.1, 10, 1, 1e-310, 0.0}, 0, out));      // subnormal
    EXPECT_FALSE(evaluate_plain(function_specs().size(), std::vector<double>{}, 0, out));       // no such function
    const int stack = function_index("STACK_BZ");
    ASSERT_GE(stack, 0);
    EXPECT_FALSE(evaluate_plain(static_cast<std::size_t>(stack), std::vector<double>{0.0, 0.0, 0.0}, 0, out));
}
