// CALL_CHECK: the reason of every failing call, in words, from the call layer itself.
#include <gtest/gtest.h>

#include <string>
#include <vector>

#include "call_by_name.hpp"

using namespace coilwright::sheet;
using namespace coilwright::sheet::helpers;

namespace {

Arg text(const char* s) { return Arg::scalar(Cell::of_text(s)); }

// CALL_CHECK(function; arguments...) with the missing arguments left out.
std::string check(std::vector<Arg> args) {
    args.resize(function_specs()[static_cast<std::size_t>(function_index("CALL_CHECK"))].arg_count);
    const CallResult r = call("CALL_CHECK", args);
    EXPECT_TRUE(r.is_text);
    return r.text;
}

bool contains(const std::string& text, const char* part) { return text.find(part) != std::string::npos; }

}  // namespace

TEST(CallCheck, AGoodCallIsOkWithItsValue) {
    const std::string s = check({text("LOOP_BZ"), Arg::number(0.1), Arg::number(10), Arg::number(2), Arg::number(0)});
    EXPECT_TRUE(s.starts_with("OK: 0.000125")) << s;  // mu0 N I / (2a) = 1.2566e-4 T
}

TEST(CallCheck, APointOnTheFilamentSaysSo) {
    const std::string s = check({text("loop_bz"), Arg::number(0.1), Arg::number(10), Arg::number(2), Arg::number(0),
                                 Arg::number(0.1)});
    EXPECT_TRUE(s.starts_with("Err:502: ")) << s;
    EXPECT_TRUE(contains(s, "filament")) << s;
}

TEST(CallCheck, ThermalRunawaySaysSo) {
    // 20 A through 1 ohm cooled by 0.01 m^2 at 10 W/(m^2 K): alpha k = 0.00393 * 4000 > 1.
    const std::string s = check({text("COIL_HOT_TEMPERATURE"), Arg::number(1.0), Arg::number(20.0), Arg::number(0.01)});
    EXPECT_TRUE(s.starts_with("Err:502: ")) << s;
    EXPECT_TRUE(contains(s, "thermal runaway")) << s;
}

TEST(CallCheck, AnArrayCallNamesTheFirstFailingElementAndCountsThem) {
    const std::string s = check({text("LOOP_BR"), Arg::number(0.1), Arg::number(10), Arg::number(2),
                                 column({0.05, 0.0, 0.0}), Arg::number(0.1)});
    EXPECT_TRUE(s.starts_with("Err:502: element (row 2, column 1) of 3 x 1: ")) << s;
    EXPECT_TRUE(contains(s, "filament")) << s;
    EXPECT_TRUE(contains(s, "(2 of 3 elements fail)")) << s;
    EXPECT_EQ(check({text("LOOP_BR"), Arg::number(0.1), Arg::number(10), Arg::number(2), column({0.05, 0.06}),
                     Arg::number(0.1)}),
              "OK: 2 x 1 values");
}

TEST(CallCheck, TablesArePassedOnAndTwinNamesAccepted) {
    const Arg bad_table = Arg::array(1, 6, {Cell::of(0.2), Cell::of(0.1), Cell::of(0), Cell::of(0), Cell::of(10),
                                            Cell::of(1)});
    const std::string s = check({text("STACK_BZ_ARRAY"), bad_table, Arg::number(0)});
    EXPECT_TRUE(s.starts_with("Err:502: row 1: ")) << s;
    EXPECT_TRUE(contains(s, "outer radius")) << s;
    EXPECT_TRUE(check({text("STACK_CHECK"), bad_table}).starts_with("OK: row 1: ")) << "a text result is passed on";
}

TEST(CallCheck, BadNamesAndArgumentCountsAreExplained) {
    EXPECT_EQ(check({text("LOOP_BQ")}), "no Coilwright function is named \"LOOP_BQ\"");
    EXPECT_TRUE(check({Arg::number(3)}).starts_with("function must be the name"));
    EXPECT_EQ(check({text("WIRE_AREA"), Arg::number(1e-3), Arg::number(2)}),
              "WIRE_AREA takes at most 1 argument; 2 were given");
    EXPECT_TRUE(check({text("WIRE_AREA")}).starts_with("Err:502: bareDiameter is required"));
    EXPECT_TRUE(check({text("ORG.COILWRIGHT.FUNCTIONS.WIRE_AREA"), Arg::number(1e-3)}).starts_with("OK: "));
}
