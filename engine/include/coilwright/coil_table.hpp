// A coaxial coil table: one row per coil, the way designers list them in a sheet.
#pragma once

#include <array>
#include <cstddef>
#include <vector>

namespace coilwright {

// The cross-section of a coaxial coil centred at z = 0: radial extent inner..outer and axial
// extent length, current spread uniformly over it. inner = outer is a current sheet (thin
// solenoid), length = 0 a flat (pancake) winding, both a loop of coincident turns.
struct CoilSection {
    double inner_radius;  // m, > 0
    double outer_radius;  // m, >= inner_radius
    double length;        // m, >= 0
};

// Throws DomainError naming the bad value; `which` prefixes the message (e.g. "coil 1 ").
void validate(const CoilSection& section, const char* which = "");

// One coaxial coil. Six numbers, in the order of a sheet row.
struct CoilRow {
    double inner_radius;  // m, > 0
    double outer_radius;  // m, >= inner_radius
    double length;        // m, >= 0 (axial extent of the winding)
    double centre_z;      // m, axial position of the coil's centre
    double turns;         // >= 0
    double current;       // A per turn, any sign

    enum class Kind {
        Loop,          // inner = outer, length = 0: N coincident thin turns
        ThinSolenoid,  // inner = outer, length > 0: current sheet
        FlatSpiral,    // inner < outer, length = 0: flat (pancake) winding
        Thick,         // inner < outer, length > 0: rectangular cross-section, uniform current density
    };
    Kind kind() const;
    double ampere_turns() const { return turns * current; }
    CoilSection section() const { return {inner_radius, outer_radius, length}; }
};

inline constexpr std::size_t kCoilTableColumns = 6;

class CoilTable {
public:
    // Validates every row; a bad row throws DomainError whose message names it by
    // `row_labels[i]` (the sheet row number as the user counts it, 1-based in the range).
    CoilTable(std::vector<CoilRow> rows, std::vector<std::size_t> row_labels);
    explicit CoilTable(std::vector<CoilRow> rows);  // labels 1..n

    const std::vector<CoilRow>& rows() const { return rows_; }
    std::size_t size() const { return rows_.size(); }
    std::size_t label(std::size_t i) const { return labels_[i]; }

private:
    std::vector<CoilRow> rows_;
    std::vector<std::size_t> labels_;
};

// Validates one row; throws DomainError with "row <label>: ..." in the message.
void validate(const CoilRow& row, std::size_t label);

}  // namespace coilwright
