// AWG sizes per ASTM B258.
#include <gtest/gtest.h>

#include "coilwright/errors.hpp"
#include "coilwright/wire.hpp"

using namespace coilwright;

TEST(Awg, DefinitionPoints) {
    // ASTM B258 defines 36 AWG as 0.005 in and 4/0 (gauge -3) as 0.4600 in.
    EXPECT_NEAR(awg_diameter(36), 0.005 * 0.0254, 1e-18);
    EXPECT_NEAR(awg_diameter(-3), 0.4600 * 0.0254, 1e-15);
}

TEST(Awg, TextGauges) {
    EXPECT_EQ(parse_awg_gauge("1/0"), 0);
    EXPECT_EQ(parse_awg_gauge(" 4/0 "), -3);
    EXPECT_EQ(parse_awg_gauge("00"), -1);
    EXPECT_EQ(parse_awg_gauge("0000"), -3);
    EXPECT_EQ(parse_awg_gauge("0"), 0);
    EXPECT_EQ(parse_awg_gauge("24"), 24);
    for (const char* bad : {"", "5/0", "AWG", "1/2", "-3", "00000", "12a", "1e3"})
        EXPECT_THROW(parse_awg_gauge(bad), DomainError) << bad;
    EXPECT_THROW(awg_diameter(57), DomainError);
    EXPECT_THROW(awg_diameter(12.5), DomainError);
}
