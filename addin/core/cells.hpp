// Spreadsheet values as the add-in receives them, without any UNO type: what Calc passes
// for one argument (omitted, one value, or a whole range) and what a call gives back.
#pragma once

#include <cstddef>
#include <cstdint>
#include <string>
#include <vector>

namespace coilwright::sheet {

enum class CellKind : std::uint8_t { Number, Text, Empty };

struct Cell {
    CellKind kind = CellKind::Empty;
    double number = 0.0;
    std::string text;  // UTF-8, only for Text

    static Cell of(double v) { return {CellKind::Number, v, {}}; }
    static Cell of_text(std::string s) { return {CellKind::Text, 0.0, std::move(s)}; }
};

// One argument of a call: omitted, a single value, or a range / inline array (row-major).
struct Arg {
    enum class Form : std::uint8_t { Missing, Scalar, Array };
    Form form = Form::Missing;
    std::size_t rows = 0, cols = 0;
    std::vector<Cell> cells;  // rows*cols cells for Array (empty otherwise)
    Cell value;               // the value of a Scalar, kept out of `cells`: no allocation per cell call

    static Arg missing() { return {}; }
    static Arg scalar(Cell c) {
        Arg a;
        a.form = Form::Scalar;
        a.rows = a.cols = 1;
        a.value = std::move(c);
        return a;
    }
    static Arg number(double v) { return scalar(Cell::of(v)); }
    static Arg array(std::size_t rows, std::size_t cols, std::vector<Cell> cells) {
        Arg a;
        a.form = Form::Array;
        a.rows = rows;
        a.cols = cols;
        a.cells = std::move(cells);
        return a;
    }
    // The cell at row r, column c of an Array; the value of a Scalar (any r, c).
    const Cell& at(std::size_t r, std::size_t c) const { return form == Form::Array ? cells[r * cols + c] : value; }
};

// Spreadsheet error codes as Calc numbers them (shown as Err:502, Err:523, #VALUE!).
enum class CellError : std::uint16_t {
    None = 0,
    IllegalArgument = 502,
    NoConvergence = 523,
    NoValue = 519,
};

struct CallResult {
    // Whole-call failure: the cell (or every cell of the array formula) shows this error.
    CellError error = CellError::None;
    std::string message;

    bool is_text = false;            // true: one text value in `text` (functions returning text)
    std::string text;                // UTF-8
    bool is_array = false;           // false: one value in values[0]
    std::size_t rows = 1, cols = 1;
    std::vector<double> values;      // row-major
    std::vector<CellError> errors;   // per element, same size as values (None where valid)
    // Arrays only, optional: per element, a non-empty text makes that cell text (a coil-set
    // table's shape column); empty, or shorter than values, for all-number results.
    std::vector<std::string> texts;

    static CallResult failure(CellError e, std::string msg) {
        CallResult r;
        r.error = e;
        r.message = std::move(msg);
        return r;
    }
};

}  // namespace coilwright::sheet
