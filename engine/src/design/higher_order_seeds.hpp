// Starting points of the higher-order designs' Newton iteration, rounded to three or four
// digits: the design itself is solved from them to rounding accuracy (higher_order.cpp).
//
// x lists the pairs' positions (cylinder: z / R; sphere: cos of the polar angle, z / R), from
// the centre outwards, then the ampere-turn ratios of the other loops to the reference loop:
// without a centre loop the pairs 2..p against pair 1, with one every pair against the centre.
// Sources: sphere, uniform: the interior Gauss-Lobatto nodes and weights (zeros of P'_(2p+1), or
// P'_(2p+2) with a centre loop; M. Abramowitz and I. A. Stegun, Handbook of Mathematical
// Functions, 25.4.32 and table 25.6): a loop at cos(theta) = x on a sphere adds
// I sin^2(theta) P'_(n+1)(x) to the n-th coefficient of the axial field (the Legendre expansion
// used by M. W. Garrett, J. Appl. Phys. 22 (1951) 1091; citation from memory), and (1 - x^2) P'_(n+1)(x) integrates to zero for n >= 1, so
// the Lobatto rule nulls every coefficient up to its degree (one pair: Helmholtz's x = 1/sqrt 5;
// a centre loop and one pair: Maxwell's sqrt(3/7) and 49/64). The others: found by a
// multi-start search of the same equations (tests/reference/generate_higher_order_reference.py
// solves them independently in mpmath); cylinder, two pairs: z = 0.2432 R and 0.9407 R,
// ratio 2.260, the four-coil system Lee-Whiting rounded to 9:4 (G. E. Lee-Whiting, Chalk River
// report CRT-673, 1957; values from memory).
#pragma once

namespace coilwright::internal {

struct DesignSeed {
    bool gradient;
    bool sphere;
    int pairs;
    bool centre;
    double x[9];
};

inline constexpr DesignSeed kDesignSeeds[] = {
    // uniform, sphere (Gauss-Lobatto)
    {false, true, 1, false, {0.4472}},
    {false, true, 2, false, {0.2852, 0.7651, 0.6821}},
    {false, true, 3, false, {0.2093, 0.5917, 0.8717, 0.8270, 0.5108}},
    {false, true, 4, false, {0.1653, 0.4779, 0.7388, 0.9195, 0.8916, 0.6866, 0.4070}},
    {false, true, 1, true, {0.6547, 0.7656}},
    {false, true, 2, true, {0.4688, 0.8302, 0.8854, 0.5677}},
    {false, true, 3, true, {0.3631, 0.6772, 0.8998, 0.9325, 0.7390, 0.4455}},
    {false, true, 4, true, {0.2958, 0.5652, 0.7845, 0.9340, 0.9556, 0.8262, 0.6234, 0.3651}},
    // uniform, cylinder
    {false, false, 1, false, {0.5}},
    {false, false, 2, false, {0.2432, 0.9407, 2.260}},
    {false, false, 3, false, {0.1626, 0.5370, 1.194, 1.348, 3.455}},
    {false, false, 1, true, {0.7601, 1.882}},
    {false, false, 4, false, {0.1224, 0.3867, 0.7303, 1.374, 1.173, 1.731, 4.636}},
    {false, false, 2, true, {0.4092, 1.080, 1.223, 3.001}},
    {false, false, 3, true, {0.2862, 0.6416, 1.290, 1.106, 1.575, 4.147}},
    {false, false, 4, true, {0.2211, 0.4718, 0.8077, 1.447, 1.062, 1.295, 1.956, 5.303}},
    // gradient, cylinder
    {true, false, 1, false, {0.8660}},
    {true, false, 2, false, {0.4356, 1.189, 7.462}},
    {true, false, 3, false, {0.2986, 0.6745, 1.397, 3.298, 19.86}},
    {true, false, 4, false, {0.2284, 0.4888, 0.8431, 1.551, 2.637, 7.036, 38.53}},
    // gradient, sphere: the Lobatto nodes of the centre-loop rule without the centre, currents
    // w_i x_i (so that x (1 - x^2) P'_(n+1)(x), of one degree more, integrates exactly)
    {true, true, 1, false, {0.6547}},
    {true, true, 2, false, {0.4688, 0.8302, 1.135}},
    {true, true, 3, false, {0.3631, 0.6772, 0.8998, 1.478, 1.184}},
    {true, true, 4, false, {0.2958, 0.5652, 0.7845, 0.9340, 1.652, 1.731, 1.207}},
};

inline const DesignSeed* find_seed(bool gradient, bool sphere, int pairs, bool centre) {
    for (const DesignSeed& s : kDesignSeeds)
        if (s.gradient == gradient && s.sphere == sphere && s.pairs == pairs && s.centre == centre) return &s;
    return nullptr;
}

}  // namespace coilwright::internal
