/// @file health.hpp
/// @brief Health verdict of a pump from field readings of its case drain flow.
///
/// A maintenance engineer reads the case drain flow (with outlet pressure, oil temperature and
/// speed) and must say whether the pump is healthy. Three indicators, each with its reason:
/// 1. the drain fraction, drain flow over the maximum displacement flow, after normalising the
///    reading to the reference pressure and temperature, against configurable bands;
/// 2. the growth of the normalised drain flow over the pump's own baseline (new-pump reading);
/// 3. the drain oil's temperature rise over the inlet, against what throttling alone explains.
///
/// Default bands are common practice of the trade, no source: at maximum pressure a
/// high-quality piston pump drains about 5 % of its maximum displacement flow, very large pumps
/// up to about 10 %, small, poorly made or worn pumps 15 % or more. Every band is configurable.
/// Verdicts are engineering estimates; the pump maker's data govern.
#ifndef PUMPLOSS_HEALTH_HPP
#define PUMPLOSS_HEALTH_HPP

#include <cmath>
#include <cstddef>

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
/// @param drain_flow_m3_s measured case drain flow q_V3, m^3/s, >= 0
/// @param max_displacement_m3_rev maximum (geometric) displacement V_max, m^3/rev, > 0
/// @param speed_rev_s shaft speed n, rev/s, > 0
/// @return the fraction (dimensionless, 0.05 = 5 %); status::domain for a negative flow or a
///         non-positive displacement or speed; status::implausible when the fraction exceeds 1.
/// @par Source
/// Definition; the bands it is compared with are common practice (see health.hpp).
template <class T>
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

/// Reasons behind a verdict (bit flags; several may be set).
enum health_reason : unsigned {
  reason_fraction_sound = 1u << 0,       ///< normalised fraction at or below the sound band
  reason_fraction_acceptable = 1u << 1,  ///< normalised fraction in the acceptable band
  reason_fraction_elevated = 1u << 2,    ///< normalised fraction between acceptable and worn
  reason_fraction_worn = 1u << 3,        ///< normalised fraction at or beyond the worn band
  reason_growth_moderate = 1u << 4,      ///< growth over the baseline beyond the watch limit
  reason_growth_large = 1u << 5,         ///< growth over the baseline beyond the worn limit
  reason_drain_hot = 1u << 6,            ///< drain oil hotter than throttling alone explains
  reason_low_pressure_reading = 1u << 7, ///< reading taken below half the reference pressure: normalisation less certain
  reason_no_baseline = 1u << 8,          ///< no baseline given: growth not assessed
  reason_no_temperatures = 1u << 9       ///< drain or inlet temperature not given: heat indicator not assessed
};

/// A sentence for one reason bit (static storage, never null).
/// @param reason one health_reason bit
/// @return the sentence; a sentence saying so for an unknown bit
PUMPLOSS_CXX_API const char* health_reason_text(unsigned reason) noexcept;

/// A short name for a level ("sound", "acceptable", "elevated", "worn"; "unknown" otherwise).
/// @param level the level
/// @return the name (static storage)
PUMPLOSS_CXX_API const char* health_level_name(health_level level) noexcept;

/// Bands and limits of the verdict; every one configurable.
template <class T>
struct health_bands {
  T sound_max = detail::constant<T>(0.05L, "0.05");       ///< fraction up to which a pump is sound (common practice: ~5 %)
  T acceptable_max = detail::constant<T>(0.10L, "0.10");  ///< upper end of acceptable (common practice: very large pumps ~10 %)
  T worn_min = detail::constant<T>(0.15L, "0.15");        ///< fraction from which a pump is worn (common practice: 15 % or more)
  T growth_moderate = detail::constant<T>(0.25L, "0.25"); ///< growth over baseline flagged moderate (our default, no source)
  T growth_large = detail::constant<T>(0.50L, "0.50");    ///< growth over baseline flagged large (our default, no source)
  T hot_margin = T(1);  ///< drain rise flagged when above hot_margin x the throttling rise (our default, no source)
};

/// The reference state to which readings are normalised, and the pump's facts.
template <class T>
struct health_reference {
  T max_displacement_m3_rev;  ///< maximum displacement V_max, m^3/rev
  T reference_dp_pa;          ///< reference pressure difference outlet to case (usually the maximum), Pa
  T reference_t_k;            ///< reference oil temperature, K
  d341_line<T> viscosity;     ///< the oil's ASTM D341 line
  T rho_kg_m3;                ///< oil density, kg/m^3 (for the throttling rise)
  T cp_j_kg_k;                ///< oil specific heat, J/(kg K)
  T pressure_exponent = T(1);  ///< a in q ~ dp^a, 0..2 (1: laminar clearance flow, 0.5: orifice)
  T viscosity_exponent = T(1); ///< b in q ~ mu^-b, 0..2 (1: laminar clearance flow)
  T baseline_m3_s = scalar_traits<T>::nan();  ///< baseline drain flow at the reference state (NaN: none)
};

