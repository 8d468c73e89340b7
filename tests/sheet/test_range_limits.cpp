// What a range may bring into a call, decided from its shape before any cell is copied.
#include <gtest/gtest.h>

#include <cstddef>
#include <limits>

#include "coilwright/errors.hpp"
#include "core/catalogue.hpp"
#include "core/evaluate.hpp"
#include "core/range_limits.hpp"

using namespace coilwright;
using namespace coilwright::sheet;

namespace {
const ArgSpec kTable{"coils", ArgKind::Table, false, 0.0, nullptr, 0, false, nullptr, 6, 6};
const ArgSpec kSet{"set", ArgKind::Table, false, 0.0, nullptr, 0, false, nullptr, 12, 15};
const ArgSpec kNumber{"z", ArgKind::Number, false, 0.0};
}  // namespace

TEST(RangeLimits, ATableOfTheWrongWidthIsPassedOnByItsWidthAlone) {
    EXPECT_EQ(plan_range(kTable, 1'048'576, 1024), RangePlan::WidthOnly);  // a whole sheet
    EXPECT_EQ(plan_range(kTable, 0, 5), RangePlan::WidthOnly);
    EXPECT_EQ(plan_range(kTable, 2, 6), RangePlan::Read);
    // A coil set has 12 to 15 columns (the last three optional).
    EXPECT_EQ(plan_range(kSet, 2, 11), RangePlan::WidthOnly);
    EXPECT_EQ(plan_range(kSet, 2, 12), RangePlan::Read);
    EXPECT_EQ(plan_range(kSet, 2, 15), RangePlan::Read);
    EXPECT_EQ(plan_range(kSet, 2, 16), RangePlan::WidthOnly);
}

TEST(RangeLimits, ATableLongerThanTheLimitIsRefused) {
    EXPECT_EQ(plan_range(kTable, kMaxTableRows, 6), RangePlan::Read);
    EXPECT_THROW(plan_range(kTable, kMaxTableRows + 1, 6), DomainError);
    try {
        plan_range(kTable, 1'048'576, 6);
        FAIL();
    } catch (const DomainError& e) {
        EXPECT_NE(std::string(e.what()).find("1048576 rows"), std::string::npos) << e.what();
    }
}

TEST(RangeLimits, ANumberRangeWithMoreCellsThanAResultMayHaveIsRefused) {
    EXPECT_EQ(plan_range(kNumber, 1'048'576, 1), RangePlan::Read);  // a whole column
    EXPECT_EQ(plan_range(kNumber, kMaxResultCells, 1), RangePlan::Read);
    EXPECT_THROW(plan_range(kNumber, kMaxResultCells + 1, 1), DomainError);
    EXPECT_THROW(plan_range(kNumber, 1'048'576, 1024), DomainError);  // a whole sheet
    // No overflow of rows x cols.
    const std::size_t huge = std::numeric_limits<std::size_t>::max() / 2;
    EXPECT_THROW(plan_range(kNumber, huge, 4), DomainError);
    EXPECT_EQ(plan_range(kNumber, 0, 0), RangePlan::Read);
}

TEST(RangeLimits, SeveralSheetsAreRefusedByName) {
    try {
        refuse_several_sheets(kTable);
        FAIL();
    } catch (const DomainError& e) {
        EXPECT_NE(std::string(e.what()).find("coils spans several sheets"), std::string::npos) << e.what();
    }
}
