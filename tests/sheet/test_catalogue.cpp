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

// The binding table is generated in catalogue order, and an implementation of a name the
// catalogue lacks does not compile: each entry must carry its own function's name.
TEST(Catalogue, TheBindingTableFollowsTheCatalogue) {
    const auto specs = function_specs();
    for (std::size_t i = 0; i < specs.size(); ++i)
        EXPECT_STREQ(implementations()[i].name, specs[i].name) << "entry " << i;
}