/// One field reading.
template <class T>
struct health_reading {
  T drain_flow_m3_s;  ///< case drain flow, m^3/s
  T outlet_pa;        ///< pump outlet pressure (gauge), Pa
  T case_pa;          ///< case pressure (gauge), Pa (0 if not measured)
  T oil_t_k;          ///< oil temperature governing the clearances (case or inlet), K
  T speed_rev_s;      ///< shaft speed, rev/s
  T drain_t_k = scalar_traits<T>::nan();  ///< drain oil temperature, K (NaN: not measured)
  T inlet_t_k = scalar_traits<T>::nan();  ///< inlet oil temperature, K (NaN: not measured)
};

/// A verdict with its reasons and figures.
template <class T>
struct [[nodiscard]] health_assessment {
  health_level level;               ///< the verdict
  unsigned reasons;                 ///< health_reason bits
  T fraction;                       ///< drain fraction as read
  T fraction_at_reference;          ///< drain fraction normalised to the reference state
  T drain_at_reference_m3_s;        ///< drain flow normalised to the reference state, m^3/s
  T growth;                         ///< normalised drain over baseline minus 1 (NaN without baseline)
  T drain_rise_k;                   ///< drain minus inlet temperature, K (NaN if not measured)
  T throttling_rise_k;              ///< dp/(rho cp): rise of oil throttled from outlet to case, K
  pumploss::status st;              ///< status of the assessment
  /// @return true when the status is exactly ok.
  bool ok() const noexcept { return st == pumploss::status::ok; }
  /// @return true when the results are usable (ok or a report such as regime).
  bool usable() const noexcept { return pumploss::is_usable(st); }
};

/// Normalise a drain reading to the reference state with the power law
/// \f$ q_{ref} = q\,(\Delta p_{ref}/\Delta p)^a\,(\mu/\mu_{ref})^b \f$, viscosities from the
/// oil's D341 line (kinematic viscosity; the density ratio is ignored, below 2 %).
/// @param ref the reference state
/// @param r the reading
/// @return the drain flow at the reference state, m^3/s
/// @par Source
/// Laminar leakage scaling q ~ dp/mu (docs/pages/theory_efficiency.md, leakage scaling); exponents configurable; computed by
/// leakage_scale_power_law().
template <class T>
inline result<T> health_normalise(const health_reference<T>& ref, const health_reading<T>& r) {
  if (!detail::all_finite(r.drain_flow_m3_s, r.outlet_pa, r.case_pa, r.oil_t_k, ref.reference_dp_pa,
                          ref.reference_t_k, ref.pressure_exponent, ref.viscosity_exponent))
    return detail::fail<T>(status::nonfinite);
  const T dp = r.outlet_pa - r.case_pa;
  if (!(dp > T(0)) || !(ref.reference_dp_pa > T(0)) || !(r.drain_flow_m3_s >= T(0)) ||
      !(ref.pressure_exponent >= T(0)) || !(ref.viscosity_exponent >= T(0)))
    return detail::fail<T>(status::domain);
  const auto nu = d341_viscosity(ref.viscosity, r.oil_t_k);
  if (is_error(nu.st)) return detail::fail<T>(nu.st);
  const auto nu_ref = d341_viscosity(ref.viscosity, ref.reference_t_k);
  if (is_error(nu_ref.st)) return detail::fail<T>(nu_ref.st);
  // the reading plays the known state of the power law, the reference state the wanted one
  const auto q = leakage_scale_power_law(r.drain_flow_m3_s, dp, nu.value, ref.reference_dp_pa, nu_ref.value,
                                         ref.pressure_exponent, ref.viscosity_exponent);
  if (is_error(q.st)) return q;
  return {q.value, worst(q.st, worst(nu.st, nu_ref.st))};
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
}  // namespace detail

