// Turns the fuzzer's bytes into the values the harnesses need. Numbers come half from raw bits
// (any double: NaN, inf, subnormal, negative zero) and half from a list of edge values and
// values close to an earlier one, so that points on and near a filament are reached quickly.
#pragma once

#include <cstddef>
#include <cstdint>
#include <cstring>
#include <limits>
#include <string>

namespace coilwright::fuzz {

class FuzzInput {
public:
    FuzzInput(const std::uint8_t* data, std::size_t size) : data_(data), size_(size) {}

    bool empty() const { return pos_ >= size_; }

    std::uint8_t byte() { return pos_ < size_ ? data_[pos_++] : 0; }

    // A whole number in [0, n).
    std::size_t below(std::size_t n) { return n == 0 ? 0 : byte() % n; }

    double number() {
        const std::uint8_t mode = byte();
        double v;
        if (mode < 96) {
            std::uint64_t bits = 0;
            for (int i = 0; i < 8; ++i) bits = (bits << 8) | byte();
            std::memcpy(&v, &bits, sizeof v);
        } else if (mode < 192) {
            v = kEdges[mode % std::size(kEdges)];
        } else {
            // Close to an earlier value: a few ulps to a few per cent away, either side.
            const double steps[] = {0.0, 1e-16, -1e-16, 1e-12, -1e-9, 1e-6, -1e-3, 0.03};
            v = last_ * (1.0 + steps[mode % std::size(steps)]);
        }
        last_ = v;
        return v;
    }

    std::string text() {
        const std::size_t n = below(12);
        std::string s;
        for (std::size_t i = 0; i < n; ++i) s.push_back(static_cast<char>(byte()));
        return s;
    }

private:
    static constexpr double kEdges[] = {
        0.0, -0.0, 1.0, -1.0, 0.1, 0.5, 2.0, 10.0, 0.05, 0.02, 1e-3, 1e3, 1e-300, 1e300, 1e-310, 1e308,
        std::numeric_limits<double>::min(), std::numeric_limits<double>::max(),
        std::numeric_limits<double>::denorm_min(), std::numeric_limits<double>::epsilon(),
        std::numeric_limits<double>::infinity(), -std::numeric_limits<double>::infinity(),
        std::numeric_limits<double>::quiet_NaN(), 1.0 - 1e-16, 1.0 + 2.2e-16, 4.0, 56.0, -3.0, 1e6, 1e-6,
    };
    const std::uint8_t* data_;
    std::size_t size_;
    std::size_t pos_ = 0;
    double last_ = 0.1;
};

}  // namespace coilwright::fuzz
