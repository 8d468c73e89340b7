// The thin-sheet (solenoid) field kernel in normalised units, shared by the solenoid and the
// thick-coil field.
#pragma once

#include "coilwright/field/field_rz.hpp"

namespace coilwright::internal {

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

// The same for `count` points at once (out[i] for p[i]), the same bits as one at a time; the end
// terms of all of them in one call (packs of four where the processor has AVX2).
inline constexpr int kMaxSheetBatch = 32;
void sheet_fields_normalized(const SheetPoint* p, int count, double max_loss, Components want, FieldRZ* out);

// The same for a sheet of radius 1, half-length h and a point (z, r) given in those units.
inline FieldRZ sheet_field_normalized(double z, double r, double one_minus_r, double h, double max_loss = 4.0,
                                      Components want = Components::Both) {
    return sheet_field_normalized(SheetPoint{z, r, one_minus_r, h, (z < 0 ? -z : z) - h}, max_loss, want);
}

}  // namespace coilwright::internal
