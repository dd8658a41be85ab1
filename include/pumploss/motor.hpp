/// @file motor.hpp
/// @brief Hydraulic motors in the field: the case drain against the inlet flow with its bands,
/// and the creep speed and holding leakage at stall under a held load (winch and slew drives).
/// Theory: @ref theory_flow_test.
///
/// SI: flow in m^3/s, pressure in Pa, torque in N m, displacement in m^3/rev, speed in rev/s.
#ifndef PUMPLOSS_MOTOR_HPP
#define PUMPLOSS_MOTOR_HPP

#include <cmath>

#include "promote.hpp"
#include "scalar_traits.hpp"
#include "status.hpp"

namespace pumploss {

/// Band of a motor's case drain fraction.
enum class motor_drain_band : int {
  sound = 0,       ///< at or below the sound limit
  acceptable = 1,  ///< above sound, at or below the acceptable limit
  elevated = 2,    ///< above acceptable, below the worn limit
  worn = 3         ///< at or above the worn limit
};

/// Band limits of a motor's case drain fraction (drain flow / inlet flow at the test point).
///
/// Defaults 0.05 / 0.10 / 0.15 (common practice, no source): the figures the trade uses for
/// piston pumps at maximum pressure (about 5 % for a good machine, up to about 10 % for a very
/// large one, 15 % or more for a small, poor or worn one) carried over to piston motors, judged
/// at the motor's rated pressure. The motor maker's figure, where given, replaces them.
template <class T>
struct motor_drain_bands {
  T sound_max = T(0.05);       ///< largest sound fraction
  T acceptable_max = T(0.10);  ///< largest acceptable fraction
  T worn_min = T(0.15);        ///< smallest worn fraction
};

/// Result of a motor case drain reading.
template <class T>
struct [[nodiscard]] motor_drain_result {
  T fraction;              ///< q_drain / q_inlet
  T volumetric_efficiency; ///< 1 - fraction (external leakage only; cross-port leakage not seen by the drain)
  motor_drain_band band;   ///< the band of the fraction
  pumploss::status st;     ///< ok; implausible when the drain exceeds the inlet flow; errors
  /// @return true when the status is exactly ok.
  bool ok() const noexcept { return st == pumploss::status::ok; }
  /// @return true when the results are usable (ok or a report such as regime).
  bool usable() const noexcept { return pumploss::is_usable(st); }
};

/// Judge a hydraulic motor's case drain against its inlet flow.
///
/// \f[ f = \frac{q_{drain}}{q_{in}} \f]
///
/// @param drain_m3_s case drain flow, m^3/s (>= 0)
/// @param inlet_m3_s inlet flow to the motor at the same moment, m^3/s (> 0)
/// @param bands band limits (0 < sound <= acceptable <= worn <= 1)
/// @return fraction, 1 - fraction and band; status::implausible when the drain is not below
///         the inlet flow; status::domain; status::nonfinite.
/// @par Validity
/// Steady running at a known load pressure; the drain measured over at least a few seconds at
/// working temperature. Engineering estimate: the motor maker's limit governs.
/// @par Source
/// Bands common practice, no source (see motor_drain_bands); ratio by definition.
template <class T>
inline motor_drain_result<T> motor_drain_check(T drain_m3_s, T inlet_m3_s, const motor_drain_bands<T>& bands) {
  const T nan = scalar_traits<T>::nan();
  if (!detail::all_finite(drain_m3_s, inlet_m3_s, bands.sound_max, bands.acceptable_max, bands.worn_min))
    return {nan, nan, motor_drain_band::worn, status::nonfinite};
  if (!(drain_m3_s >= T(0)) || !(inlet_m3_s > T(0)) || !(bands.sound_max > T(0)) ||
      !(bands.acceptable_max >= bands.sound_max) || !(bands.worn_min >= bands.acceptable_max) ||
      !(bands.worn_min <= T(1)))
    return {nan, nan, motor_drain_band::worn, status::domain};
  const T f = drain_m3_s / inlet_m3_s;
  motor_drain_band b = motor_drain_band::worn;
  if (f <= bands.sound_max)
    b = motor_drain_band::sound;
  else if (f <= bands.acceptable_max)
    b = motor_drain_band::acceptable;
  else if (f < bands.worn_min)
    b = motor_drain_band::elevated;
  return {f, T(1) - f, b, f >= T(1) ? status::implausible : status::ok};
}

/// Result of a creep (held load) estimate.
template <class T>
struct [[nodiscard]] motor_creep_result {
  T holding_pressure_pa;  ///< pressure the held load makes in the loaded port, Pa
  T leakage_m3_s;         ///< leakage out of the loaded port at that pressure and viscosity, m^3/s
  T creep_speed_rev_s;    ///< shaft creep speed, rev/s
  T load_speed_m_s;       ///< creep of the load (creep speed times travel per revolution), m/s (0 without travel)
  pumploss::status st;    ///< ok; extrapolated when the holding pressure exceeds 1.25 times the leak test pressure; errors
  /// @return true when the status is exactly ok.
  bool ok() const noexcept { return st == pumploss::status::ok; }
  /// @return true when the results are usable (ok or a report such as regime).
  bool usable() const noexcept { return pumploss::is_usable(st); }
};

/// Creep of a hydraulic motor holding a load with its ports blocked (no brake): the load makes a
/// pressure in the loaded port, the motor's leakage (cross-port and drain) leaves that port, and
/// the motor turns as fast as the leakage allows.
///
/// \f[ \Delta p_h = \frac{2\pi M \eta_{hm}}{V},\qquad
///     q_L = q_{L,t}\,\frac{\Delta p_h}{\Delta p_t}\,\frac{\mu_t}{\mu},\qquad
///     n_c = \frac{q_L}{V},\qquad v_c = n_c\,s \f]
///
/// @param displacement_m3_rev motor displacement V, m^3/rev (> 0)
/// @param load_torque_nm torque of the held load at the motor shaft, N m (>= 0)
/// @param hydromech_efficiency hydromechanical efficiency of the motor driven backwards by the load,
///        (0, 1]: friction helps to hold, so the port pressure is 2 pi M eta / V; 1 is the
///        conservative choice (highest pressure, fastest creep)
/// @param leak_test_m3_s leakage of the motor measured at stall (ports loaded, shaft locked), m^3/s (>= 0)
/// @param leak_test_dp_pa pressure of that measurement, Pa (> 0)
/// @param leak_test_mu_pa_s oil viscosity at that measurement, Pa s (> 0)
/// @param mu_pa_s oil viscosity while holding, Pa s (> 0)
/// @param travel_per_rev_m load travel per motor revolution (drum circumference / ratio), m (>= 0; 0: none)
/// @return the estimate; status::extrapolated beyond 1.25 times the test pressure; status::domain;
///         status::nonfinite.
/// @par Validity
/// Laminar leakage (proportional to pressure, inversely to viscosity); steady creep (the
/// compression of the trapped oil is a transient and not included); valves and lines
/// leak-free. A load that must not move needs a brake: creep is never zero.
/// Engineering estimate: the motor and winch makers' holding rules govern.
/// @par Source
/// Laminar leakage law (Rabie, Fluid Power Engineering, McGraw-Hill 2009, ch. 2); torque and
/// pressure of a machine driven as a pump, \f$2\pi M \eta_{hm} = V\Delta p\f$ (ISO 4409:2019
/// definitions).
template <class T, detail::if_real<T> = 0>
inline motor_creep_result<T> motor_creep(T displacement_m3_rev, T load_torque_nm, T hydromech_efficiency,
                                         T leak_test_m3_s, T leak_test_dp_pa, T leak_test_mu_pa_s, T mu_pa_s,
                                         T travel_per_rev_m) {
  const T nan = scalar_traits<T>::nan();
  if (!detail::all_finite(displacement_m3_rev, load_torque_nm, hydromech_efficiency, leak_test_m3_s, leak_test_dp_pa,
                          leak_test_mu_pa_s, mu_pa_s, travel_per_rev_m))
    return {nan, nan, nan, nan, status::nonfinite};
  if (!(displacement_m3_rev > T(0)) || !(load_torque_nm >= T(0)) || !(hydromech_efficiency > T(0)) ||
      !(hydromech_efficiency <= T(1)) || !(leak_test_m3_s >= T(0)) || !(leak_test_dp_pa > T(0)) ||
      !(leak_test_mu_pa_s > T(0)) || !(mu_pa_s > T(0)) || !(travel_per_rev_m >= T(0)))
    return {nan, nan, nan, nan, status::domain};
  const T dp = 2 * detail::pi<T>() * load_torque_nm * hydromech_efficiency / displacement_m3_rev;
  const T q = leak_test_m3_s * (dp / leak_test_dp_pa) * (leak_test_mu_pa_s / mu_pa_s);
  const T n = q / displacement_m3_rev;
  const status st = dp > detail::constant<T>(1.25L, "1.25") * leak_test_dp_pa ? status::extrapolated : status::ok;
  if (!detail::all_finite(dp, q, n)) return {nan, nan, nan, nan, status::overflow};
  return {dp, q, n, n * travel_per_rev_m, st};
}

/// Word for a motor drain band ("sound", "acceptable", "elevated", "worn"; "unknown" otherwise).
/// @param b the band
/// @return the word (static storage)
inline const char* motor_drain_band_name(motor_drain_band b) noexcept {
  switch (b) {
    case motor_drain_band::sound: return "sound";
    case motor_drain_band::acceptable: return "acceptable";
    case motor_drain_band::elevated: return "elevated";
    case motor_drain_band::worn: return "worn";
  }
  return "unknown";
}

// Mixed argument types (an int literal beside doubles), promoted as Boost.Math promotes:
// one line per public template whose parameters are all scalars (promote.hpp).
PUMPLOSS_PROMOTE(motor_creep)

}  // namespace pumploss

#endif
