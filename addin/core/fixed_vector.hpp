// A vector with a fixed capacity that lives on the stack: per-call bookkeeping of a cell
// function without touching the heap (a sheet may call a function hundreds of thousands of
// times in one recalculation).
#pragma once

#include <cstddef>
#include <new>
#include <stdexcept>
#include <utility>

namespace coilwright::sheet {

template <class T, std::size_t Capacity>
class FixedVector {
public:
    FixedVector() = default;
    FixedVector(const FixedVector&) = delete;
    FixedVector& operator=(const FixedVector&) = delete;
    ~FixedVector() {
        for (std::size_t i = 0; i < size_; ++i) data()[i].~T();
    }

    void push_back(T value) {
        if (size_ == Capacity) throw std::length_error("too many arguments");
        new (storage_ + size_ * sizeof(T)) T(std::move(value));
        ++size_;
    }
    T* data() { return std::launder(reinterpret_cast<T*>(storage_)); }
    const T* data() const { return std::launder(reinterpret_cast<const T*>(storage_)); }
    std::size_t size() const { return size_; }
    T& operator[](std::size_t i) { return data()[i]; }
    const T& operator[](std::size_t i) const { return data()[i]; }
    T& back() { return data()[size_ - 1]; }

private:
    alignas(T) unsigned char storage_[Capacity * sizeof(T)];
    std::size_t size_ = 0;
};

}  // namespace coilwright::sheet
