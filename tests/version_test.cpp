// The version is written once (version.hpp); the C header, the library and CMake must agree.
#include <gtest/gtest.h>

#include <set>
#include <stdexcept>
#include <string>

#include "pumploss.h"
#include "pumploss/status.hpp"
#include "pumploss/version.hpp"

TEST(Version, HeaderLibraryAndCMakeAgree) {
  EXPECT_STREQ(pumploss_version(), PUMPLOSS_CMAKE_VERSION);
  EXPECT_STREQ(pumploss_version(), pumploss::version_string);
  EXPECT_EQ(pumploss_version_number(), PUMPLOSS_VERSION_NUMBER);
  const std::string expect = std::to_string(PUMPLOSS_VERSION_MAJOR) + "." + std::to_string(PUMPLOSS_VERSION_MINOR) +
                             "." + std::to_string(PUMPLOSS_VERSION_PATCH);
  EXPECT_EQ(expect, pumploss_version());
}

TEST(Status, EveryCodeHasItsOwnSentence) {
  const int codes[] = {PUMPLOSS_OK, PUMPLOSS_EDOMAIN, PUMPLOSS_ENONFINITE, PUMPLOSS_EOVERFLOW,
                       PUMPLOSS_ENOCONVERGE, PUMPLOSS_EMISUSE, PUMPLOSS_EUNIT, PUMPLOSS_EDIMENSION,
                       PUMPLOSS_EBUFFER, PUMPLOSS_ENOMEM, PUMPLOSS_EINTERNAL, PUMPLOSS_EVALIDITY,
                       PUMPLOSS_EDATA, PUMPLOSS_WREGIME, PUMPLOSS_WTRANSITION, PUMPLOSS_WILLCONDITIONED,
                       PUMPLOSS_WEXTRAPOLATED, PUMPLOSS_EPARTIAL, PUMPLOSS_WIMPLAUSIBLE,
                       PUMPLOSS_WUNDEFINED, PUMPLOSS_WPARTIAL, PUMPLOSS_WOUTLIER};
  const std::string unknown = pumploss_status_message(-1);
  EXPECT_EQ(unknown, pumploss_status_message(99));
  EXPECT_EQ(unknown, pumploss_status_message(1 << 30));
  std::set<std::string> seen;
  for (int c : codes) {
    const std::string m = pumploss_status_message(c);
    EXPECT_NE(m, unknown) << c;
    EXPECT_TRUE(seen.insert(m).second) << "duplicate sentence for " << c;
    EXPECT_EQ(m.back(), '.') << c;
    EXPECT_EQ(pumploss::is_error(static_cast<pumploss::status>(c)), c > 0 && c < 100);
    EXPECT_EQ(PUMPLOSS_IS_ERROR(c), c > 0 && c < 100) << c;
    EXPECT_EQ(PUMPLOSS_IS_REPORT(c), c >= 100) << c;
    EXPECT_FALSE(PUMPLOSS_IS_ERROR(c) && PUMPLOSS_IS_REPORT(c)) << c;
  }
  EXPECT_FALSE(PUMPLOSS_IS_ERROR(PUMPLOSS_OK) || PUMPLOSS_IS_REPORT(PUMPLOSS_OK));
  // A batch with a failed element is an error: a caller testing the summary alone never uses a NaN.
  EXPECT_TRUE(PUMPLOSS_IS_ERROR(PUMPLOSS_EPARTIAL));
}

TEST(Status, WorstAndResult) {
  using pumploss::status;
  EXPECT_EQ(pumploss::worst(status::ok, status::regime), status::regime);
  EXPECT_EQ(pumploss::worst(status::regime, status::domain), status::domain);
  EXPECT_EQ(pumploss::worst(status::nonfinite, status::domain), status::nonfinite);
  EXPECT_EQ(pumploss::worst(status::transition, status::regime), status::transition);
  pumploss::result<double> r{1.0, status::regime};
  EXPECT_TRUE(r.usable());
  EXPECT_FALSE(r.ok());
  EXPECT_EQ(r.value_or_throw(), 1.0);
  pumploss::result<double> e{0.0, status::domain};
  EXPECT_THROW(e.value_or_throw(), std::domain_error);
}
