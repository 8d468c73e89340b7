// The end terms of the thin-sheet field (solenoid.cpp explains the forms): at axial distance
// zeta >= 0 from one end of a sheet of radius 1, the axial term (G for r <= 1, W = Omega / (4 pi)
// for r > 1) and the vector term A, by Bulirsch's cel in all-positive forms.
//
// One request at a time, or many: a thick winding asks for the end terms of a few dozen sheets
// per point, and on processors with AVX2 four requests of the same form run the cel iteration
// side by side (chosen at run time). Each lane does the operations of the one-at-a-time code in
// the same order and stops where it would, so both give the same bits.
#pragma once

namespace coilwright::internal {

struct EndTerms {
    double axial = 0.0, vector = 0.0;
};

// The end terms at distance zeta from an end, for a point at radius r (1 - r given exactly).
struct EndTermRequest {
    double zeta, r, one_minus_r;
    bool want_axial, want_vector;
};

// Below `min_split_k2` the axial term outside the radius is summed directly (disk_part_by_sum):
// the split form of W (solenoid.cpp, item 2) loses about a factor 10 / k^2 (measured), so a
// caller that accepts a loss L passes min_split_k2_for(L).
inline double min_split_k2_for(double max_loss) {
    constexpr double kFullPrecisionK2 = 0.7;
    return max_loss * kFullPrecisionK2 < 10.0 ? kFullPrecisionK2 : 10.0 / max_loss;
}
EndTerms end_terms(const EndTermRequest& q, double min_split_k2);

// `count` requests at once (out[i] for q[i]); requests of one form next to each other run in packs.
void end_terms(const EndTermRequest* q, int count, double min_split_k2, EndTerms* out);

// W = Omega / (4 pi) by the trapezoidal sum of the solid angle; needs r^2 + zeta^2 > r.
double disk_part_by_sum(double zeta, double r);

// Which code end_terms over many requests uses: the widest packs the processor allows (the
// default: eight lanes with AVX-512, four with AVX2), four-lane packs, or one request at a time
// (for the tests that compare them; each falls back to the next where the processor lacks it).
enum class EndTermCode { Packs, FourLanes, OneByOne };
void end_terms_using(EndTermCode code, const EndTermRequest* q, int count, double min_split_k2, EndTerms* out);

}  // namespace coilwright::internal
