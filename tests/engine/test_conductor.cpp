// Wire sizes, conductor materials, resistance and mass against the standards that define them.
#include <gtest/gtest.h>

#include <cmath>
#include <cstdio>
#include <utility>

#include "coilwright/wire.hpp"
#include "coilwright/errors.hpp"
#include "test_support.hpp"

using namespace coilwright;
using coilwright::test::rel;

namespace {
constexpr double kInch = 0.0254;
}  // namespace

TEST(AwgTable, MatchesAstmB258WithinItsRounding) {
    // ASTM B258, Table 1 (nominal diameters of solid round wire, inches, rounded to 0.0001 in
    // for these sizes). Values quoted from memory of the table; the formula of the standard
    // (d = 0.005 in * 92^((36 - n)/39)) reproduces every one to within half a unit of the last digit.
    const std::pair<double, double> table[] = {
        {-3, 0.4600}, {-2, 0.4096}, {-1, 0.3648}, {0, 0.3249}, {1, 0.2893}, {2, 0.2576}, {4, 0.2043},
        {6, 0.1620},  {8, 0.1285},  {10, 0.1019}, {12, 0.0808}, {14, 0.0641}, {16, 0.0508}, {18, 0.0403},
        {20, 0.0320}, {22, 0.0253}, {24, 0.0201}, {26, 0.0159}, {28, 0.0126}, {30, 0.0100}, {32, 0.0080},
        {34, 0.0063}, {36, 0.0050}, {38, 0.0040}, {40, 0.0031}};
    double worst = 0;
    for (auto [gauge, inches] : table) {
        const double err = std::fabs(awg_diameter(gauge) / kInch - inches);
        EXPECT_LE(err, 0.00005 + 1e-12) << gauge;
        worst = std::max(worst, err);
    }
    std::printf("AWG: worst deviation from the ASTM B258 table: %.2e in (table rounding 5e-5 in)\n", worst);
    // Each gauge step is the 39th root of 92 (the defining ratio of the series).
    EXPECT_LT(rel(awg_diameter(11) / awg_diameter(12), std::pow(92.0, 1.0 / 39.0)), 1e-15);
}

TEST(Conductor, CopperIsIec60028AnnealedCopper) {
    // IEC 60028: resistivity 1/58 ohm mm^2/m at 20 C, temperature coefficient 0.00393 /K,
    // density 8.89 g/cm^3.
    EXPECT_LT(rel(resistivity(Conductor::Copper, 20.0), 1e-6 / 58.0), 1e-15);
    EXPECT_LT(rel(resistivity(Conductor::Copper, 75.0), 1e-6 / 58.0 * (1 + 0.00393 * 55)), 1e-15);
    // 1 km of 1 mm^2 copper: 17.241 ohm at 20 C (IEC 60028); 1 m weighs 8.89 g.
    const double d_1mm2 = std::sqrt(4e-6 / 3.14159265358979323846);
    EXPECT_NEAR(wire_resistance(d_1mm2, 1000.0, Conductor::Copper, 20.0), 17.2414, 1e-4);
    EXPECT_NEAR(wire_mass(d_1mm2, 1.0, Conductor::Copper), 8.89e-3, 1e-12);
}

TEST(Conductor, AluminiumIsIec60889Wire) {
    // IEC 60889 (hard-drawn aluminium wire): 0.028264 ohm mm^2/m at 20 C (61 % IACS) and
    // 0.00403 /K, as tabulated for commercial-purity aluminium in K. C. Agrawal, Industrial Power
    // Engineering and Applications Handbook (2001), table of conductor metals; 2.703 g/cm^3 from
    // memory of the standard.
    EXPECT_LT(rel(resistivity(Conductor::Aluminium, 20.0), 0.028264e-6), 1e-15);
    EXPECT_LT(rel(resistivity(Conductor::Aluminium, -30.0), 0.028264e-6 * (1 - 0.00403 * 50)), 1e-15);
    EXPECT_NEAR(conductor_data(Conductor::Aluminium).density, 2703.0, 0.0);
}

TEST(Conductor, HandbookResistanceOfAwg10Copper) {
    // Copper 10 AWG: 0.9989 ohm per 1000 ft at 20 C (common wire-table value, from memory),
    // i.e. 3.277 ohm/km; ours from ASTM B258 and IEC 60028.
    const double per_kft = wire_resistance(awg_diameter(10), 304.8, Conductor::Copper, 20.0);
    EXPECT_NEAR(per_kft, 0.9989, 0.0005);
}

TEST(Conductor, AreaDiameterForCurrentAndLinearity) {
    EXPECT_LT(rel(wire_area(2e-3), 3.14159265358979323846e-6), 1e-15);
    // 10 A at 4 A/mm^2 needs 2.5 mm^2: d = sqrt(4 * 2.5 / pi) mm.
    EXPECT_LT(rel(wire_diameter_for_current(-10.0, 4e6), std::sqrt(10.0 / 3.14159265358979323846) * 1e-3), 1e-15);
    EXPECT_EQ(wire_resistance(1e-3, 0.0, Conductor::Copper, 20.0), 0.0);
    EXPECT_LT(rel(wire_resistance(1e-3, 20.0, Conductor::Copper, 60.0), 2 * wire_resistance(1e-3, 10.0, Conductor::Copper, 60.0)),
              1e-15);
}

TEST(Conductor, BadArgumentsAreErrors) {
    EXPECT_THROW(wire_area(0.0), DomainError);
    EXPECT_THROW(wire_area(-1e-3), DomainError);
    EXPECT_THROW(wire_resistance(1e-3, -1.0, Conductor::Copper, 20.0), DomainError);
    EXPECT_THROW(wire_resistance(1e-3, 1.0, Conductor::Copper, -150.0), DomainError);
    EXPECT_THROW(wire_resistance(1e-3, 1.0, Conductor::Copper, 401.0), DomainError);
    EXPECT_THROW(wire_resistance(1e-3, 1.0, Conductor::Copper, std::nan("")), DomainError);
    EXPECT_THROW(resistivity(static_cast<Conductor>(2), 20.0), DomainError);
    EXPECT_THROW(wire_diameter_for_current(1.0, 0.0), DomainError);
    EXPECT_THROW(wire_diameter_for_current(0.0, 1e6), DomainError);
    EXPECT_THROW(wire_mass(1e150, 1e10, Conductor::Copper), DomainError);  // overflows: an error
}
