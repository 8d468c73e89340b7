// Self-capacitance: Medhurst's table for one layer, the layer-energy method with Massarini and
// Kazimierczuk's turn-to-turn capacitance for several; the self-resonant frequency.
#include <gtest/gtest.h>

#include <cmath>
#include <vector>

#include "ac/self_capacitance.hpp"
#include "coilwright/ac.hpp"
#include "coilwright/errors.hpp"

using namespace coilwright;

namespace {
constexpr double kPiDigits = 3.14159265358979323846;
constexpr double kEps0 = 8.8541878188e-12;  // CODATA 2022, F/m
}  // namespace

TEST(SelfCapacitance, SingleLayerReproducesMedhurstsTable) {
    // R. G. Medhurst, Wireless Engineer 24 (1947) 35 and 80: C = H D pF (D in cm). Table values
    // l/D -> H as reproduced by M. S. Rzeszotarski (1997): 1.0 0.46, 1.5 0.47, 2.0 0.50,
    // 2.5 0.56, 3.0 0.61, 3.5 0.67, 4.0 0.72, 4.5 0.77, 5.0 0.81.
    const double table[][2] = {{1.0, 0.46}, {1.5, 0.47}, {2.0, 0.50}, {2.5, 0.56}, {3.0, 0.61},
                               {3.5, 0.67}, {4.0, 0.72}, {4.5, 0.77}, {5.0, 0.81}};
    const double wire = 1e-3, former = 0.0495;  // mean diameter 0.1 m = 10 cm
    for (const auto& row : table) {
        const double c = coil_self_capacitance(former, row[0] * 0.1, 100.0, 1.0, 0.9e-3, wire, 3.5);
        EXPECT_NEAR(c, row[1] * 10.0 * 1e-12, 1e-24) << row[0];
    }
    // Between the points: linear interpolation (l/D = 2.25 lies halfway between 0.50 and 0.56).
    EXPECT_NEAR(internal::medhurst_h(2.25), 0.53, 1e-15);
    // Medhurst's C depends on the size and shape, not on the turns or the wire.
    EXPECT_DOUBLE_EQ(coil_self_capacitance(former, 0.2, 50.0, 1.0, 0.9e-3, wire, 3.5),
                     coil_self_capacitance(former, 0.2, 150.0, 1.0, 0.5e-3, wire, 2.0));
    EXPECT_THROW(coil_self_capacitance(former, 0.099, 100.0, 1.0, 0.9e-3, wire, 3.5), DomainError);  // l/D < 1
    EXPECT_THROW(coil_self_capacitance(former, 0.501, 100.0, 1.0, 0.9e-3, wire, 3.5), DomainError);  // l/D > 5
}

TEST(SelfCapacitance, TurnToTurnFormulaIsTheIntegralOfItsCell) {
    // Massarini and Kazimierczuk's cell: flux tubes at angle t from the line of centres of two
    // touching insulated wires, within +-pi/6; per radian the insulation gives
    // eps0 eps_r / (2 ln(Do/Dc)) and the air gap eps0 / (2 (1 - cos t)); the smaller governs
    // (the crossover is theta). Integrated here by the midpoint rule, both sides of the line.
    for (double ratio : {1.02, 1.05, 1.1, 1.3})
        for (double eps_r : {2.0, 3.5, 5.0}) {
            const double ln = std::log(ratio);
            const int n = 200000;
            double sum = 0.0;
            for (int i = 0; i < n; ++i) {
                const double t = (i + 0.5) * (kPiDigits / 6.0) / n;
                const double insulation = eps_r / (2.0 * ln), air = 1.0 / (2.0 * (1.0 - std::cos(t)));
                sum += std::min(insulation, air);
            }
            const double integral = 2.0 * kEps0 * sum * (kPiDigits / 6.0) / n;
            EXPECT_NEAR(internal::turn_to_turn_capacitance_per_length(1.0, ratio, eps_r) / integral, 1.0, 1e-6)
                << ratio << " " << eps_r;
        }
}