/// Assess one field reading.
///
/// Level = the worst of: the band of the normalised drain fraction
/// \f$ \phi_{ref} = q_{ref}/(V_{max} n) \f$; growth \f$ g = q_{ref}/q_{base} - 1 \f$ beyond
/// growth_moderate (at least acceptable) or growth_large (worn); a drain rise
/// \f$ T_3 - T_1 \f$ above hot_margin x \f$ \Delta p/(\rho c_p) \f$ (at least elevated).
///
/// @param ref reference state and pump facts
/// @param bands bands and limits
/// @param r the reading
/// @return the assessment; its st is status::domain / status::nonfinite for bad readings
///         (figures NaN), status::implausible when the drain fraction exceeds 1.
/// @par Source
/// Bands: common practice, no source (see health.hpp). Throttling rise: first law for an
/// adiabatic throttle of a liquid with constant rho and cp (docs/pages/theory_efficiency.md, Heat).
template <class T>
inline health_assessment<T> assess_health(const health_reference<T>& ref, const health_bands<T>& bands,
                                          const health_reading<T>& r) {
  const T nan = scalar_traits<T>::nan();
  health_assessment<T> a{health_level::sound, 0u, nan, nan, nan, nan, nan, nan, status::ok};
  auto fail = [&](status s) {
    a = health_assessment<T>{health_level::sound, 0u, nan, nan, nan, nan, nan, nan, s};
    return a;
  };
  if (!detail::all_finite(bands.sound_max, bands.acceptable_max, bands.worn_min, bands.growth_moderate,
                          bands.growth_large, bands.hot_margin, ref.max_displacement_m3_rev,
                          r.speed_rev_s))
    return fail(status::nonfinite);
  if (!(bands.sound_max > T(0)) || !(bands.acceptable_max >= bands.sound_max) ||
      !(bands.worn_min >= bands.acceptable_max) || !(bands.growth_moderate > T(0)) ||
      !(bands.growth_large >= bands.growth_moderate) || !(bands.hot_margin > T(0)))
    return fail(status::domain);
  const auto f = drain_fraction(r.drain_flow_m3_s, ref.max_displacement_m3_rev, r.speed_rev_s);
  if (is_error(f.st)) return fail(f.st);
  const auto qref = health_normalise(ref, r);
  if (is_error(qref.st)) return fail(qref.st);
  const auto fref = drain_fraction(qref.value, ref.max_displacement_m3_rev, r.speed_rev_s);
  if (is_error(fref.st)) return fail(fref.st);
  a.fraction = f.value;
  a.fraction_at_reference = fref.value;
  a.drain_at_reference_m3_s = qref.value;
  a.st = worst(worst(f.st, qref.st), fref.st);
  a.level = detail::level_of_fraction(bands, fref.value, a.reasons);
  if ((r.outlet_pa - r.case_pa) < ref.reference_dp_pa / 2) a.reasons |= reason_low_pressure_reading;

  if (detail::finite(ref.baseline_m3_s)) {
    if (!(ref.baseline_m3_s > T(0))) return fail(status::domain);
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
    if (!(ref.rho_kg_m3 > T(0)) || !(ref.cp_j_kg_k > T(0))) return fail(status::domain);
    a.drain_rise_k = r.drain_t_k - r.inlet_t_k;
    a.throttling_rise_k = (r.outlet_pa - r.case_pa) / (ref.rho_kg_m3 * ref.cp_j_kg_k);
    if (a.drain_rise_k > bands.hot_margin * a.throttling_rise_k) {
      a.reasons |= reason_drain_hot;
      a.level = detail::max_level(a.level, health_level::elevated);
    }
  } else {
    a.reasons |= reason_no_temperatures;
  }
  return a;
}

/// Linear trend of normalised drain flow over time, by least squares.
template <class T>
struct [[nodiscard]] health_trend {
  T slope_per_day;     ///< growth of the normalised drain fraction per day (1/day)
  T intercept;         ///< fitted fraction at day 0
  T days_to_worn;      ///< days from the last reading until the fit crosses the worn band (inf if not rising, 0 if there)
  pumploss::status st; ///< status::insufficient_data for fewer than 2 readings or one single day
  /// @return true when the status is exactly ok.
  bool ok() const noexcept { return st == pumploss::status::ok; }
  /// @return true when the results are usable (ok or a report such as regime).
  bool usable() const noexcept { return pumploss::is_usable(st); }
};

/// Fit a straight line to (day, normalised drain fraction) and project it to the worn band.
/// @param days reading times in days (any origin), n values
/// @param fractions normalised drain fractions, n values
/// @param n number of readings, >= 2
/// @param worn_min the worn band's lower edge (fraction)
/// @return the trend
/// @par Source
/// Ordinary least squares in centred form (slope = Sxy/Sxx).
template <class T>
inline health_trend<T> fit_health_trend(const T* days, const T* fractions, std::size_t n, T worn_min) {
  const T nan = scalar_traits<T>::nan();
  health_trend<T> out{nan, nan, nan, status::ok};
  if (days == nullptr || fractions == nullptr) {
    out.st = status::misuse;
    return out;
  }
  if (n < 2) {
    out.st = status::insufficient_data;
    return out;
  }
  T mx = T(0), my = T(0), last = days[0];
  for (std::size_t i = 0; i < n; ++i) {
    if (!detail::all_finite(days[i], fractions[i])) {
      out.st = status::nonfinite;
      return out;
    }
    mx += days[i];
    my += fractions[i];
    if (days[i] > last) last = days[i];
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

// Mixed argument types (an int literal beside doubles), promoted as Boost.Math promotes:
// one line per public template whose parameters are all scalars (promote.hpp).
PUMPLOSS_PROMOTE(drain_fraction)

}  // namespace pumploss

#endif
