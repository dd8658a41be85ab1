/// @file health.hpp
/// @brief Health verdict of a pump from field readings of its case drain flow.
///
/// A maintenance engineer reads the case drain flow (with outlet pressure, oil temperature and
/// speed) and must say whether the pump is healthy. No geometry is needed: a short description
/// of the pump (maximum displacement, rated speed, controller consumption, baseline and its
/// conditions; health_reference) gives the verdict. Three indicators, each with its reason:
/// 1. the drain fraction, normalised drain flow over the maximum displacement flow at the
///    reference speed, against configurable bands;
/// 2. the growth of the normalised drain flow over the pump's own baseline (new-pump reading);
/// 3. the drain oil's temperature rise over the inlet, against the pump's own baseline rise at
///    the reference state (or, without one, against the rise of oil throttled outlet to case).
///
/// One normalisation model (health_normalise()): drain = constant part (controller consumption)
/// + laminar part scaled by dp/mu (dynamic viscosity at the gap temperature) + an optional
/// orifice part scaled by sqrt(dp). Every reading is checked for plausibility first
/// (health_check_reading()); a refused reading is never scored. Step changes in a series of
/// normalised readings are found by the tabular CUSUM (health_cusum); trends are fitted after the
/// last step (fit_health_trend(), health_projection()).
///
/// Default bands are common practice of the trade, no source: at maximum pressure a
/// high-quality piston pump drains about 5 % of its maximum displacement flow, very large pumps
/// up to about 10 %, small, poorly made or worn pumps 15 % or more. Every band is configurable.
/// Verdicts are engineering estimates; the pump maker's data govern. A "sound" verdict is not a
/// clearance to run: never block, cap or valve a case drain line (a blocked drain over-pressurises
/// the case and blows the shaft seal); see docs/pages/theory_pump.md.
#ifndef PUMPLOSS_HEALTH_HPP
#define PUMPLOSS_HEALTH_HPP

#include <algorithm>
#include <cmath>
#include <cstddef>
#include <limits>

#include "export.hpp"
#include "fluid.hpp"
#include "leakage.hpp"
#include "scalar_traits.hpp"
#include "status.hpp"

