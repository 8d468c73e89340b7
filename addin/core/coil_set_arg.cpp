#include "coil_set_arg.hpp"

#include <algorithm>
#include <cctype>
#include <string>

#include "coilwright/errors.hpp"

namespace coilwright::sheet {

namespace {

constexpr std::size_t kRequired = 12, kMost = 15;
constexpr const char* kColumnNames[kMost] = {"shape",  "centre x", "centre y", "centre z", "axis x",
                                             "axis y", "axis z",   "radius or width", "height", "roll",
                                             "turns",  "current",  "circuit", "winding depth", "winding width"};

[[noreturn]] void fail(std::size_t row, const std::string& what) {
    throw DomainError("row " + std::to_string(row) + ": " + what);
}

std::string lower_trimmed(const std::string& s) {
    std::size_t a = 0, b = s.size();
    while (a < b && std::isspace(static_cast<unsigned char>(s[a]))) ++a;
    while (b > a && std::isspace(static_cast<unsigned char>(s[b - 1]))) --b;
    std::string out = s.substr(a, b - a);
    std::transform(out.begin(), out.end(), out.begin(), [](unsigned char c) { return static_cast<char>(std::tolower(c)); });
    return out;
}

// Column c (0-based) of a row: a number, or `blank_value` when the cell is empty and may be.
double number_at(const Arg& t, std::size_t r, std::size_t c, bool may_be_blank, double blank_value) {
    if (c >= t.cols) return blank_value;
    const Cell& cell = t.at(r, c);
    if (cell.kind == CellKind::Number) return cell.number;
    if (cell.kind == CellKind::Empty) {
        if (may_be_blank) return blank_value;
        fail(r + 1, std::string(kColumnNames[c]) + " is blank");
    }
    fail(r + 1, std::string(kColumnNames[c]) + " is text, not a number");
}

}  // namespace

CoilSet read_coil_set(const Arg& table) {
    if (table.form == Arg::Form::Missing) throw DomainError("the coil set is required");
    if (table.cols < kRequired || table.cols > kMost)
        throw DomainError("the coil set needs 12 to 15 columns (shape, centre x, y, z, axis x, y, z, radius or width, "
                          "height, roll, turns, current, [circuit, winding depth, winding width]); this range has " +
                          std::to_string(table.cols));
    std::vector<SetCoil> coils;
    std::vector<std::size_t> labels;
    for (std::size_t r = 0; r < table.rows; ++r) {
        bool blank = true;
        for (std::size_t c = 0; c < table.cols; ++c) blank = blank && table.at(r, c).kind == CellKind::Empty;
        if (blank) continue;
        const Cell& shape = table.at(r, 0);
        if (shape.kind != CellKind::Text) fail(r + 1, "shape must be the text circle or rect");
        const std::string s = lower_trimmed(shape.text);
        SetCoil coil;
        if (s == "circle") coil.shape = SetShape::Circle;
        else if (s == "rect") coil.shape = SetShape::Rect;
        else fail(r + 1, "shape \"" + shape.text + "\" is not circle or rect");
        const bool circle = coil.shape == SetShape::Circle;
        coil.centre = {number_at(table, r, 1, false, 0), number_at(table, r, 2, false, 0), number_at(table, r, 3, false, 0)};
        coil.axis = {number_at(table, r, 4, false, 0), number_at(table, r, 5, false, 0), number_at(table, r, 6, false, 0)};
        coil.size = number_at(table, r, 7, false, 0);
        coil.height = number_at(table, r, 8, circle, 0.0);
        coil.roll_deg = number_at(table, r, 9, true, 0.0);
        coil.turns = number_at(table, r, 10, false, 0);
        coil.current = number_at(table, r, 11, false, 0);
        if (table.cols > 12 && table.at(r, 12).kind != CellKind::Empty) coil.circuit = number_at(table, r, 12, false, 0);
        coil.depth = number_at(table, r, 13, true, 0.0);
        coil.breadth = number_at(table, r, 14, true, 0.0);
        coils.push_back(coil);
        labels.push_back(r + 1);
    }
    return CoilSet(std::move(coils), std::move(labels));
}

CallResult coil_set_result(const std::vector<SetCoil>& coils) {
    CallResult out;
    out.rows = coils.size();
    out.cols = 13;
    out.is_array = true;
    for (const SetCoil& c : coils) {
        out.texts.push_back(c.shape == SetShape::Circle ? "circle" : "rect");
        out.texts.resize(out.values.size() + 13);
        for (double v : {0.0, c.centre.x(), c.centre.y(), c.centre.z(), c.axis.x(), c.axis.y(), c.axis.z(), c.size,
                         c.height, c.roll_deg, c.turns, c.current, c.circuit.value_or(0.0)})
            out.values.push_back(v);
    }
    out.errors.assign(out.values.size(), CellError::None);
    return out;
}

}  // namespace coilwright::sheet
