#include "registry.hpp"

namespace coilwright::sheet {

namespace {
// kImplementers: implement<fn::NAME> for every catalogue function, in catalogue order.
#include "binding_table.inc"
}  // namespace

const std::vector<Implementation>& implementations() {
    // Built once, read-only afterwards (thread-safe static initialisation).
    static const std::vector<Implementation> ordered = [] {
        std::vector<Implementation> out;
        out.reserve(std::size(kImplementers));
        for (ImplementFn implement_one : kImplementers) out.push_back(implement_one());
        return out;
    }();
    return ordered;
}

}  // namespace coilwright::sheet
