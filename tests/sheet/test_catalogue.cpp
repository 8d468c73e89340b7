// Every catalogue entry has an implementation, and the glue's limits hold for all of them.
#include <gtest/gtest.h>

#include "core/catalogue.hpp"
#include "core/registry.hpp"

using namespace coilwright::sheet;

TEST(Catalogue, EveryFunctionIsImplemented) {
    const auto specs = function_specs();
    ASSERT_EQ(implementations().size(), specs.size());
    for (std::size_t i = 0; i < specs.size(); ++i) {
        EXPECT_TRUE(static_cast<bool>(implementations()[i].prepare)) << specs[i].name;
        EXPECT_LE(specs[i].arg_count, 16u) << specs[i].name;  // addin/uno/component.cpp converts at most 16
    }
}

TEST(Catalogue, NoImplementationIsOrphaned) {
    for (auto& impl : contributed_implementations()) EXPECT_GE(function_index(impl.name), 0) << impl.name;
}
