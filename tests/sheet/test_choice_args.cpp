// "choice" arguments: text from a fixed list, case-insensitive, converted before broadcasting.
#include <gtest/gtest.h>

#include <string>

#include "coilwright/wire.hpp"
#include "core/catalogue.hpp"
#include "core/evaluate.hpp"
#include "call_by_name.hpp"

using namespace coilwright;
using namespace coilwright::sheet;

namespace {
using helpers::call;
Arg text(const char* s) { return Arg::scalar(Cell::of_text(s)); }
double resistance(Arg material) {
    const auto r = call("WIRE_RESISTANCE", {Arg::number(1e-3), Arg::number(10), std::move(material), Arg::missing()});
    EXPECT_EQ(r.error, CellError::None) << r.message;
    return r.values.at(0);
}
}  // namespace

TEST(ChoiceArgs, TextIsMatchedCaseInsensitivelyWithAliases) {
    const double cu = wire_resistance(1e-3, 10, Conductor::Copper, 20), al = wire_resistance(1e-3, 10, Conductor::Aluminium, 20);
    EXPECT_EQ(resistance(text("copper")), cu);
    EXPECT_EQ(resistance(text(" Copper ")), cu);
    EXPECT_EQ(resistance(text("CU")), cu);
    EXPECT_EQ(resistance(text("aluminium")), al);
    EXPECT_EQ(resistance(text("Aluminum")), al);
    EXPECT_EQ(resistance(Arg::missing()), cu);  // the default
}

TEST(ChoiceArgs, UnknownTextNumbersAndBlanksAreErrors) {
    for (Arg bad : {text("brass"), text(""), text("copper2"), Arg::number(0), Arg::number(1), Arg::scalar(Cell{})}) {
        const auto r = call("WIRE_RESISTANCE", {Arg::number(1e-3), Arg::number(10), bad, Arg::missing()});
        EXPECT_EQ(r.error, CellError::IllegalArgument);
    }
    const auto r = call("WIRE_RESISTANCE", {Arg::number(1e-3), Arg::number(10), text("brass"), Arg::missing()});
    EXPECT_NE(r.message.find("copper, aluminium"), std::string::npos) << r.message;
}

TEST(ChoiceArgs, NumbersAreAcceptedWhereTheCatalogueSaysSo) {
    // Thermal classes: 155 or "155" or "F" or "f"; 150 is no class.
    for (Arg good : {Arg::number(155), text("155"), text("F"), text("f")}) {
        const auto r = call("INSULATION_CLASS_LIMIT", {good});
        ASSERT_EQ(r.error, CellError::None) << r.message;
        EXPECT_EQ(r.values[0], 155.0);
    }
    for (Arg bad : {Arg::number(150), text("G"), text("155 C")})
        EXPECT_EQ(call("INSULATION_CLASS_LIMIT", {bad}).error, CellError::IllegalArgument);
}

TEST(ChoiceArgs, RangesOfChoicesBroadcastElementByElement) {
    const Arg materials = Arg::array(3, 1, {Cell::of_text("copper"), Cell::of_text("zinc"), Cell::of_text("al")});
    const auto r = call("WIRE_RESISTANCE", {Arg::number(1e-3), Arg::number(10), materials, Arg::missing()});
    ASSERT_EQ(r.error, CellError::None) << r.message;
    ASSERT_TRUE(r.is_array);
    EXPECT_EQ(r.values[0], wire_resistance(1e-3, 10, Conductor::Copper, 20));
    EXPECT_EQ(r.errors[1], CellError::IllegalArgument);
    EXPECT_EQ(r.values[2], wire_resistance(1e-3, 10, Conductor::Aluminium, 20));
}

TEST(ChoiceArgs, GaugeTextStillWorks) {
    const auto r = call("AWG_DIAMETER", {text("4/0")});
    ASSERT_EQ(r.error, CellError::None) << r.message;
    EXPECT_NEAR(r.values[0], 0.46 * 0.0254, 1e-15);
    EXPECT_EQ(call("AWG_DIAMETER", {text("5/0")}).error, CellError::IllegalArgument);
}

TEST(ChoiceArgs, ThermalRunawayIsAnErrorCell) {
    const auto r = call("COIL_HOT_TEMPERATURE", {Arg::number(2.0), Arg::number(8.0), Arg::number(0.05), Arg::missing(),
                                                 Arg::missing(), Arg::missing()});
    EXPECT_EQ(r.error, CellError::IllegalArgument);
    EXPECT_NE(r.message.find("runaway"), std::string::npos) << r.message;
}

// Text as Calc passes it may hold any character; "copper"&CHAR(0)&"junk" once read as "copper".
TEST(ChoiceArgs, TextWithAControlCharacterIsAnErrorNamingIt) {
    using namespace std::string_literals;
    for (const std::string& bad : {"copper\0junk"s, "copper\t"s, "cop\nper"s, "copper\x7f"s, "\x01"s,
                                   "copper\xc2\x85"s /* U+0085, a C1 control */}) {
        const auto r = call("WIRE_RESISTANCE", {Arg::number(1e-3), Arg::number(10), Arg::scalar(Cell::of_text(bad)),
                                                Arg::missing()});
        EXPECT_EQ(r.error, CellError::IllegalArgument) << bad;
        EXPECT_NE(r.message.find("control character"), std::string::npos) << r.message;
    }
    EXPECT_EQ(call("INSULATION_CLASS_LIMIT", {Arg::scalar(Cell::of_text("F\0zzz"s))}).error,
              CellError::IllegalArgument);
    EXPECT_EQ(call("AWG_DIAMETER", {Arg::scalar(Cell::of_text("2/0\0"s))}).error, CellError::IllegalArgument);
    // Other characters beyond ASCII are no control characters: "é" is just not a material.
    const auto r = call("WIRE_RESISTANCE", {Arg::number(1e-3), Arg::number(10), text("copp\xc3\xa9r"), Arg::missing()});
    EXPECT_EQ(r.message.find("control character"), std::string::npos) << r.message;
}
