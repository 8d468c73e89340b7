// Reads the committed reference tables in tests/reference/ (CSV with '#' comment lines).
#pragma once

#include <fstream>
#include <sstream>
#include <stdexcept>
#include <string>
#include <vector>

namespace coilwright::reference {

struct CsvRow {
    std::vector<std::string> cells;
    double num(std::size_t i) const { return std::stod(cells.at(i)); }
};

inline std::vector<CsvRow> read_reference(const std::string& name) {
    const std::string path = std::string(COILWRIGHT_REFERENCE_DIR) + "/" + name;
    std::ifstream in(path);
    if (!in) throw std::runtime_error("cannot open " + path);
    std::vector<CsvRow> rows;
    std::string line;
    bool header = true;
    while (std::getline(in, line)) {
        if (line.empty() || line[0] == '#') continue;
        if (header) {
            header = false;
            continue;
        }
        CsvRow row;
        std::stringstream ss(line);
        std::string cell;
        while (std::getline(ss, cell, ',')) row.cells.push_back(cell);
        rows.push_back(row);
    }
    return rows;
}

}  // namespace coilwright::reference
