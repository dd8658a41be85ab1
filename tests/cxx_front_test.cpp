// The C++ front: mixed argument types promoted as Boost.Math promotes (compile-time checks of
// the return types, run-time checks that a mixed call equals the same call in one type), the
// struct-result convention (status member st, ok(), usable()) and status_message(status).
#include <gtest/gtest.h>

#include <boost/math/tools/promotion.hpp>
#include <boost/multiprecision/cpp_bin_float.hpp>
#include <cstring>
#include <type_traits>
#include <utility>

#include "pumploss.h"
#include "pumploss/pumploss.hpp"
#include "test_support.hpp"

using pltest::mp50;
using pumploss::result;
using pumploss::status;
using D2 = pumploss::dual<double, 2>;

namespace {

// ---- promotion rules, compared with Boost.Math's own promote_args for the built-in types ----
template <class... A>
constexpr bool same_as_boost() {
  return std::is_same_v<pumploss::promote_args_t<A...>, typename boost::math::tools::promote_args<A...>::type>;
}
static_assert(same_as_boost<int, double>());
static_assert(same_as_boost<int, float>());  // double, as Boost: integers count as double
static_assert(same_as_boost<float, double>());
static_assert(same_as_boost<float, float>());
static_assert(same_as_boost<long double, int, float>());
static_assert(same_as_boost<unsigned, long, double>());
static_assert(same_as_boost<int>());
static_assert(std::is_same_v<pumploss::promote_args_t<mp50, int, double>, mp50>);   // a multiprecision type wins
static_assert(std::is_same_v<pumploss::promote_args_t<long double, mp50>, mp50>);
static_assert(std::is_same_v<pumploss::promote_args_t<int, D2, long double>, D2>);  // a dual number wins
static_assert(std::is_void_v<pumploss::promote_args_t<D2, mp50>>);                  // two non-built-ins do not mix

// ---- return types of mixed calls ----
static_assert(std::is_same_v<decltype(pumploss::gap_plates_flow(1e5, 0.04, 0.01, 10e-6, 0.02, 0)), result<double>>);
static_assert(std::is_same_v<decltype(pumploss::orifice_flow(100e5, 870, 1e-3, 0.61)), result<double>>);
static_assert(std::is_same_v<decltype(pumploss::orifice_flow(1e7f, 870, 1e-3f, 0.61f)), result<double>>);
static_assert(std::is_same_v<decltype(pumploss::orifice_flow(1e7f, 870.0f, 1e-3f, 0.61f)), result<float>>);
static_assert(std::is_same_v<decltype(pumploss::orifice_flow(1e7, 870, 1e-3, 0.61L)), result<long double>>);
static_assert(std::is_same_v<decltype(pumploss::gap_annulus_flow(mp50(1e7), 0.04, 0.02001, 0.02, 0.03, 0)),
                             result<mp50>>);
static_assert(std::is_same_v<decltype(pumploss::gap_annulus_flow(D2(1e7), 0.04, 0.02001, 0.02, 0.03, 0)),
                             result<D2>>);
static_assert(std::is_same_v<decltype(pumploss::friction_colebrook(1e5, 0)), result<double>>);
static_assert(std::is_same_v<decltype(pumploss::throttle_temperature_rise(10e5, 880, 2030)), result<double>>);
// integers only: promoted to double as Boost.Math promotes (not computed in int)
static_assert(std::is_same_v<decltype(pumploss::friction_colebrook(100000, 0)), result<double>>);
static_assert(std::is_same_v<decltype(pumploss::throttle_temperature_rise(1000000, 880, 2030)), result<double>>);
static_assert(std::is_same_v<decltype(pumploss::orifice_flow(10000000, 870, 1, 1)), result<double>>);
static_assert(std::is_same_v<decltype(pumploss::gap_plates_flow(100000L, 1, 1, 1, 1, 0)), result<double>>);
static_assert(std::is_same_v<decltype(pumploss::line_pipe(1, 6, 0)), pumploss::line_element<double>>);
static_assert(std::is_same_v<decltype(pumploss::drain_flow_parts(0, 1, 323)), pumploss::drain_flow<double>>);
static_assert(std::is_same_v<decltype(pumploss::shaft_seal_check(0, 4, 1, 3u)), pumploss::shaft_seal_result<double>>);

// A dual number beside a multiprecision number: no overload (detected, not a hard error).
template <class... A>
auto annulus_callable(int) -> decltype(pumploss::gap_annulus_flow(std::declval<A>()...), std::true_type{});
template <class...>
std::false_type annulus_callable(...);
static_assert(decltype(annulus_callable<double, double, double, double, double, int>(0))::value);
static_assert(!decltype(annulus_callable<D2, mp50, double, double, double, double>(0))::value);
static_assert(!decltype(annulus_callable<bool, double, double, double, double, double>(0))::value);

// ---- the struct-result convention ----
template <class R, class = void>
struct follows_convention : std::false_type {};
template <class R>
struct follows_convention<R, std::void_t<decltype(std::declval<const R&>().st), decltype(std::declval<const R&>().ok()),
                                          decltype(std::declval<const R&>().usable())>>
    : std::bool_constant<std::is_same_v<std::decay_t<decltype(std::declval<const R&>().st)>, status> &&
                         std::is_same_v<decltype(std::declval<const R&>().usable()), bool> &&
                         std::is_same_v<decltype(std::declval<const R&>().ok()), bool>> {};

template <class... R>
constexpr bool all_follow() {
  return (follows_convention<R>::value && ...);
}
static_assert(all_follow<result<double>, result<mp50>, pumploss::pipe_flow<double>, pumploss::pad_state<double>,
                         pumploss::health_assessment<double>, pumploss::health_trend<double>, pumploss::leakage_power_law<double>,
                         pumploss::leakage_split_result<double>, pumploss::piston_pump_check<double>,
                         pumploss::leakage_budget<double>, pumploss::budget_sensitivity<double>,
                         pumploss::pump_calibration, pumploss::loss_model<double>, pumploss::loss_prediction<double>,
                         pumploss::efficiency_point<double>, pumploss::displacement_result<double>,
                         pumploss::efficiency_uncertainty<double>, pumploss::line_drop<double>,
                         pumploss::drain_point<double>, pumploss::drain_summary<double>,
                         pumploss::drain_sizing<double>, pumploss::drain_fixed_element<double>,
                         pumploss::health_constant_fit<double>,
                         pumploss::health_plausibility<double>,
                         pumploss::clearance_budget<double>, pumploss::clearance_sensitivity<double>,
                         pumploss::flow_test_result<double>, pumploss::motor_drain_result<double>,
                         pumploss::motor_creep_result<double>, pumploss::inlet_point<double>,
                         pumploss::shaft_seal_result<double>, pumploss::swash_kinematics<double>,
                         pumploss::pump_balance<double>, pumploss::pump_flow_loss<double>,
                         pumploss::budget_uncertainty<double>>());

}  // namespace

