// The thin rectangle's field near the coil, written once for one point and for packs of
// points (the lanes of loop_kernel.hpp), so the set's batch and single-point paths agree to the
// last bit. Private to the engine.
//
// Each side is a straight segment: B = mu0 I / (4 pi) (e x r1) F, F = (t1/R1 - t2/R2) / d^2
// beside the segment and F = L (t1 + t2) / (R1 R2 (t1 R2 + t2 R1)) beyond its ends (the form
// of rect.cpp, without cancellation there), with t1, t2 the distances along the side from its
// ends, d the distance from its line and R1, R2 from its ends; the four corner distances are
// shared by the sides. Summing the sides loses about log10(R / size) digits far away, so the
// kernel serves points within kRectKernelReach half-diagonals of the centre; farther ones go
// to rect.hpp's rect_field, which is free of that cancellation.
#pragma once

#include "field/loop_kernel.hpp"

namespace coilwright::internal {

inline constexpr double kRectKernelReach = 8.0;  // half-diagonals

template <class L>
struct RectKernel {
    using V = typename L::V;

    [[gnu::always_inline]] static V side(V t1, V t2, V len, V d2, V r1, V r2) {
        const auto beside = (t1 > L::splat(0.0)) & (t2 < L::splat(0.0));
        const V f_in = (t1 / r1 - t2 / r2) / d2;
        const V f_out = len * (t1 + t2) / (r1 * r2 * (t1 * r2 + t2 * r1));
        return L::select(beside, f_in, f_out);
    }

    // Field per mu0 N I / (4 pi) of the rectangle of half sides hw, hh (metres) centred at the
    // origin in z = 0, at (x, y, z) (metres, local axes). Non-finite on a side or a corner.
    [[gnu::always_inline]] static void field(V x, V y, V z, double hw, double hh, V& bx, V& by, V& bz) {
        const V w = L::splat(hw), h = L::splat(hh);
        const V xm = x - w, xp = x + w, ym = y - h, yp = y + h, z2 = z * z;
        const V c1 = L::sqrt(xp * xp + yp * yp + z2);  // corner (-hw, -hh)
        const V c2 = L::sqrt(xm * xm + yp * yp + z2);  // corner (hw, -hh)
        const V c3 = L::sqrt(xm * xm + ym * ym + z2);  // corner (hw, hh)
        const V c4 = L::sqrt(xp * xp + ym * ym + z2);  // corner (-hw, hh)
        const V len_u = L::splat(2.0 * hw), len_v = L::splat(2.0 * hh);
        const V fb = side(xp, xm, len_u, yp * yp + z2, c1, c2);  // bottom, along +x
        const V fr = side(yp, ym, len_v, xm * xm + z2, c2, c3);  // right, along +y
        const V ft = side(-xm, -xp, len_u, ym * ym + z2, c3, c4);  // top, along -x
        const V fl = side(-ym, -yp, len_v, xp * xp + z2, c4, c1);  // left, along -y
        bx = z * (fr - fl);
        by = z * (ft - fb);
        bz = ((fb * yp - fr * xm) - ft * ym) + fl * xp;
    }

    // Inside the kernel's reach: |p|^2 <= (reach s)^2, s the half-diagonal.
    [[gnu::always_inline]] static auto within(V x, V y, V z, double reach2) {
        return x * x + y * y + z * z <= L::splat(reach2);
    }
};

}  // namespace coilwright::internal
