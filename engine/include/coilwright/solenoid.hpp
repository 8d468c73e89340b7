// Thin current-sheet solenoid (a single-layer winding idealised as a sheet) anywhere in space.
#pragma once

#include "coilwright/field.hpp"

namespace coilwright {

// Which field components to compute (the other is returned as 0): saves work for Bz or Br alone.
enum class Components { Both, Axial, Radial };

// N turns spread evenly over `length` on a cylinder of radius `radius`, centred at z = 0, axis z.
struct SolenoidSpec {
    double radius;   // m, > 0
    double length;   // m, > 0
    double turns;    // >= 0
    double current;  // A, any sign
};

// Field at axial position z (m) and distance r >= 0 (m) from the axis: inside, outside, near the
// ends and close to the sheet. Throws DomainError for bad arguments and SingularPointError for a
// point on the sheet (r == radius, |z| <= length / 2), where Bz jumps and the rims are singular.
// Relative accuracy about 1e-14 per component; near a zero of Bz (outside the winding, beyond
// the ends) Bz is accurate relative to |B| instead.
FieldRZ solenoid_field(const SolenoidSpec& solenoid, double z, double r, Components want = Components::Both);

void validate(const SolenoidSpec& solenoid);

namespace detail {

// A field point relative to a sheet of radius a and half-length h, in units of a. The two
// differences that decide the field near the rims, a - r and |z| - h, are formed before the
// scaling, where they are exact for nearby values, so that they keep their relative precision.
struct SheetPoint {
    double z;            // z / a (signed)
    double r;            // r / a
    double one_minus_r;  // (a - r) / a
    double h;            // h / a
    double beyond_end;   // (|z| - h) / a: distance beyond the nearer end plane, < 0 between them

    static SheetPoint of(double z, double r, double a, double h) {
        return {z / a, r / a, (a - r) / a, h / a, ((z < 0 ? -z : z) - h) / a};
    }
};

// Unchecked kernel: the field of a sheet of radius 1 in units of mu0 n I (n turns per unit
// length). `max_loss` bounds the digits the closed form may lose to cancellation between the
// two ends (a factor); beyond it the loop field is integrated along the sheet instead. Throws
// SingularPointError on the sheet.
FieldRZ sheet_field_normalized(const SheetPoint& p, double max_loss = 4.0, Components want = Components::Both);

// The same for a sheet of radius 1, half-length h and a point (z, r) given in those units.
inline FieldRZ sheet_field_normalized(double z, double r, double one_minus_r, double h, double max_loss = 4.0,
                                      Components want = Components::Both) {
    return sheet_field_normalized(SheetPoint{z, r, one_minus_r, h, (z < 0 ? -z : z) - h}, max_loss, want);
}

// End functions of the sheet (radius 1, field point at axial distance zeta >= 0 from one end):
// with G(zeta) = integral_0^zeta Bz_loop ds (odd in zeta) and the solid angle of the end disk,
//   inside_part(zeta, r)  = G(zeta)       for r < 1   (the solenoid's own field, positive)
//   disk_part(zeta, r)    = Omega / 4 pi  for any r  (equals 1/2 - G for r <= 1, -G for r > 1)
//   vector_part(zeta, r)  = -integral of Br_loop, i.e. Br = vector_part(lo) - vector_part(hi)
double inside_part(double zeta, double r, double one_minus_r);
double disk_part(double zeta, double r, double one_minus_r);
double vector_part(double zeta, double r, double one_minus_r);

}  // namespace detail

}  // namespace coilwright