TEST(MixedArguments, IntLiteralBesideDoublesEqualsAllDoubleCall) {
  const auto mixed = pumploss::gap_plates_flow(1e5, 0.04, 0.01, 10e-6, 0.02, 0);
  const auto same = pumploss::gap_plates_flow(1e5, 0.04, 0.01, 10e-6, 0.02, 0.0);
  ASSERT_EQ(mixed.st, status::ok);
  EXPECT_EQ(mixed.value, same.value);
  const auto annulus = pumploss::gap_annulus_flow(250e5, 0.040, 0.02002, 0.02, 0.030, 0);
  EXPECT_EQ(annulus.value, pumploss::gap_annulus_flow(250e5, 0.040, 0.02002, 0.02, 0.030, 0.0).value);
  EXPECT_EQ(pumploss::friction_colebrook(100000, 1e-4).value, pumploss::friction_colebrook(1e5, 1e-4).value);
}

TEST(MixedArguments, IntegersOnlyEvaluateInDouble) {
  // Boost.Math's rule: f(1, 2) runs as f(1.0, 2.0); in int the drop would truncate to 0
  EXPECT_EQ(pumploss::friction_colebrook(100000, 0).value, pumploss::friction_colebrook(1e5, 0.0).value);
  const auto rise = pumploss::throttle_temperature_rise(1000000, 880, 2030);  // 10 bar: 0.56 K
  EXPECT_EQ(rise.value, pumploss::throttle_temperature_rise(1e6, 880.0, 2030.0).value);
  EXPECT_GT(rise.value, 0.5);
  EXPECT_LT(rise.value, 0.6);
  const auto q = pumploss::orifice_flow(10000000, 870, 1, 1);
  EXPECT_EQ(q.value, pumploss::orifice_flow(1e7, 870.0, 1.0, 1.0).value);
  const auto pipe = pumploss::line_pipe(1, 6, 0);
  EXPECT_EQ(pipe.length_m, 6.0);
  EXPECT_EQ(pumploss::drain_flow_parts(0, 1, 323).laminar_ref_m3_s, pumploss::drain_flow_parts(0.0, 1.0, 323.0).laminar_ref_m3_s);
}

