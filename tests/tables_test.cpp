// The small compiled tables that the subject tests reach only in part (found by the coverage
// report): every health reason has its own sentence, the unit table can be walked by index and
// each entry is found again by its symbol, and every dimension's SI symbol is a unit of factor 1.
#include <gtest/gtest.h>

#include <cstring>
#include <set>
#include <string>

#include "pumploss/health.hpp"
#include "pumploss/units.hpp"

namespace {

TEST(HealthReasonText, EveryReasonHasItsOwnSentenceAndUnknownBitsSaySo) {
  std::set<std::string> seen;
  const std::string unknown = pumploss::health_reason_text(1u << 20);
  EXPECT_NE(unknown.find("Unknown"), std::string::npos);
  for (unsigned bit = 0; bit < 10; ++bit) {
    const std::string s = pumploss::health_reason_text(1u << bit);
    EXPECT_NE(s, unknown) << "bit " << bit;
    EXPECT_GT(s.size(), 20u) << "bit " << bit;
    EXPECT_EQ(s.back(), '.') << "bit " << bit;
    EXPECT_TRUE(seen.insert(s).second) << "bit " << bit << " repeats another reason's sentence: " << s;
  }
  EXPECT_EQ(std::string(pumploss::health_reason_text(0u)), unknown);
  // a combination of bits is not one reason
  EXPECT_EQ(std::string(pumploss::health_reason_text(pumploss::reason_fraction_worn | pumploss::reason_drain_hot)),
            unknown);
}

TEST(UnitTable, WalkedByIndexEveryEntryIsFoundByItsSymbol) {
  const int n = pumploss::unit_count();
  ASSERT_GT(n, 40);
  std::set<std::string> symbols;
  for (int i = 0; i < n; ++i) {
    const pumploss::unit_info* u = pumploss::unit_at(i);
    ASSERT_NE(u, nullptr) << i;
    EXPECT_EQ(pumploss::find_unit(u->symbol), u) << u->symbol;
    EXPECT_TRUE(symbols.insert(u->symbol).second) << "symbol " << u->symbol << " twice";
    EXPECT_GT(u->factor, 0.0) << u->symbol;
    EXPECT_GT(std::strlen(u->name), 0u) << u->symbol;
  }
  EXPECT_EQ(pumploss::unit_at(-1), nullptr);
  EXPECT_EQ(pumploss::unit_at(n), nullptr);
}

TEST(UnitTable, EachDimensionsSiSymbolIsAUnitOfFactorOne) {
  for (int d = 0; d <= static_cast<int>(pumploss::dimension::force); ++d) {
    const auto dim = static_cast<pumploss::dimension>(d);
    const char* si = pumploss::si_symbol(dim);
    const pumploss::unit_info* u = pumploss::find_unit(si);
    ASSERT_NE(u, nullptr) << "dimension " << d << " SI symbol " << si;
    EXPECT_EQ(u->dim, dim) << si;
    EXPECT_EQ(u->factor, 1.0) << si;
    EXPECT_EQ(u->offset, 0.0) << si;
  }
  EXPECT_STREQ(pumploss::si_symbol(static_cast<pumploss::dimension>(99)), "?");
  EXPECT_STREQ(pumploss::si_symbol(static_cast<pumploss::dimension>(-1)), "?");
}

}  // namespace
