/// @file flow_test.hpp
/// @brief The field flow test of any pump (gear, vane, piston): an inline flow meter and a
/// loading valve give the flow with no load and at a test pressure; the drive's speed under load
/// (measured, or an induction motor's slip from its nameplate), a laminar correction of the
/// leakage to a reference viscosity and pressure, the volumetric efficiency, the percent of new
/// and a verdict against a limit. Theory: @ref theory_flow_test.
///
/// SI: flow in m^3/s, pressure in Pa (gauge, pump outlet against its inlet), speed in rev/s,
/// torque in N m, power in W, viscosity in Pa s.
#ifndef PUMPLOSS_FLOW_TEST_HPP
#define PUMPLOSS_FLOW_TEST_HPP

#include <cmath>

#include "scalar_traits.hpp"
#include "status.hpp"

namespace pumploss {

/// An induction motor's nameplate: what is needed for its speed under load.
template <class T>
struct induction_motor {
  T sync_speed_rev_s;   ///< synchronous speed 2 f / poles, rev/s (e.g. 25 rev/s = 1500 rpm at 50 Hz, 4 poles)
  T rated_speed_rev_s;  ///< nameplate (full-load) speed, rev/s (< synchronous)
  T rated_power_w;      ///< nameplate shaft power, W
};

/// Speed of an induction motor at a shaft torque, slip proportional to torque (the linear part
/// of the torque-speed curve below rated load):
///
/// \f[ n = n_s - (n_s - n_r)\,\frac{M}{M_r}, \qquad M_r = \frac{P_r}{2\pi n_r} \f]
///
/// @param m the nameplate
/// @param torque_nm shaft torque, N m, >= 0
/// @return speed in rev/s; status::regime when M/M_r exceeds 1.5 (the curve is no longer
///         linear towards breakdown torque); status::domain for n_r >= n_s, a non-positive value
///         or a negative torque; status::nonfinite.
/// @par Validity
/// Steady load, rated voltage and frequency; slip proportional to torque holds from no load to
/// about rated load for standard squirrel-cage motors.
/// @par Accuracy
/// Rounding only (tests/flow_test_test.cpp: hand calculation).
/// @par Source
/// Linear low-slip region of the induction motor torque-slip relation (torque proportional to
/// slip for small slip): A. E. Fitzgerald, C. Kingsley, S. D. Umans, Electric Machinery, 6th ed.,
/// McGraw-Hill 2003, section 7.5 (from memory).
template <class T>
inline result<T> induction_motor_speed(const induction_motor<T>& m, T torque_nm) {
  if (!detail::all_finite(m.sync_speed_rev_s, m.rated_speed_rev_s, m.rated_power_w, torque_nm))
    return detail::fail<T>(status::nonfinite);
  if (!(m.rated_speed_rev_s > T(0)) || !(m.sync_speed_rev_s > m.rated_speed_rev_s) || !(m.rated_power_w > T(0)) ||
      !(torque_nm >= T(0)))
    return detail::fail<T>(status::domain);
  const T m_rated = m.rated_power_w / (2 * detail::pi<T>() * m.rated_speed_rev_s);
  const T load = torque_nm / m_rated;
  const T n = m.sync_speed_rev_s - (m.sync_speed_rev_s - m.rated_speed_rev_s) * load;
  if (!(n > T(0))) return detail::fail<T>(status::out_of_validity);
  return {n, load > detail::constant<T>(1.5L, "1.5") ? status::regime : status::ok};
}

/// Verdict of a flow test.
enum class flow_verdict : int {
  pass = 0,   ///< percent of new at or above limit + watch band
  watch = 1,  ///< between the limit and limit + watch band: test again sooner
  fail = 2    ///< below the limit: repair or replace
};

/// Default limit of the percent of new: 0.85 (a pump delivering less than about 85 % of its
/// new flow at the test pressure is usually judged worn; common practice, no source).
inline constexpr double flow_test_default_limit = 0.85;
/// Default watch band above the limit: 0.05 (common practice, no source).
inline constexpr double flow_test_default_watch_band = 0.05;

/// One reading of a flow test.
template <class T>
struct flow_reading {
  T flow_m3_s;    ///< flow at the meter, m^3/s (> 0)
  T pressure_pa;  ///< pump outlet pressure against its inlet, Pa (>= 0)
  T speed_rev_s;  ///< drive speed measured at this reading, rev/s (> 0), or 0 to take it from the motor
};

/// Inputs of a flow test evaluation beyond the two readings.
template <class T>
struct flow_test_setup {
  T displacement_m3_rev;     ///< stated displacement, m^3/rev, or 0: derived from the two readings
  T hydromech_efficiency;    ///< assumed hydromechanical efficiency for the drive torque, (0, 1] (used with a motor)
  induction_motor<T> motor;  ///< nameplate, used for readings whose speed is 0 (else ignored)
  T mu_test_pa_s;            ///< oil viscosity in the pump during the test, Pa s (> 0)
  T mu_ref_pa_s;             ///< reference viscosity (that of the new pump's rating), Pa s (> 0)
  T ref_pressure_pa;         ///< reference pressure (rated), Pa (> 0)
  T ref_speed_rev_s;         ///< reference speed (rated), rev/s (> 0)
  T new_volumetric_efficiency;  ///< volumetric efficiency of the pump when new at the reference, (0, 1]
  T limit;                   ///< percent of new below which the pump fails, as a fraction (flow_test_default_limit)
  T watch_band;              ///< band above the limit that reads "watch", fraction (flow_test_default_watch_band)
};

/// Result of a flow test evaluation.
template <class T>
struct [[nodiscard]] flow_test_result {
  T speed_no_load_rev_s;      ///< drive speed at the no-load reading, rev/s (measured or from the motor)
  T speed_loaded_rev_s;       ///< drive speed at the loaded reading, rev/s
  T displacement_m3_rev;      ///< displacement used, m^3/rev (stated, or derived)
  T derived_displacement_m3_rev;  ///< displacement from the two readings with the laminar model, m^3/rev
  T leak_conductance_m3_s_pa; ///< leakage per pressure at the test viscosity, (m^3/s)/Pa
  T leakage_m3_s;             ///< leakage at the loaded reading, m^3/s
  T volumetric_efficiency;    ///< q_loaded / (V n_loaded) at the test
  T uncorrected_ratio;        ///< q_loaded / q_no_load (what the raw readings suggest; speed fall included)
  T leakage_ref_m3_s;         ///< leakage at the reference pressure and viscosity, m^3/s
  T volumetric_efficiency_ref;///< 1 - leakage_ref / (V n_ref)
  T percent_of_new;           ///< volumetric_efficiency_ref / new_volumetric_efficiency (fraction)
  flow_verdict verdict;       ///< pass, watch or fail against the limit
  pumploss::status st;        ///< ok, or a report (regime, extrapolated, implausible) or an error
  /// @return true when the status is exactly ok.
  bool ok() const noexcept { return st == pumploss::status::ok; }
  /// @return true when the results are usable (ok or a report such as regime).
  bool usable() const noexcept { return pumploss::is_usable(st); }
};

/// Evaluate a field flow test of a pump: two readings (no load and loaded), the drive speed at
/// each, laminar leakage corrected to a reference, and a verdict.
///
/// The delivered flow is \f$ q = V n - G\,\Delta p \f$ with one laminar leak conductance \f$G\f$
/// at the test viscosity. From the readings \f$(q_0, \Delta p_0, n_0)\f$ and \f$(q_1, \Delta p_1, n_1)\f$:
/// \f[ V_d = \frac{q_0 \Delta p_1 - q_1 \Delta p_0}{n_0 \Delta p_1 - n_1 \Delta p_0},\qquad
///     G = \frac{V n_1 - q_1}{\Delta p_1},\qquad \eta_v = \frac{q_1}{V n_1} \f]
/// with \f$V = V_d\f$ unless a displacement is stated (then \f$G\f$ uses the stated one). A
/// reading with speed 0 takes the motor's speed at the torque
/// \f$ M = V\Delta p / (2\pi\eta_{hm}) \f$ (induction_motor_speed(), iterated with \f$V_d\f$).
/// At the reference (laminar leakage scales as \f$\Delta p/\mu\f$):
/// \f[ q_{L,ref} = G\,\frac{\mu_{test}}{\mu_{ref}}\,\Delta p_{ref},\qquad
///     \eta_{v,ref} = 1 - \frac{q_{L,ref}}{V n_{ref}},\qquad
///     \text{percent of new} = \frac{\eta_{v,ref}}{\eta_{v,new}} \f]
///
/// @param no_load the reading with the loading valve open (lowest pressure)
/// @param loaded the reading at the test pressure (> the no-load pressure)
/// @param s the setup (reference state, new pump's efficiency, limit, motor when speeds are 0)
/// @return the result; reports: status::extrapolated when the reference pressure exceeds 1.25
///         times the test pressure or the viscosity ratio lies outside [1/3, 3];
///         status::implausible when the leakage comes out negative or the stated and derived
///         displacements differ by more than 5 %; status::regime from the motor (over 1.5 times
///         rated torque). Errors: status::domain (loaded pressure not above the no-load
///         pressure, bad setup), status::nonfinite, status::no_convergence.
/// @par Validity
/// Steady readings at one oil temperature; leakage laminar (proportional to pressure, inversely
/// to viscosity, independent of speed); the pump's displacement fixed. Compressibility of the
/// oil between pump and meter and the meter's own temperature error are not corrected.
/// Engineering estimate: the pump maker's data and test procedure govern.
/// @par Accuracy
/// Rounding only (closed form; the motor iteration converges to 1e-15 relative);
/// tests/flow_test_test.cpp checks a hand calculation with motor slip and scenarios generated
/// from a known pump with noise.
/// @par Source
/// Volumetric efficiency by ISO 4409:2019 (definitions); laminar leakage law (Rabie, Fluid Power
/// Engineering, McGraw-Hill 2009, ch. 2); the field procedure (flow meter with loading valve,
/// percent of new) common practice, no source. See @ref theory_flow_test.
template <class T>
inline flow_test_result<T> flow_test_evaluate(const flow_reading<T>& no_load, const flow_reading<T>& loaded,
                                              const flow_test_setup<T>& s) {
  using std::abs;
  const T nan = scalar_traits<T>::nan();
  flow_test_result<T> r{nan, nan, nan, nan, nan, nan, nan, nan, nan, nan, nan, flow_verdict::fail, status::ok};
  auto fail = [&](status st) {
    r = flow_test_result<T>{nan, nan, nan, nan, nan, nan, nan, nan, nan, nan, nan, flow_verdict::fail, st};
    return r;
  };
  if (!detail::all_finite(no_load.flow_m3_s, no_load.pressure_pa, no_load.speed_rev_s, loaded.flow_m3_s,
                          loaded.pressure_pa, loaded.speed_rev_s, s.displacement_m3_rev, s.hydromech_efficiency,
                          s.mu_test_pa_s, s.mu_ref_pa_s, s.ref_pressure_pa, s.ref_speed_rev_s,
                          s.new_volumetric_efficiency, s.limit, s.watch_band))
    return fail(status::nonfinite);
  if (!(no_load.flow_m3_s > T(0)) || !(loaded.flow_m3_s > T(0)) || !(no_load.pressure_pa >= T(0)) ||
      !(loaded.pressure_pa > no_load.pressure_pa) || !(no_load.speed_rev_s >= T(0)) ||
      !(loaded.speed_rev_s >= T(0)) || !(s.displacement_m3_rev >= T(0)) || !(s.mu_test_pa_s > T(0)) ||
      !(s.mu_ref_pa_s > T(0)) || !(s.ref_pressure_pa > T(0)) || !(s.ref_speed_rev_s > T(0)) ||
      !(s.new_volumetric_efficiency > T(0)) || !(s.new_volumetric_efficiency <= T(1)) || !(s.limit > T(0)) ||
      !(s.limit <= T(1)) || !(s.watch_band >= T(0)) || !(s.watch_band < T(1)))
    return fail(status::domain);
  const bool use_motor = !(no_load.speed_rev_s > T(0)) || !(loaded.speed_rev_s > T(0));
  if (use_motor && (!(s.hydromech_efficiency > T(0)) || !(s.hydromech_efficiency <= T(1))))
    return fail(status::domain);
  status st = status::ok;
  const T p0 = no_load.pressure_pa, p1 = loaded.pressure_pa;
  const T q0 = no_load.flow_m3_s, q1 = loaded.flow_m3_s;
  T n0 = no_load.speed_rev_s, n1 = loaded.speed_rev_s;
  auto derive = [&]() { return (q0 * p1 - q1 * p0) / (n0 * p1 - n1 * p0); };
  T v = s.displacement_m3_rev;
  if (use_motor) {
    // speed from the motor at the torque of each reading; the displacement in the torque is the
    // stated one, or the derived one by fixed-point iteration (slip is a few per cent: contraction)
    const T two_pi_eta = 2 * detail::pi<T>() * s.hydromech_efficiency;
    T vt = s.displacement_m3_rev > T(0) ? s.displacement_m3_rev : q0 / s.motor.sync_speed_rev_s;
    bool converged = false;
    for (int it = 0; it < 60; ++it) {
      if (!(no_load.speed_rev_s > T(0))) {
        const auto m0 = induction_motor_speed(s.motor, vt * p0 / two_pi_eta);
        if (is_error(m0.st)) return fail(m0.st);
        st = worst(st, m0.st);
        n0 = m0.value;
      }
      if (!(loaded.speed_rev_s > T(0))) {
        const auto m1 = induction_motor_speed(s.motor, vt * p1 / two_pi_eta);
        if (is_error(m1.st)) return fail(m1.st);
        st = worst(st, m1.st);
        n1 = m1.value;
      }
      if (s.displacement_m3_rev > T(0)) {
        converged = true;
        break;
      }
      const T vn = derive();
      if (!detail::finite(vn) || !(vn > T(0))) return fail(status::out_of_validity);
      if (abs(vn - vt) <= detail::constant<T>(1e-15L, "1e-15") * vn) {
        vt = vn;
        converged = true;
        break;
      }
      vt = vn;
    }
    if (!converged) return fail(status::no_convergence);
  }
  r.speed_no_load_rev_s = n0;
  r.speed_loaded_rev_s = n1;
  r.derived_displacement_m3_rev = derive();
  if (!detail::finite(r.derived_displacement_m3_rev) || !(r.derived_displacement_m3_rev > T(0)))
    return fail(status::out_of_validity);
  if (!(v > T(0))) v = r.derived_displacement_m3_rev;
  r.displacement_m3_rev = v;
  if (abs(r.derived_displacement_m3_rev / v - T(1)) > detail::constant<T>(0.05L, "0.05"))
    st = worst(st, status::implausible);
  r.leakage_m3_s = v * n1 - q1;
  r.leak_conductance_m3_s_pa = r.leakage_m3_s / p1;
  if (r.leakage_m3_s < T(0)) st = worst(st, status::implausible);
  r.volumetric_efficiency = q1 / (v * n1);
  r.uncorrected_ratio = q1 / q0;
  r.leakage_ref_m3_s = r.leak_conductance_m3_s_pa * (s.mu_test_pa_s / s.mu_ref_pa_s) * s.ref_pressure_pa;
  r.volumetric_efficiency_ref = T(1) - r.leakage_ref_m3_s / (v * s.ref_speed_rev_s);
  r.percent_of_new = r.volumetric_efficiency_ref / s.new_volumetric_efficiency;
  const T ratio = s.mu_test_pa_s / s.mu_ref_pa_s;
  if (s.ref_pressure_pa > detail::constant<T>(1.25L, "1.25") * p1 || ratio > T(3) || ratio < T(1) / T(3))
    st = worst(st, status::extrapolated);
  if (r.volumetric_efficiency_ref <= T(0)) st = worst(st, status::implausible);
  if (r.percent_of_new < s.limit)
    r.verdict = flow_verdict::fail;
  else if (r.percent_of_new < s.limit + s.watch_band)
    r.verdict = flow_verdict::watch;
  else
    r.verdict = flow_verdict::pass;
  r.st = st;
  return r;
}

/// Word for a verdict ("pass", "watch", "FAIL"; "unknown" otherwise).
/// @param v the verdict
/// @return the word (static storage)
inline const char* flow_verdict_name(flow_verdict v) noexcept {
  switch (v) {
    case flow_verdict::pass: return "pass";
    case flow_verdict::watch: return "watch";
    case flow_verdict::fail: return "FAIL";
  }
  return "unknown";
}

}  // namespace pumploss

#endif