TEST(MixedArguments, HeadersMergedLaterPromoteToo) {
  // drain_check.hpp, inlet.hpp, motor.hpp: an int literal beside doubles is the all-double call
  const auto f = pumploss::drain_flow_parts(0, 3.7e-3 / 60, 323.15);
  EXPECT_EQ(f.laminar_ref_m3_s, pumploss::drain_flow_parts(0.0, 3.7e-3 / 60, 323.15).laminar_ref_m3_s);
  EXPECT_EQ(f.constant_m3_s, 0.0);
  const auto seal = pumploss::shaft_seal_check(0.5e5, 4e5, 1e5, 300000);  // 3 bar peak rating, 4 bar peak: fails
  const auto seal_d = pumploss::shaft_seal_check(0.5e5, 4e5, 1e5, 3e5);
  ASSERT_TRUE(seal.ok());
  EXPECT_EQ(seal.margin_peak_pa, seal_d.margin_peak_pa);
  EXPECT_FALSE(seal.pass_peak);
  const auto creep = pumploss::motor_creep(100e-6, 500, 0.9, 1e-6, 100e5, 0.03, 0.03, 0);
  const auto creep_d = pumploss::motor_creep(100e-6, 500.0, 0.9, 1e-6, 100e5, 0.03, 0.03, 0.0);
  ASSERT_TRUE(creep.usable());
  EXPECT_EQ(creep.creep_speed_rev_s, creep_d.creep_speed_rev_s);
  EXPECT_EQ(creep.holding_pressure_pa, creep_d.holding_pressure_pa);
}

TEST(MixedArguments, FloatBesideIntComputesInDouble) {
  // Boost.Math's rule: the int counts as double, so the call runs in double, not float.
  const auto r = pumploss::orifice_flow(1e7f, 870, 1e-3f, 0.61f);
  EXPECT_EQ(r.value, pumploss::orifice_flow(double(1e7f), 870.0, double(1e-3f), double(0.61f)).value);
}

TEST(MixedArguments, LongDoubleWins) {
  const auto r = pumploss::orifice_flow(1e7, 870, 1e-3, 0.61L);
  EXPECT_EQ(r.value, pumploss::orifice_flow(1e7L, 870.0L, static_cast<long double>(1e-3), 0.61L).value);
}

TEST(MixedArguments, MultiprecisionWinsAndKeepsItsDigits) {
  // 0.61 as an mp50 literal beside doubles: the result is the mp50 evaluation.
  const mp50 cd("0.61");
  const auto r = pumploss::orifice_flow(1e7, 870, 1e-3, cd);
  const auto ref = pumploss::orifice_flow(mp50(1e7), mp50(870), mp50(1e-3), cd);
  EXPECT_EQ(r.value, ref.value);
  EXPECT_NE(pltest::to_double(r.value - pumploss::orifice_flow(1e7, 870.0, 1e-3, 0.61).value), 0.0);
}

TEST(MixedArguments, DualWinsAndCarriesDerivatives) {
  const D2 dp = D2::variable(1e7, 0);
  const auto r = pumploss::orifice_flow(dp, 870, 1e-3, 0.61);
  ASSERT_EQ(r.st, status::ok);
  // q ~ sqrt(dp): dq/ddp = q / (2 dp)
  EXPECT_NEAR(r.value.d[0], r.value.val / (2 * 1e7), 1e-15 * r.value.val / 1e7);
  EXPECT_EQ(r.value.d[1], 0.0);
}

TEST(StatusMessage, EnumOverloadMatchesTheCApiSentence) {
  for (int c : {0, 1, 2, 3, 4, 11, 12, 100, 104, 105}) {
    const char* cxx = pumploss::status_message(static_cast<status>(c));
    ASSERT_NE(cxx, nullptr);
    EXPECT_STREQ(cxx, pumploss_status_message(c));
    EXPECT_GT(std::strlen(cxx), 5u);
  }
  EXPECT_STREQ(pumploss::status_message(status::no_convergence), pumploss::status_message(4));
}

TEST(ResultConvention, OkAndUsableFollowTheStatus) {
  const auto regime = pumploss::gap_plates_flow(1e5, 0.04, 0.01, 10e-6, 0.02, 0.0);
  EXPECT_TRUE(regime.ok());
  pumploss::pipe_flow<double> p{};
  p.st = status::regime;
  EXPECT_FALSE(p.ok());
  EXPECT_TRUE(p.usable());
  p.st = status::domain;
  EXPECT_FALSE(p.usable());
}