TEST(SelfCapacitance, MultilayerIsTheEnergyOfTheTurnNetwork) {
    // Independent check of the layer-energy formula: the turns of a back-and-forth square-packed
    // winding at potentials rising linearly along the wire, each pair of facing turns of
    // neighbouring layers coupled by the cell capacitance; C = 2 E / V^2. For N turns per layer
    // the discrete sum is the continuous formula times (1 - 1/(4 N^2)) exactly.
    const double ri = 0.02, dc = 0.5e-3, d_o = 0.55e-3, eps_r = 3.5;
    const double per_length = internal::turn_to_turn_capacitance_per_length(dc, d_o, eps_r);
    for (int layers : {2, 3, 7})
        for (int per_layer : {10, 40}) {
            const int total = layers * per_layer;
            std::vector<double> potential(static_cast<std::size_t>(total));
            // position along the wire of turn j of layer k (layers wound back and forth)
            const auto index = [&](int k, int j) { return k * per_layer + (k % 2 == 0 ? j : per_layer - 1 - j); };
            double energy = 0.0;  // for V = 1
            for (int k = 0; k + 1 < layers; ++k) {
                const double r_gap = ri + (k + 1) * d_o;
                const double c_cell = per_length * 2.0 * kPiDigits * r_gap;
                for (int j = 0; j < per_layer; ++j) {
                    const double dv = (index(k + 1, j) - index(k, j)) / static_cast<double>(total);
                    energy += 0.5 * c_cell * dv * dv;
                }
            }
            const double network = 2.0 * energy;
            const double formula = coil_self_capacitance(ri, per_layer * d_o, total, layers, dc, d_o, eps_r);
            EXPECT_NEAR(formula * (1.0 - 1.0 / (4.0 * per_layer * per_layer)) / network, 1.0, 1e-12)
                << layers << " " << per_layer;
        }
}

TEST(SelfCapacitance, MultilayerTrends) {
    // Thicker insulation and a lower permittivity lower the capacitance; more layers of the same
    // turns lower it too (the voltage per layer gap shrinks faster than the gaps add up).
    const double base = coil_self_capacitance(0.03, 0.05, 1000, 10, 0.5e-3, 0.55e-3, 3.5);
    EXPECT_GT(base, coil_self_capacitance(0.03, 0.05, 1000, 10, 0.5e-3, 0.60e-3, 3.5));
    EXPECT_GT(base, coil_self_capacitance(0.03, 0.05, 1000, 10, 0.5e-3, 0.55e-3, 2.5));
    EXPECT_GT(base, coil_self_capacitance(0.03, 0.05, 1000, 20, 0.5e-3, 0.55e-3, 3.5));
    EXPECT_GT(base, 1e-12);
    EXPECT_LT(base, 1e-9);
}

TEST(SelfCapacitance, RejectsBadArguments) {
    EXPECT_THROW(coil_self_capacitance(0.03, 0.05, 100, 2, 0.5e-3, 0.5e-3, 3.5), DomainError);  // bare wire
    EXPECT_THROW(coil_self_capacitance(0.03, 0.05, 100, 2, 0.5e-3, 0.55e-3, 0.5), DomainError);  // eps_r < 1
    EXPECT_THROW(coil_self_capacitance(0.03, 0.05, 100, 2.5, 0.5e-3, 0.55e-3, 3.5), DomainError);
    EXPECT_THROW(coil_self_capacitance(0.03, 0.05, 1, 2, 0.5e-3, 0.55e-3, 3.5), DomainError);  // < 1 turn per layer
    EXPECT_THROW(coil_self_capacitance(0.0, 0.05, 100, 2, 0.5e-3, 0.55e-3, 3.5), DomainError);
    EXPECT_THROW(coil_self_capacitance(0.03, -0.05, 100, 2, 0.5e-3, 0.55e-3, 3.5), DomainError);
}

TEST(SelfResonance, IsOneOverTwoPiRootLC) {
    EXPECT_NEAR(coil_srf(1e-3, 100e-12) / (1.0 / (2.0 * kPiDigits * std::sqrt(1e-13))), 1.0, 1e-15);
    EXPECT_THROW(coil_srf(0.0, 1e-12), DomainError);
    EXPECT_THROW(coil_srf(1e-3, 0.0), DomainError);
    EXPECT_THROW(coil_srf(1e-3, -1e-12), DomainError);
}