namespace pumploss {

/// Drain fraction: case drain flow over the maximum displacement flow.
///
/// \f[ \phi = \frac{q_{V3}}{V_{max}\, n} \f]
///
/// For a health verdict pass the normalised drain flow and the REFERENCE speed (as
/// assess_health() does), so that the fraction does not change with the speed of the reading.
///
/// @param drain_flow_m3_s measured case drain flow q_V3, m^3/s, >= 0
/// @param max_displacement_m3_rev maximum (geometric) displacement V_max, m^3/rev, > 0
/// @param speed_rev_s shaft speed n, rev/s, > 0
/// @return the fraction (dimensionless, 0.05 = 5 %); status::domain for a negative flow or a
///         non-positive displacement or speed; status::implausible when the fraction exceeds 1.
/// @par Source
/// Definition; the bands it is compared with are common practice (see health.hpp).
template <class T, detail::if_real<T> = 0>
inline result<T> drain_fraction(T drain_flow_m3_s, T max_displacement_m3_rev, T speed_rev_s) {
  if (!detail::all_finite(drain_flow_m3_s, max_displacement_m3_rev, speed_rev_s))
    return detail::fail<T>(status::nonfinite);
  if (!(drain_flow_m3_s >= T(0)) || !(max_displacement_m3_rev > T(0)) || !(speed_rev_s > T(0)))
    return detail::fail<T>(status::domain);
  const T den = max_displacement_m3_rev * speed_rev_s;
  const T f = drain_flow_m3_s / den;
  if (!detail::finite(f) || !(den > T(0))) return detail::fail<T>(status::overflow);
  if (f > T(1)) return {f, status::implausible};
  return {f, status::ok};
}

/// Verdict levels, from best to worst (names of our own).
enum class health_level : int {
  sound = 0,       ///< drain fraction within the band of a high-quality pump, no growth
  acceptable = 1,  ///< within the band still normal for very large pumps, or mild growth
  elevated = 2,    ///< between the acceptable band and the worn band: plan an inspection
  worn = 3         ///< at or beyond the worn band, or large growth over the baseline
};

/// Operating state of a reading (recorded with it; the heat indicator compares like with like).
enum class operating_state : int {
  unknown = 0,    ///< not recorded (taken as on stroke for the heat indicator's throttling fallback)
  on_stroke = 1,  ///< delivering flow at the outlet pressure
  deadhead = 2    ///< compensated to zero flow at the compensator pressure (churning heat in the case)
};

/// Reasons behind a verdict and flags of a reading (bit flags; several may be set).
enum health_reason : unsigned {
  reason_fraction_sound = 1u << 0,       ///< normalised fraction at or below the sound band
  reason_fraction_acceptable = 1u << 1,  ///< normalised fraction in the acceptable band
  reason_fraction_elevated = 1u << 2,    ///< normalised fraction between acceptable and worn
  reason_fraction_worn = 1u << 3,        ///< normalised fraction at or beyond the worn band
  reason_growth_moderate = 1u << 4,      ///< growth over the baseline beyond the watch limit
  reason_growth_large = 1u << 5,         ///< growth over the baseline beyond the worn limit
  reason_drain_hot = 1u << 6,            ///< drain rise above the expected rise (baseline rise or throttling)
  reason_low_pressure_reading = 1u << 7, ///< reading below pressure_flag x the reference pressure: normalisation less certain
  reason_no_baseline = 1u << 8,          ///< no baseline given: growth not assessed
  reason_no_temperatures = 1u << 9,      ///< drain or inlet temperature not given: heat indicator not assessed
  reason_speed_off_rated = 1u << 10,     ///< speed more than speed_flag away from rated (flag)
  reason_drain_colder = 1u << 11,        ///< drain colder than the inlet by more than drain_colder_k (sensors swapped?)
  reason_state_differs = 1u << 12,       ///< operating state differs from the baseline's: heat indicator not assessed
  reason_below_constant_part = 1u << 13  ///< reading close to the constant part: the laminar part is small and uncertain
};

/// Why a reading was refused (bit flags): a refused reading is not scored.
enum health_refusal : unsigned {
  refuse_drain_not_positive = 1u << 0,   ///< zero or negative drain (meter not connected, wrong sign)
  refuse_drain_below_constant = 1u << 1, ///< drain below the controller's constant consumption
  refuse_oil_temperature = 1u << 2,      ///< oil temperature outside what the oil can be at in service
  refuse_drain_temperature = 1u << 3,    ///< drain temperature outside what the oil can be at in service
  refuse_speed_far_from_rated = 1u << 4, ///< speed further than speed_refuse from rated
  refuse_pressure_too_low = 1u << 5,     ///< outlet-to-case pressure below pressure_refuse x the reference
  refuse_fraction_above_one = 1u << 6    ///< normalised drain above the whole displacement flow
};

/// A sentence for one reason bit (static storage, never null).
/// @param reason one health_reason bit
/// @return the sentence; a sentence saying so for an unknown bit
PUMPLOSS_CXX_API const char* health_reason_text(unsigned reason) noexcept;

/// A sentence for one refusal bit (static storage, never null).
/// @param refusal one health_refusal bit
/// @return the sentence; a sentence saying so for an unknown bit
PUMPLOSS_CXX_API const char* health_refusal_text(unsigned refusal) noexcept;

/// A short name for a level ("sound", "acceptable", "elevated", "worn"; "unknown" otherwise).
/// @param level the level
/// @return the name (static storage)
PUMPLOSS_CXX_API const char* health_level_name(health_level level) noexcept;

/// The case-drain caution every health report, plot and page carries: lines of at most 110
/// characters separated by '\n' (static storage, never null).
/// @return the caution text
PUMPLOSS_CXX_API const char* health_case_drain_caution() noexcept;

/// A short name for an operating state ("on stroke", "deadhead", "unknown").
/// @param s the state
/// @return the name (static storage)
PUMPLOSS_CXX_API const char* operating_state_name(operating_state s) noexcept;

/// Bands, limits and plausibility checks of the verdict; every one configurable.
template <class T>
struct health_bands {
  T sound_max = detail::constant<T>(0.05L, "0.05");       ///< fraction up to which a pump is sound (common practice: ~5 %)
  T acceptable_max = detail::constant<T>(0.10L, "0.10");  ///< upper end of acceptable (common practice: very large pumps ~10 %)
  T worn_min = detail::constant<T>(0.15L, "0.15");        ///< fraction from which a pump is worn (common practice: 15 % or more)
  T growth_moderate = detail::constant<T>(0.25L, "0.25"); ///< growth over baseline flagged moderate (our default, no source)
  T growth_large = detail::constant<T>(0.50L, "0.50");    ///< growth over baseline flagged large (our default, no source)
  T hot_margin = T(1);  ///< without a baseline rise: drain rise flagged above hot_margin x the throttling rise (our default, no source)
  T hot_baseline_factor = detail::constant<T>(1.5L, "1.5");  ///< with a baseline rise: flagged above this x the expected rise (our default, no source)
  T oil_t_min_k = detail::constant<T>(243.15L, "243.15");  ///< coldest plausible oil in service, K (-30 degC; our default, no source)
  T oil_t_max_k = detail::constant<T>(393.15L, "393.15");  ///< hottest plausible oil in service, K (120 degC; our default, no source)
  T speed_flag = detail::constant<T>(0.10L, "0.10");      ///< relative speed deviation from rated that is flagged
  T speed_refuse = detail::constant<T>(0.50L, "0.50");    ///< relative speed deviation from rated that is refused
  T pressure_flag = detail::constant<T>(0.50L, "0.50");   ///< dp below this x reference dp is flagged
  T pressure_refuse = detail::constant<T>(0.20L, "0.20"); ///< dp below this x reference dp is refused (too low to judge)
  T drain_colder_k = T(5);  ///< drain colder than inlet by more than this is flagged, K
};

/// The pump's short description and the reference state to which readings are normalised.
/// No geometry: maximum displacement, speeds, controller consumption, baseline and its state.
template <class T>
struct health_reference {
  T max_displacement_m3_rev;  ///< maximum displacement V_max, m^3/rev
  T reference_dp_pa;          ///< reference pressure difference outlet to case (usually the maximum), Pa
  T reference_t_k;            ///< reference temperature at the gaps, K
  oil<T> fluid;               ///< the oil (D341 line, density model, cp); dynamic viscosity at zero gauge pressure
  T reference_speed_rev_s;    ///< speed of the drain fraction's displacement flow V_max n_ref, rev/s
  T rated_speed_rev_s = scalar_traits<T>::nan();  ///< rated speed for the speed check (NaN: the reference speed)
  T constant_m3_s = T(0);     ///< constant part q_c (controller consumption, pilot flow), m^3/s, >= 0
  T orifice_share = T(0);     ///< share s of the variable part at the reference state that scales as sqrt(dp), 0..1
  T pressure_exponent = T(1);  ///< a of the laminar part (dp/dp_ref)^a, 0..2 (1: laminar clearances)
  T viscosity_exponent = T(1); ///< b of the laminar part (mu_ref/mu)^b, 0..2 (1: laminar clearances)
  T baseline_m3_s = scalar_traits<T>::nan();    ///< baseline drain flow at the reference state (NaN: none)
  T baseline_rise_k = scalar_traits<T>::nan();  ///< baseline drain minus inlet temperature at the reference state, K (NaN: none)
  operating_state baseline_state = operating_state::on_stroke;  ///< state in which the baseline was read
};

/// One field reading.
template <class T>
struct health_reading {
  T drain_flow_m3_s;  ///< case drain flow, m^3/s
  T outlet_pa;        ///< pump outlet pressure (gauge), Pa
  T case_pa;          ///< case pressure (gauge), Pa (0 if not measured)
  T oil_t_k;          ///< oil temperature governing the clearances (case or drain), K
  T speed_rev_s;      ///< shaft speed, rev/s
  T drain_t_k = scalar_traits<T>::nan();  ///< drain oil temperature, K (NaN: not measured)
  T inlet_t_k = scalar_traits<T>::nan();  ///< inlet oil temperature, K (NaN: not measured)
  operating_state state = operating_state::on_stroke;  ///< operating state of the reading
};

/// A verdict with its reasons and figures.
template <class T>
struct [[nodiscard]] health_assessment {
  health_level level;               ///< the verdict
  unsigned reasons;                 ///< health_reason bits
  T fraction;                       ///< drain flow as read over V_max n_ref
  T fraction_at_reference;          ///< normalised drain flow over V_max n_ref
  T drain_at_reference_m3_s;        ///< drain flow normalised to the reference state, m^3/s
  T growth;                         ///< normalised drain over baseline minus 1 (NaN without baseline)
  T drain_rise_k;                   ///< drain minus inlet temperature, K (NaN if not measured)
  T throttling_rise_k;              ///< expected rise: the baseline rise scaled by dp/dp_ref, else dp/(rho cp), K (NaN: not assessed)
  pumploss::status st;              ///< status of the assessment (out_of_validity: refused, see refused)
  unsigned refused = 0u;            ///< health_refusal bits when the reading was refused
  /// @return true when the status is exactly ok.
  bool ok() const noexcept { return st == pumploss::status::ok; }
  /// @return true when the results are usable (ok or a report such as regime).
  bool usable() const noexcept { return pumploss::is_usable(st); }
};

namespace detail {
// Median of w[0..m) (m >= 1), reordering w: linear time on average (std::nth_element), so that a
// column of a million readings costs no more than reading it (issue 20; was an insertion sort).
template <class T>
inline T median_in_place(T* w, std::size_t m) {
  const auto mid = static_cast<std::ptrdiff_t>(m / 2);
  std::nth_element(w, w + mid, w + m);
  if (m % 2) return w[mid];
  return (*std::max_element(w, w + mid) + w[mid]) / 2;
}
template <class T>
inline T health_dp(const health_reading<T>& r) {
  return r.outlet_pa - r.case_pa;
}
// Scale factor of the variable part from the reference state to the reading's state:
// F = (1 - s) (dp/dp_ref)^a (mu_ref/mu)^b + s (dp/dp_ref)^(1/2).
template <class T>
inline T health_variable_factor(const health_reference<T>& ref, T dp, T mu, T mu_ref) {
  using std::pow;
  using std::sqrt;
  const T x = dp / ref.reference_dp_pa;
  T lam = x * (mu_ref / mu);
  if (!(ref.pressure_exponent == T(1)) || !(ref.viscosity_exponent == T(1)))
    lam = pow(x, ref.pressure_exponent) * pow(mu_ref / mu, ref.viscosity_exponent);
  if (ref.orifice_share == T(0)) return lam;
  return (T(1) - ref.orifice_share) * lam + ref.orifice_share * sqrt(x);
}
template <class T>
inline status health_reference_check(const health_reference<T>& ref) {
  if (!detail::all_finite(ref.max_displacement_m3_rev, ref.reference_dp_pa, ref.reference_t_k,
                          ref.reference_speed_rev_s, ref.constant_m3_s, ref.orifice_share, ref.pressure_exponent,
                          ref.viscosity_exponent))
    return status::nonfinite;
  if (!(ref.max_displacement_m3_rev > T(0)) || !(ref.reference_dp_pa > T(0)) || !(ref.reference_t_k > T(0)) ||
      !(ref.reference_speed_rev_s > T(0)) || !(ref.constant_m3_s >= T(0)) || !(ref.orifice_share >= T(0)) ||
      !(ref.orifice_share <= T(1)) || !(ref.pressure_exponent >= T(0)) || !(ref.pressure_exponent <= T(2)) ||
      !(ref.viscosity_exponent >= T(0)) || !(ref.viscosity_exponent <= T(2)))
    return status::domain;
  if (detail::finite(ref.baseline_m3_s) && !(ref.baseline_m3_s > ref.constant_m3_s)) return status::domain;
  if (detail::finite(ref.rated_speed_rev_s) && !(ref.rated_speed_rev_s > T(0))) return status::domain;
  return status::ok;
}
}  // namespace detail

/// Normalise a drain reading to the reference state with the one model of the library:
///
/// \f[ q = q_c + q_{v,ref}\,F,\qquad
///     F = (1-s)\left(\frac{\Delta p}{\Delta p_{ref}}\right)^{a}\left(\frac{\mu_{ref}}{\mu}\right)^{b}
///       + s\sqrt{\frac{\Delta p}{\Delta p_{ref}}},\qquad
///     q_{ref} = q_c + \frac{q - q_c}{F} \f]
///
/// q_c is the constant part (controller consumption), the laminar part scales with dp/mu
/// (a = b = 1) with the DYNAMIC viscosity mu = rho nu of the oil at the gap temperature, and a
/// share s of the variable part may scale as an orifice (sqrt(dp), no viscosity). Speed does
/// not enter: laminar clearance flow does not depend on it.
///
/// @param ref the pump description and reference state
/// @param r the reading (its oil_t_k sets the viscosity)
/// @param mu_ref_pa_s dynamic viscosity at the reference temperature, Pa s (NaN: computed here;
///        the monitor passes its cached value)
/// @return the drain flow at the reference state, m^3/s; status::implausible when the reading
///         is below the constant part (the value is then below q_c); statuses of
///         oil_dynamic_viscosity(); status::domain for a non-positive pressure difference.
/// @par Validity
/// Laminar clearances at unchanged gap heights (thermal change of clearances ignored).
/// @par Source
/// Laminar gap flow q = w h^3 dp / (12 mu L): Vacca & Franzoni, Hydraulic Fluid Power (Wiley
/// 2021), laminar flow between parallel plates; orifice flow q ~ sqrt(dp) (Bernoulli);
/// the split into constant, laminar and orifice parts as in leakage_split(). See
/// docs/pages/theory_pump.md.
template <class T>
inline result<T> health_normalise(const health_reference<T>& ref, const health_reading<T>& r,
                                  T mu_ref_pa_s = scalar_traits<T>::nan()) {
  if (!detail::all_finite(r.drain_flow_m3_s, r.outlet_pa, r.case_pa, r.oil_t_k))
    return detail::fail<T>(status::nonfinite);
  const status rs = detail::health_reference_check(ref);
  if (is_error(rs)) return detail::fail<T>(rs);
  const T dp = detail::health_dp(r);
  if (!(dp > T(0)) || !(r.drain_flow_m3_s >= T(0)) || !(r.oil_t_k > T(0))) return detail::fail<T>(status::domain);
  const auto mu = oil_dynamic_viscosity(ref.fluid, r.oil_t_k, T(0));
  if (is_error(mu.st)) return mu;
  status st = mu.st;
  if (!detail::finite(mu_ref_pa_s)) {
    const auto m = oil_dynamic_viscosity(ref.fluid, ref.reference_t_k, T(0));
    if (is_error(m.st)) return m;
    mu_ref_pa_s = m.value;
    st = worst(st, m.st);
  }
  const T f = detail::health_variable_factor(ref, dp, mu.value, mu_ref_pa_s);
  if (!detail::finite(f) || !(f > T(0))) return detail::fail<T>(status::overflow);
  const T q = ref.constant_m3_s + (r.drain_flow_m3_s - ref.constant_m3_s) / f;
  if (!detail::finite(q)) return detail::fail<T>(status::overflow);
  if (r.drain_flow_m3_s < ref.constant_m3_s) st = worst(st, status::implausible);
  return {q, st};
}

/// The constant and laminar parts fitted to baseline readings.
template <class T>
struct [[nodiscard]] health_constant_fit {
  T constant_m3_s;      ///< fitted constant part q_c, m^3/s
  T laminar_ref_m3_s;   ///< laminar part at the reference state, m^3/s
  T baseline_m3_s;      ///< q_c + laminar part at the reference state, m^3/s
  T rms_m3_s;           ///< RMS residual, m^3/s (0 for two readings)
  pumploss::status st;  ///< ok; implausible when the fitted constant part is negative (then set to 0 and refitted);
                        ///< insufficient_data for fewer than 2 readings or one value of dp/mu
  /// @return true when the status is exactly ok.
  bool ok() const noexcept { return st == pumploss::status::ok; }
  /// @return true when the results are usable (ok or a report such as regime).
  bool usable() const noexcept { return pumploss::is_usable(st); }
};

/// Fit the constant part and the laminar part to baseline readings of a new pump at two or more
/// pressures (and any temperatures) by ordinary least squares on
/// \f$ q_k = q_c + c\,x_k,\ x_k = (\Delta p_k/\Delta p_{ref})(\mu_{ref}/\mu_k) \f$.
/// The orifice share and exponents of ref are not used (laminar only).
///
/// @param ref description with the reference state and oil (constant_m3_s and baseline ignored)
/// @param readings baseline readings (drain, outlet, case, oil_t_k used)
/// @param count number of readings, >= 2 with two different x
/// @return the fit
/// @par Source
/// Ordinary least squares, straight line (closed form in centred sums).
template <class T>
inline health_constant_fit<T> health_fit_constant(const health_reference<T>& ref, const health_reading<T>* readings,
                                                  std::size_t count) {
  using std::sqrt;
  const T nan = scalar_traits<T>::nan();
  health_constant_fit<T> out{nan, nan, nan, nan, status::misuse};
  if (readings == nullptr) return out;
  if (count < 2) {
    out.st = status::insufficient_data;
    return out;
  }
  health_reference<T> lam = ref;
  lam.constant_m3_s = T(0);
  lam.orifice_share = T(0);
  lam.pressure_exponent = T(1);
  lam.viscosity_exponent = T(1);
  lam.baseline_m3_s = nan;
  const status rs = detail::health_reference_check(lam);
  if (is_error(rs)) {
    out.st = rs;
    return out;
  }
  const auto mu_ref = oil_dynamic_viscosity(ref.fluid, ref.reference_t_k, T(0));
  if (is_error(mu_ref.st)) {
    out.st = mu_ref.st;
    return out;
  }
  T sx = T(0), sy = T(0);
  const T n = T(static_cast<double>(count));
  // x_k = F_k with q_c = 0: the normalised reading q_k / x_k = q_k (reference) gives x_k = q_k / q_ref,k
  auto xk = [&](const health_reading<T>& r, T& x) {
    const T dp = detail::health_dp(r);
    if (!detail::all_finite(r.drain_flow_m3_s, dp, r.oil_t_k)) return status::nonfinite;
    if (!(dp > T(0)) || !(r.drain_flow_m3_s > T(0)) || !(r.oil_t_k > T(0))) return status::domain;
    const auto mu = oil_dynamic_viscosity(ref.fluid, r.oil_t_k, T(0));
    if (is_error(mu.st)) return mu.st;
    x = detail::health_variable_factor(lam, dp, mu.value, mu_ref.value);
    return status::ok;
  };
  for (std::size_t i = 0; i < count; ++i) {
    T x = T(0);
    const status s = xk(readings[i], x);
    if (is_error(s)) {
      out.st = s;
      return out;
    }
    sx += x;
    sy += readings[i].drain_flow_m3_s;
  }
  const T mx = sx / n, my = sy / n;
  T sxx = T(0), sxy = T(0);
  for (std::size_t i = 0; i < count; ++i) {
    T x = T(0);
    (void)xk(readings[i], x);
    sxx += (x - mx) * (x - mx);
    sxy += (x - mx) * (readings[i].drain_flow_m3_s - my);
  }
  if (!(sxx > T(1e-12) * mx * mx)) {
    out.st = status::insufficient_data;
    return out;
  }
  T c = sxy / sxx;
  T q0 = my - c * mx;
  status st = status::ok;
  if (q0 < T(0)) {  // not physical: refit through the origin and say so
    T sxx0 = T(0), sxy0 = T(0);
    for (std::size_t i = 0; i < count; ++i) {
      T x = T(0);
      (void)xk(readings[i], x);
      sxx0 += x * x;
      sxy0 += x * readings[i].drain_flow_m3_s;
    }
    c = sxy0 / sxx0;
    q0 = T(0);
    st = status::implausible;
  }
  T rss = T(0);
  for (std::size_t i = 0; i < count; ++i) {
    T x = T(0);
    (void)xk(readings[i], x);
    const T e = readings[i].drain_flow_m3_s - q0 - c * x;
    rss += e * e;
  }
  if (!(c > T(0))) {
    out.st = status::insufficient_data;
    return out;
  }
  out.constant_m3_s = q0;
  out.laminar_ref_m3_s = c;
  out.baseline_m3_s = q0 + c;
  out.rms_m3_s = sqrt(rss / n);
  out.st = st;
  return out;
}

/// Plausibility of one reading: refusals (not scored) and flags (scored, with a reason).
template <class T>
struct [[nodiscard]] health_plausibility {
  unsigned refused;  ///< health_refusal bits (0: accepted)
  unsigned flags;    ///< health_reason flag bits (speed off rated, low pressure, drain colder, state differs)
  /// ok: accepted, no flag; implausible: accepted with a flag (scored, with a reason);
  /// out_of_validity: refused (not scored)
  pumploss::status st;
  /// @return true when the status is exactly ok.
  bool ok() const noexcept { return st == pumploss::status::ok; }
  /// @return true when the reading may be scored (accepted, flagged or not).
  bool usable() const noexcept { return pumploss::is_usable(st); }
};

/// Check one reading against what the oil and the pump can be at.
///
/// Refused: zero or negative drain; drain below the constant part; oil or drain temperature
/// outside [oil_t_min_k, oil_t_max_k]; speed further than speed_refuse from rated; outlet-to-case
/// pressure below pressure_refuse x reference. Flagged: speed beyond speed_flag; pressure below
/// pressure_flag x reference; drain colder than the inlet by more than drain_colder_k; state
/// different from the baseline's. Non-finite or missing required values are refused as
/// out of range (drain, oil temperature, speed, pressure).
/// @param ref the pump description
/// @param bands the limits
/// @param r the reading
/// @return the bits and their status (ok, implausible when flagged, out_of_validity when refused)
/// @par Source
/// Limits are our defaults, no source; configurable in health_bands.
template <class T>
inline health_plausibility<T> health_check_reading(const health_reference<T>& ref, const health_bands<T>& bands,
                                                   const health_reading<T>& r) {
  using std::abs;
  health_plausibility<T> p{0u, 0u, status::ok};
  if (!detail::finite(r.drain_flow_m3_s) || !(r.drain_flow_m3_s > T(0))) p.refused |= refuse_drain_not_positive;
  else if (r.drain_flow_m3_s < ref.constant_m3_s) p.refused |= refuse_drain_below_constant;
  auto t_bad = [&](T t) { return !(t >= bands.oil_t_min_k) || !(t <= bands.oil_t_max_k); };
  if (t_bad(r.oil_t_k)) p.refused |= refuse_oil_temperature;
  if (!std::isnan(static_cast<double>(r.drain_t_k)) && t_bad(r.drain_t_k)) p.refused |= refuse_drain_temperature;
  const T rated = detail::finite(ref.rated_speed_rev_s) ? ref.rated_speed_rev_s : ref.reference_speed_rev_s;
  const T dev = abs(r.speed_rev_s / rated - T(1));
  if (!detail::finite(dev) || dev > bands.speed_refuse) p.refused |= refuse_speed_far_from_rated;
  else if (dev > bands.speed_flag) p.flags |= reason_speed_off_rated;
  const T x = detail::health_dp(r) / ref.reference_dp_pa;
  if (!detail::finite(x) || x < bands.pressure_refuse) p.refused |= refuse_pressure_too_low;
  else if (x < bands.pressure_flag) p.flags |= reason_low_pressure_reading;
  if (detail::all_finite(r.drain_t_k, r.inlet_t_k) && r.drain_t_k < r.inlet_t_k - bands.drain_colder_k)
    p.flags |= reason_drain_colder;
  if (r.state != ref.baseline_state && r.state != operating_state::unknown) p.flags |= reason_state_differs;
  p.st = p.refused != 0u ? status::out_of_validity : (p.flags != 0u ? status::implausible : status::ok);
  return p;
}

/// Whether a column of temperatures read under a degC header looks like degF values.
///
/// True when the median, read as degC, lies above 85 degC while every value read as degF lies
/// within the limits of health_bands (oil_t_min_k to oil_t_max_k) and the median read as degF lies
/// within 10 to 85 degC, where hydraulic oil in service usually runs (common practice, no source).
/// @param t_k the temperatures as read (converted from degC to K), count values; NaN entries skipped
/// @param count number of values
/// @param bands the limits
/// @param work caller's workspace of count values (sorted copy)
/// @return true when the column looks like degF
template <class T>
inline bool health_temperatures_look_fahrenheit(const T* t_k, std::size_t count, const health_bands<T>& bands,
                                                T* work) {
  if (t_k == nullptr || work == nullptr) return false;
  std::size_t m = 0;
  for (std::size_t i = 0; i < count; ++i)
    if (detail::finite(t_k[i])) work[m++] = t_k[i];
  if (m == 0) return false;
  const T med_c = detail::median_in_place(work, m) - T(273.15);
  auto f_to_k = [](T c_as_read) { return (c_as_read - T(32)) * T(5) / T(9) + T(273.15); };
  if (!(med_c > T(85))) return false;
  for (std::size_t i = 0; i < m; ++i) {
    const T k = f_to_k(work[i] - T(273.15));
    if (!(k >= bands.oil_t_min_k) || !(k <= bands.oil_t_max_k)) return false;
  }
  const T med_f_as_c = f_to_k(med_c) - T(273.15);
  return med_f_as_c >= T(10) && med_f_as_c <= T(85);
}

namespace detail {
template <class T>
inline health_level level_of_fraction(const health_bands<T>& b, T f, unsigned& reasons) {
  if (f <= b.sound_max) {
    reasons |= reason_fraction_sound;
    return health_level::sound;
  }
  if (f <= b.acceptable_max) {
    reasons |= reason_fraction_acceptable;
    return health_level::acceptable;
  }
  if (f < b.worn_min) {
    reasons |= reason_fraction_elevated;
    return health_level::elevated;
  }
  reasons |= reason_fraction_worn;
  return health_level::worn;
}
inline health_level max_level(health_level a, health_level b) {
  return static_cast<int>(a) >= static_cast<int>(b) ? a : b;
}
template <class T>
inline status health_bands_check(const health_bands<T>& bands) {
  if (!detail::all_finite(bands.sound_max, bands.acceptable_max, bands.worn_min, bands.growth_moderate,
                          bands.growth_large, bands.hot_margin, bands.hot_baseline_factor) ||
      !detail::all_finite(bands.oil_t_min_k, bands.oil_t_max_k, bands.speed_flag, bands.speed_refuse,
                          bands.pressure_flag, bands.pressure_refuse, bands.drain_colder_k))
    return status::nonfinite;
  if (!(bands.sound_max > T(0)) || !(bands.acceptable_max >= bands.sound_max) ||
      !(bands.worn_min >= bands.acceptable_max) || !(bands.growth_moderate > T(0)) ||
      !(bands.growth_large >= bands.growth_moderate) || !(bands.hot_margin > T(0)) ||
      !(bands.hot_baseline_factor > T(0)) || !(bands.oil_t_min_k > T(0)) ||
      !(bands.oil_t_max_k > bands.oil_t_min_k) || !(bands.speed_refuse >= bands.speed_flag) ||
      !(bands.speed_flag >= T(0)) || !(bands.pressure_flag >= bands.pressure_refuse) ||
      !(bands.pressure_refuse >= T(0)) || !(bands.drain_colder_k >= T(0)))
    return status::domain;
  return status::ok;
}
}  // namespace detail

/// Assess one field reading.
///
/// First the reading is checked (health_check_reading()); a refused reading returns
/// status::out_of_validity with its refusal bits and NaN figures. Otherwise the level is the
/// worst of: the band of the normalised drain fraction
/// \f$ \phi_{ref} = q_{ref}/(V_{max} n_{ref}) \f$ (REFERENCE speed, so table and plot agree);
/// growth \f$ g = q_{ref}/q_{base} - 1 \f$ beyond growth_moderate (at least acceptable) or
/// growth_large (worn); a drain rise \f$ T_3 - T_1 \f$ above the expected rise (at least
/// elevated). The expected rise is the baseline rise scaled by \f$ \Delta p/\Delta p_{ref} \f$
/// times hot_baseline_factor when the pump's own baseline rise is given and the reading is in
/// the baseline's operating state; without a baseline rise, hot_margin x
/// \f$ \Delta p/(\rho c_p) \f$ for a reading on stroke; at deadhead without a baseline rise in
/// that state the heat is not assessed (churning heat is not modelled).
///
/// @param ref pump description and reference state
/// @param bands bands and limits
/// @param r the reading
/// @param mu_ref_pa_s dynamic viscosity at the reference temperature (NaN: computed here)
/// @return the assessment; its st is status::domain / status::nonfinite for bad descriptions or
///         bands, status::out_of_validity for a refused reading (refused bits set, figures NaN).
/// @par Source
/// Bands: common practice, no source (see health.hpp). Throttling rise: first law for an
/// adiabatic throttle of a liquid with constant rho and cp (Vacca & Franzoni, Hydraulic Fluid
/// Power, Wiley 2021, energy losses in throttling). See docs/pages/theory_pump.md.
template <class T>
inline health_assessment<T> assess_health(const health_reference<T>& ref, const health_bands<T>& bands,
                                          const health_reading<T>& r, T mu_ref_pa_s = scalar_traits<T>::nan()) {
  const T nan = scalar_traits<T>::nan();
  health_assessment<T> a{health_level::sound, 0u, nan, nan, nan, nan, nan, nan, status::ok, 0u};
  auto fail = [&](status s) {
    a = health_assessment<T>{health_level::sound, 0u, nan, nan, nan, nan, nan, nan, s, a.refused};
    return a;
  };
  status s = detail::health_bands_check(bands);
  if (is_error(s)) return fail(s);
  s = detail::health_reference_check(ref);
  if (is_error(s)) return fail(s);
  if (!detail::all_finite(r.drain_flow_m3_s, r.outlet_pa, r.case_pa, r.oil_t_k, r.speed_rev_s))
    return fail(status::nonfinite);
  if (std::isinf(static_cast<double>(r.drain_t_k)) || std::isinf(static_cast<double>(r.inlet_t_k)))
    return fail(status::nonfinite);
  const auto chk = health_check_reading(ref, bands, r);
  if (chk.refused != 0u) {
    a.refused = chk.refused;
    return fail(status::out_of_validity);
  }
  const T qmax = ref.max_displacement_m3_rev * ref.reference_speed_rev_s;
  const auto qref = health_normalise(ref, r, mu_ref_pa_s);
  if (is_error(qref.st)) return fail(qref.st);
  const auto fref = drain_fraction(qref.value, ref.max_displacement_m3_rev, ref.reference_speed_rev_s);
  if (is_error(fref.st)) return fail(fref.st);
  if (fref.st == status::implausible) {
    a.refused = refuse_fraction_above_one;
    return fail(status::out_of_validity);
  }
  a.fraction = r.drain_flow_m3_s / qmax;
  a.fraction_at_reference = fref.value;
  a.drain_at_reference_m3_s = qref.value;
  a.st = qref.st;
  a.reasons = chk.flags;
  a.level = detail::level_of_fraction(bands, fref.value, a.reasons);
  // the laminar part is less than a fifth of the reading: its scaling dominates the uncertainty
  if (ref.constant_m3_s > T(0) && r.drain_flow_m3_s - ref.constant_m3_s < (r.drain_flow_m3_s) / 5)
    a.reasons |= reason_below_constant_part;

  if (detail::finite(ref.baseline_m3_s)) {
    a.growth = qref.value / ref.baseline_m3_s - T(1);
    if (a.growth > bands.growth_large) {
      a.reasons |= reason_growth_large;
      a.level = detail::max_level(a.level, health_level::worn);
    } else if (a.growth > bands.growth_moderate) {
      a.reasons |= reason_growth_moderate;
      a.level = detail::max_level(a.level, health_level::acceptable);
    }
  } else {
    a.reasons |= reason_no_baseline;
  }

  if (detail::all_finite(r.drain_t_k, r.inlet_t_k)) {
    const T dp = detail::health_dp(r);
    a.drain_rise_k = r.drain_t_k - r.inlet_t_k;
    T limit = nan;
    if (detail::finite(ref.baseline_rise_k)) {
      if (r.state == ref.baseline_state || r.state == operating_state::unknown) {
        a.throttling_rise_k = ref.baseline_rise_k * dp / ref.reference_dp_pa;
        limit = bands.hot_baseline_factor * a.throttling_rise_k;
      }
    } else if (r.state != operating_state::deadhead) {
      const auto rho = oil_density_at(ref.fluid, r.inlet_t_k, T(0));
      if (!is_error(rho.st) && ref.fluid.cp_j_kg_k > T(0)) {
        a.throttling_rise_k = dp / (rho.value * ref.fluid.cp_j_kg_k);
        limit = bands.hot_margin * a.throttling_rise_k;
      }
    }
    if (!detail::finite(limit)) {
      a.reasons |= reason_state_differs;
    } else if (a.drain_rise_k > limit) {
      a.reasons |= reason_drain_hot;
      a.level = detail::max_level(a.level, health_level::elevated);
    }
  } else {
    a.reasons |= reason_no_temperatures;
  }
  return a;
}

/// Linear trend of normalised drain fraction over time, by least squares.
template <class T>
struct [[nodiscard]] health_trend {
  T slope_per_day;     ///< growth of the normalised drain fraction per time unit (per day for days; per hour for hours)
  T intercept;         ///< fitted fraction at time 0
  T days_to_worn;      ///< time from the last reading until the fit crosses the worn band (inf if not rising, 0 if there)
  pumploss::status st; ///< status::insufficient_data for fewer than 2 readings or one single time
  T span = scalar_traits<T>::nan();  ///< time span of the fitted readings (last minus first), same unit
  /// @return true when the status is exactly ok.
  bool ok() const noexcept { return st == pumploss::status::ok; }
  /// @return true when the results are usable (ok or a report such as regime).
  bool usable() const noexcept { return pumploss::is_usable(st); }
};

/// Fit a straight line to (time, normalised drain fraction) and project it to the worn band.
/// Fit only the readings after the last step (health_cusum) and report the projection through
/// health_projection(), which keeps it within the data span and consistent with the verdict.
/// @param days reading times (days, or operating hours), n values
/// @param fractions normalised drain fractions, n values
/// @param n number of readings, >= 2
/// @param worn_min the worn band's lower edge (fraction)
/// @return the trend
/// @par Source
/// Ordinary least squares in centred form (slope = Sxy/Sxx).
template <class T>
inline health_trend<T> fit_health_trend(const T* days, const T* fractions, std::size_t n, T worn_min) {
  const T nan = scalar_traits<T>::nan();
  health_trend<T> out{nan, nan, nan, status::ok, nan};
  if (days == nullptr || fractions == nullptr) {
    out.st = status::misuse;
    return out;
  }
  if (n < 2) {
    out.st = status::insufficient_data;
    return out;
  }
  T mx = T(0), my = T(0), last = days[0], first = days[0];
  for (std::size_t i = 0; i < n; ++i) {
    if (!detail::all_finite(days[i], fractions[i])) {
      out.st = status::nonfinite;
      return out;
    }
    mx += days[i];
    my += fractions[i];
    if (days[i] > last) last = days[i];
    if (days[i] < first) first = days[i];
  }
  mx /= T(static_cast<double>(n));
  my /= T(static_cast<double>(n));
  T sxx = T(0), sxy = T(0);
  for (std::size_t i = 0; i < n; ++i) {
    sxx += (days[i] - mx) * (days[i] - mx);
    sxy += (days[i] - mx) * (fractions[i] - my);
  }
  if (!(sxx > T(0))) {
    out.st = status::insufficient_data;
    return out;
  }
  out.span = last - first;
  out.slope_per_day = sxy / sxx;
  out.intercept = my - out.slope_per_day * mx;
  const T now = out.intercept + out.slope_per_day * last;
  if (now >= worn_min) {
    out.days_to_worn = T(0);
  } else if (out.slope_per_day > T(0)) {
    out.days_to_worn = (worn_min - now) / out.slope_per_day;
  } else {
    out.days_to_worn = std::numeric_limits<T>::infinity();
  }
  return out;
}

/// What a projection to the worn band may say.
enum class projection_kind : int {
  projected = 0,     ///< crossing projected within the data span: time_to_worn valid
  already_worn = 1,  ///< the current verdict is worn: no projection
  not_rising = 2,    ///< the trend does not rise: no crossing
  beyond_span = 3,   ///< the crossing lies further ahead than the data span: not projected
  at_band_edge = 4,  ///< the fitted line is at the worn band while the latest reading is not worn
  unavailable = 5    ///< no trend (too few readings)
};

/// A projection consistent with the verdict.
template <class T>
struct health_projection_result {
  projection_kind kind;  ///< what may be said
  T time_to_worn;        ///< time to the worn band (only for projected; NaN otherwise)
};

/// Project a trend to the worn band, never further than the data span and never contradicting
/// the current verdict (a worn pump is not "worn in 5189 days").
/// @param t the trend (fit_health_trend())
/// @param current the latest verdict
/// @return the projection
/// @par Source
/// Our rule: extrapolate a straight-line fit no further than the span of its data (common
/// practice, no source).
template <class T>
inline health_projection_result<T> health_projection(const health_trend<T>& t, health_level current) {
  const T nan = scalar_traits<T>::nan();
  if (current == health_level::worn) return {projection_kind::already_worn, nan};
  if (is_error(t.st)) return {projection_kind::unavailable, nan};
  if (!(t.slope_per_day > T(0))) return {projection_kind::not_rising, nan};
  if (!(t.days_to_worn > T(0))) return {projection_kind::at_band_edge, nan};
  if (!(t.days_to_worn <= t.span)) return {projection_kind::beyond_span, nan};
  return {projection_kind::projected, t.days_to_worn};
}

/// Noise of a series from its moving ranges, robust to a few steps:
/// \f$ \hat\sigma = \mathrm{median}|x_i - x_{i-1}| / 0.95387 \f$
/// (for independent normal noise |x_i - x_{i-1}| is half-normal with scale sqrt(2) sigma, whose
/// median is 0.67449 sqrt(2) sigma = 0.95387 sigma; self-calculated).
/// @param x the series, n values
/// @param n number of values, >= 3
/// @param work caller's workspace of n values
/// @return sigma; status::insufficient_data for n < 3
template <class T>
inline result<T> health_noise_sigma(const T* x, std::size_t n, T* work) {
  if (x == nullptr || work == nullptr) return detail::fail<T>(status::misuse);
  if (n < 3) return detail::fail<T>(status::insufficient_data);
  std::size_t m = 0;
  for (std::size_t i = 1; i < n; ++i) {
    if (!detail::all_finite(x[i], x[i - 1])) return detail::fail<T>(status::nonfinite);
    const T d = x[i] - x[i - 1];
    work[m++] = d < T(0) ? -d : d;
  }
  const T med = detail::median_in_place(work, m);
  return {med / detail::constant<T>(0.95387255240084L, "0.95387255240084"), status::ok};
}

/// A level shift found by the tabular CUSUM.
template <class T>
struct health_step {
  std::size_t index;        ///< first reading of the new level (0-based, in the series)
  std::size_t signal_index; ///< reading at which the CUSUM crossed its decision interval
  T before;                 ///< level before the shift: the CUSUM target; for an abrupt step the local trend at index
  T after;                  ///< new level: target +/- (K + C/N); for an abrupt step the local trend at index plus the jump
  int direction;            ///< +1 up, -1 down
  bool abrupt;              ///< a jump beyond the local quadratic trend, significant at z > health_cusum::z_abrupt
  T z = scalar_traits<T>::nan();  ///< the largest jump's test statistic (NaN: no candidate could be tested)
};

/// Tabular (two-sided) CUSUM for individual readings with a test of abruptness that a smooth
/// acceleration of wear does not pass; one reading at a time, constant memory, no allocation.
///
/// Level shifts: \f[ C^+_i = \max(0,\ x_i - (\mu_0 + K) + C^+_{i-1}),\qquad
///     C^-_i = \max(0,\ (\mu_0 - K) - x_i + C^-_{i-1}) \f]
/// with \f$ K = k\sigma \f$ and decision interval \f$ H = h\sigma \f$ (k = 0.5, h = 5 by default).
/// On a signal the shift is placed after the last reading at which the signalling sum was zero
/// (N readings back) and the new level is \f$ \mu_0 + K + C^+/N \f$ (or \f$ \mu_0 - K - C^-/N \f$)
/// (Page 1954; Montgomery 9.1).
///
/// Abrupt or gradual: a signal is held until `confirm` readings (5) from the latest candidate jump
/// on are in (the step is reported that many readings minus one after the CUSUM signal; finish()
/// decides a held signal at the end of a series). Every reading j not yet examined, with at least
/// `min_before` (3) readings of the current regime before it and `confirm` from it on, is a
/// candidate: over the window from max(regime start, j - `window_before`) to the latest reading
/// (at most `history` readings) the local trend and a level shift at j are fitted by least squares,
/// \f[ x_i = a + b\,u_i + c\,u_i^2 + \delta\,[u_i \ge 0] + e_i,\qquad u_i = i - j, \f]
/// and \f$ z_j = \delta / (s\,\sqrt{(X^TX)^{-1}_{\delta\delta}}) \f$ with s the largest of sigma, the
/// fit's residual standard deviation and the median moving range over 0.95387 of the regime's
/// readings kept (as health_noise_sigma(); a floor when sigma was learned from few readings). A smooth acceleration of wear is taken up by the quadratic
/// term; only a discontinuity makes \f$\delta\f$ large. The shift is abrupt (a step, e.g. damage)
/// when the largest \f$ z_j \f$ in the signal's direction exceeds `z_abrupt` = 5: two-sided
/// normal tail 5.7e-7 per candidate, at most 32 candidates, so at most 1.8e-5 per decision by
/// Bonferroni's inequality. The step is placed at that j, before = a, after = a + delta (the jump
/// beyond the trend), and j starts a new regime. Otherwise the shift is gradual (wear faster than
/// the target follows) and keeps the CUSUM's index and level. After a decision the sums restart at
/// the new level. Measured on 1000 monthly series of 42 readings with 2 % noise each
/// (tests/health_test.cpp, HealthSteps): no false step on linear wear, none on the demo's accelerating
/// wear nor on four times that acceleration; the demo's jump found exactly at its reading in 98.0 %
/// of the series on accelerating wear, 99.1 % on linear wear.
///
/// @par Source
/// E. S. Page, Continuous inspection schemes, Biometrika 41 (1954) 100-115; tabular CUSUM and
/// the estimate of the new mean: D. C. Montgomery, Introduction to Statistical Quality Control,
/// 6th ed., Wiley 2009, section 9.1 (Example 9.1 reproduced in tests/health_test.cpp, from memory).
/// The level shift in a regression on a local trend: G. E. P. Box and G. C. Tiao, Intervention
/// analysis with applications to economic and environmental problems, J. Amer. Statist. Assoc. 70
/// (1975) 70-79 (step intervention); the maximum over candidate change points: R. E. Quandt, Tests
/// of the hypothesis that a linear regression system obeys two separate regimes, J. Amer. Statist.
/// Assoc. 55 (1960) 324-330. Window lengths and z_abrupt are our choice (the rates in the tests).
template <class T>
class health_cusum {
 public:
  static constexpr std::size_t history = 32;       ///< readings kept (the largest fit window)
  static constexpr std::size_t confirm = 5;        ///< readings from a candidate jump on before it is judged
  static constexpr std::size_t min_before = 3;     ///< readings of the regime before a candidate jump
  static constexpr std::size_t window_before = 12; ///< readings before a candidate jump in its fit, at most
  /// Critical value of the jump's z statistic.
  /// @return 5 (two-sided, Bonferroni over up to 32 candidates: see the class text)
  static T z_abrupt() { return detail::constant<T>(5.0L, "5.0"); }

  /// Start with a target and a noise level.
  /// @param target_ mu_0, same unit as the readings
  /// @param sigma_ noise standard deviation, > 0
  /// @param k_ reference value in sigma (0.5 detects a shift of one sigma fastest)
  /// @param h_ decision interval in sigma (4 or 5)
  void reset(T target_, T sigma_, T k_ = detail::constant<T>(0.5L, "0.5"), T h_ = T(5)) {
    target = target_;
    sigma = sigma_;
    k = k_;
    h = h_;
    c_hi = c_lo = T(0);
    n_hi = n_lo = 0;
    count = 0;
    regime = examined = 0;
    held_dir = 0;
    held_start = held_signal = 0;
    held_after = T(0);
  }
  /// Feed one reading.
  /// @param x the reading
  /// @param step receives the shift when the function returns true (index counted from the
  ///        first reading fed since reset())
  /// @return true when a held signal was decided with this reading
  bool update(T x, health_step<T>& step) {
    hist[count % history] = x;
    ++count;
    if (held_dir != 0) {
      if (count < held_signal + confirm) return false;
      decide(step);
      return true;
    }
    const T kk = k * sigma;
    c_hi = x - (target + kk) + c_hi;
    if (c_hi > T(0)) ++n_hi; else { c_hi = T(0); n_hi = 0; }
    c_lo = (target - kk) - x + c_lo;
    if (c_lo > T(0)) ++n_lo; else { c_lo = T(0); n_lo = 0; }
    const T hh = h * sigma;
    std::size_t n = 0;
    T c = T(0);
    if (c_hi > hh) { held_dir = 1; n = n_hi; c = c_hi; }
    else if (c_lo > hh) { held_dir = -1; n = n_lo; c = c_lo; }
    if (held_dir == 0) return false;
    held_signal = count - 1;
    held_start = count - n;
    held_after = target + T(held_dir) * (kk + c / T(static_cast<double>(n)));
    return false;
  }
  /// Decide a held signal with the readings there are (at the end of a series).
  /// @param step receives the shift when the function returns true
  /// @return true when a signal was held
  bool finish(health_step<T>& step) {
    if (held_dir == 0) return false;
    decide(step);
    return true;
  }
  /// Whether a signal is held until its confirmation readings are in.
  /// @return true while held
  bool holding() const noexcept { return held_dir != 0; }

  T target = T(0);   ///< current target mu_0
  T sigma = T(1);    ///< noise sigma
  T k = T(0);        ///< reference value, in sigma
  T h = T(5);        ///< decision interval, in sigma
  T c_hi = T(0);     ///< upper cumulative sum
  T c_lo = T(0);     ///< lower cumulative sum
  std::size_t n_hi = 0;   ///< readings since C+ was last zero
  std::size_t n_lo = 0;   ///< readings since C- was last zero
  std::size_t count = 0;  ///< readings fed since reset
  T hist[history] = {};   ///< the last readings (ring)
  std::size_t regime = 0;       ///< first reading of the current regime (after the last abrupt step)
  std::size_t examined = 0;     ///< first reading not yet examined as a candidate jump
  int held_dir = 0;             ///< direction of the held signal (0: none)
  std::size_t held_start = 0;   ///< the held signal's CUSUM index
  std::size_t held_signal = 0;  ///< the held signal's signal index
  T held_after = T(0);          ///< the held signal's CUSUM estimate of the new level

 private:
  // Least squares of x_i = a + b u + c u^2 + d [u >= 0], u = i - j, over readings lo..count-1.
  // Returns false when the fit is singular; else p = (a, b, c, d), z of d.
  bool fit_jump(std::size_t j, std::size_t lo, T s_floor, T (&p)[4], T& z) const {
    using std::sqrt;
    T a[4][9] = {};  // normal equations augmented with X'y and the identity (Gauss-Jordan)
    const std::size_t hi = count;
    // X'X holds sums of integer powers of u (|u| <= history, so below 2^26): summed exactly in
    // integers, they are the numbers a floating-point sum of the same terms gives; X'y is summed
    // term by term in reading order
    long long su[5] = {}, sj[3] = {};  // sums of u^0..u^4 over the window; of u^0..u^2 from j on
    for (std::size_t i = lo; i < hi; ++i) {
      const long long ui = static_cast<long long>(i) - static_cast<long long>(j), u2 = ui * ui;
      su[0] += 1;
      su[1] += ui;
      su[2] += u2;
      su[3] += u2 * ui;
      su[4] += u2 * u2;
      if (i >= j) {
        sj[0] += 1;
        sj[1] += ui;
        sj[2] += u2;
      }
      const T u = T(static_cast<double>(i)) - T(static_cast<double>(j));
      const T row[4] = {T(1), u, u * u, i >= j ? T(1) : T(0)};
      const T y = hist[i % history];
      for (int r = 0; r < 4; ++r) a[r][4] += row[r] * y;
    }
    for (int r = 0; r < 3; ++r) {
      for (int c = 0; c < 3; ++c) a[r][c] = T(static_cast<double>(su[r + c]));
      a[r][3] = a[3][r] = T(static_cast<double>(sj[r]));
    }
    a[3][3] = T(static_cast<double>(sj[0]));
    for (int r = 0; r < 4; ++r) a[r][5 + r] = T(1);
    for (int c = 0; c < 4; ++c) {
      int piv = c;
      for (int r = c + 1; r < 4; ++r)
        if ((a[r][c] < T(0) ? -a[r][c] : a[r][c]) > (a[piv][c] < T(0) ? -a[piv][c] : a[piv][c])) piv = r;
      const T pv = a[piv][c] < T(0) ? -a[piv][c] : a[piv][c];
      if (!(pv > T(1e-9))) return false;
      if (piv != c)
        for (int q = 0; q < 9; ++q) {
          const T t = a[c][q];
          a[c][q] = a[piv][q];
          a[piv][q] = t;
        }
      const T inv = T(1) / a[c][c];
      for (int q = 0; q < 9; ++q) a[c][q] *= inv;
      for (int r = 0; r < 4; ++r) {
        if (r == c) continue;
        const T f = a[r][c];
        if (f == T(0)) continue;
        for (int q = 0; q < 9; ++q) a[r][q] -= f * a[c][q];
      }
    }
    for (int r = 0; r < 4; ++r) p[r] = a[r][4];
    T rss = T(0);
    for (std::size_t i = lo; i < hi; ++i) {
      const T u = T(static_cast<double>(i)) - T(static_cast<double>(j));
      const T e = hist[i % history] - (p[0] + p[1] * u + p[2] * u * u + (i >= j ? p[3] : T(0)));
      rss += e * e;
    }
    const std::size_t npts = hi - lo;
    T s = sigma > s_floor ? sigma : s_floor;
    if (npts > 4) {
      const T sr = sqrt(rss / T(static_cast<double>(npts - 4)));
      if (sr > s) s = sr;
    }
    const T vdd = a[3][8];
    if (!(vdd > T(0))) return false;
    z = p[3] / (s * sqrt(vdd));
    return true;
  }
  // Noise of the readings of the current regime kept (median moving range / 0.95387, as
  // health_noise_sigma()): a floor under sigma when sigma was learned from few readings.
  T window_noise() const {
    std::size_t lo = regime;
    if (count > history && lo < count - history) lo = count - history;
    if (count < lo + 3) return T(0);
    T d[history] = {};  // zeroed: keeps the compiler from seeing the selection read an unset element
    std::size_t m = 0;
    for (std::size_t i = lo + 1; i < count; ++i) {
      const T v = hist[i % history] - hist[(i - 1) % history];
      d[m++] = v < T(0) ? -v : v;
    }
    // the median by selection (the same elements a full sort puts in the middle)
    std::nth_element(d, d + m / 2, d + m);
    const T med = m % 2 ? d[m / 2] : (*std::max_element(d, d + m / 2) + d[m / 2]) / 2;
    return med / detail::constant<T>(0.95387255240084L, "0.95387255240084");
  }
  void decide(health_step<T>& step) {
    const int dir = held_dir;
    step.signal_index = held_signal;
    step.index = held_start;
    step.before = target;
    step.after = held_after;
    step.direction = dir;
    step.abrupt = false;
    step.z = scalar_traits<T>::nan();
    // candidates: not yet examined, min_before readings of the regime before, confirm from on
    std::size_t j0 = examined;
    if (j0 < regime + min_before) j0 = regime + min_before;
    if (count > history && j0 < count - history + min_before) j0 = count - history + min_before;
    const T s_floor = window_noise();
    T best = -std::numeric_limits<T>::infinity();
    std::size_t at = 0;
    T bp[4] = {};
    for (std::size_t j = j0; j + confirm <= count; ++j) {
      std::size_t lo = regime;
      if (j >= window_before && lo < j - window_before) lo = j - window_before;
      if (count > history && lo < count - history) lo = count - history;
      T p[4], z;
      if (!fit_jump(j, lo, s_floor, p, z)) continue;
      z *= T(dir);
      if (z > best) {
        best = z;
        at = j;
        for (int q = 0; q < 4; ++q) bp[q] = p[q];
      }
    }
    if (count >= confirm && count - confirm + 1 > examined) examined = count - confirm + 1;
    if (best > -std::numeric_limits<T>::infinity()) step.z = best;
    if (best > z_abrupt()) {
      step.abrupt = true;
      step.index = at;
      step.before = bp[0];
      step.after = bp[0] + bp[3];
      regime = at;
      if (examined < at + 1) examined = at + 1;
      const T u = T(static_cast<double>(count - 1)) - T(static_cast<double>(at));
      target = bp[0] + bp[1] * u + bp[2] * u * u + bp[3];  // the level now, on the fitted trend
    } else {
      target = held_after;
    }
    held_dir = 0;
    c_hi = c_lo = T(0);
    n_hi = n_lo = 0;
  }
};

/// Find level shifts in a series with the tabular CUSUM (health_cusum); a signal still held at
/// the end of the series is decided with the readings there are (health_cusum::finish()).
/// @param x the series (normalised drain flows or fractions), n values
/// @param n number of values
/// @param target mu_0 (NaN: the mean of the first min(4, n) values)
/// @param sigma noise (NaN: health_noise_sigma() of the series; then n >= 3)
/// @param k reference value in sigma (0.5)
/// @param h decision interval in sigma (5)
/// @param out receives up to capacity shifts
/// @param capacity size of out
/// @param work workspace of n values (for the noise estimate)
/// @param found receives the number of shifts found (may exceed capacity; only capacity stored)
/// @return ok; insufficient_data (n < 3 without sigma, or sigma 0); nonfinite; misuse (nulls)
/// @par Source
/// As health_cusum.
template <class T>
inline status health_detect_steps(const T* x, std::size_t n, T target, T sigma, T k, T h, health_step<T>* out,
                                  std::size_t capacity, T* work, std::size_t& found) {
  found = 0;
  if (x == nullptr || (out == nullptr && capacity > 0)) return status::misuse;
  if (!detail::finite(sigma)) {
    const auto s = health_noise_sigma(x, n, work);
    if (is_error(s.st)) return s.st;
    sigma = s.value;
  }
  if (!(sigma > T(0)) || !detail::all_finite(k, h) || !(k >= T(0)) || !(h > T(0)))
    return sigma == T(0) ? status::insufficient_data : status::domain;
  if (n == 0) return status::ok;
  if (!detail::finite(target)) {
    const std::size_t m = n < 4 ? n : 4;
    target = T(0);
    for (std::size_t i = 0; i < m; ++i) target += x[i];
    target /= T(static_cast<double>(m));
  }
  health_cusum<T> c;
  c.reset(target, sigma, k, h);
  for (std::size_t i = 0; i < n; ++i) {
    if (!detail::finite(x[i])) return status::nonfinite;
    health_step<T> s{};
    if (c.update(x[i], s)) {
      if (found < capacity) out[found] = s;
      ++found;
    }
  }
  health_step<T> s{};
  if (c.finish(s)) {  // a signal held at the end: decided with the readings there are
    if (found < capacity) out[found] = s;
    ++found;
  }
  return status::ok;
}
// Mixed argument types (an int literal beside doubles), promoted as Boost.Math promotes:
// one line per public template whose parameters are all scalars (promote.hpp).
PUMPLOSS_PROMOTE(drain_fraction)

}  // namespace pumploss

#endif
