/// @file orifice.hpp
/// @brief Orifice and capillary flow: sharp-edged orifice and its inverses, a low-Reynolds
/// discharge coefficient continuous with the turbulent one, capillary tube with entrance loss,
/// and series/parallel equivalents of orifices.
///
/// All quantities SI: dp in Pa (signed: flow follows its sign), density in kg/m^3, dynamic
/// viscosity in Pa s, diameters and lengths in m, flow in m^3/s.
#ifndef PUMPLOSS_ORIFICE_HPP
#define PUMPLOSS_ORIFICE_HPP

#include <cmath>

#include "scalar_traits.hpp"
#include "status.hpp"

namespace pumploss {

namespace detail {
/// sign(x) * sqrt(|x|)
template <class T>
inline T signed_sqrt(T x) {
  using std::fabs;
  using std::sqrt;
  return x < T(0) ? -sqrt(fabs(x)) : sqrt(x);
}
}  // namespace detail

/// @name Sharp-edged orifice
/// @{

/// Flow through a sharp-edged orifice.
///
/// \f[ q = C_d A_0 \sqrt{2 \Delta p / \rho}, \qquad A_0 = \pi d^2 / 4 \f]
/// (for negative dp the flow is negative: \f$ q = -C_d A_0 \sqrt{2|\Delta p|/\rho} \f$).
///
/// @param dp_pa      \f$\Delta p\f$ pressure drop across the orifice, Pa, any sign
/// @param rho_kg_m3  \f$\rho\f$ density, kg/m^3, > 0
/// @param diameter_m \f$d\f$ orifice diameter, m, > 0
/// @param cd         \f$C_d\f$ discharge coefficient, 0 < Cd <= 1 (0.611 = pi/(pi+2) for a
///                   sharp edge at high Re)
/// @return q in m^3/s; status::domain for non-positive rho, d or Cd, or Cd > 1;
///         status::nonfinite for NaN/inf. The Reynolds number check is orifice_reynolds().
/// @par Validity
/// Turbulent (Re above about 1000 for a constant Cd); incompressible; d much smaller than the
/// upstream bore. Below that use orifice_flow_viscous().
/// @par Accuracy
/// Within 2 ulp of the 50-digit evaluation (tests/orifice_test.cpp).
/// @par Source
/// Rabie, Fluid Power Engineering, McGraw-Hill 2009, Eqs. 2.34-2.39 (citing Merritt 1967);
/// M. Galal Rabie, Fluid Power Engineering, McGraw-Hill 2009, Eqs. 2.34-2.39; docs/pages/theory_gap.md.
template <class T, detail::if_real<T> = 0>
inline result<T> orifice_flow(T dp_pa, T rho_kg_m3, T diameter_m, T cd) {
  if (!detail::all_finite(dp_pa, rho_kg_m3, diameter_m, cd)) return detail::fail<T>(status::nonfinite);
  if (!(rho_kg_m3 > T(0)) || !(diameter_m > T(0)) || !(cd > T(0)) || !(cd <= T(1)))
    return detail::fail<T>(status::domain);
  const T area = detail::pi<T>() * diameter_m * diameter_m / 4;
  return {cd * area * detail::signed_sqrt(T(2) * dp_pa / rho_kg_m3), status::ok};
}

/// Pressure drop that drives a given flow through a sharp-edged orifice (inverse of
/// orifice_flow()).
///
/// \f[ \Delta p = \frac{\rho}{2}\Big(\frac{q}{C_d A_0}\Big)^2 \operatorname{sign} q \f]
///
/// @param q_m3_s     \f$q\f$ flow, m^3/s, any sign
/// @param rho_kg_m3  \f$\rho\f$ density, kg/m^3, > 0
/// @param diameter_m \f$d\f$ orifice diameter, m, > 0
/// @param cd         \f$C_d\f$, 0 < Cd <= 1
/// @return dp in Pa; errors as orifice_flow().
/// @par Validity
/// As orifice_flow().
/// @par Accuracy
/// Within 3 ulp of the 50-digit evaluation.
/// @par Source
/// M. Galal Rabie, Fluid Power Engineering, McGraw-Hill 2009, Eqs. 2.34-2.39; docs/pages/theory_gap.md.
template <class T, detail::if_real<T> = 0>
inline result<T> orifice_dp(T q_m3_s, T rho_kg_m3, T diameter_m, T cd) {
  if (!detail::all_finite(q_m3_s, rho_kg_m3, diameter_m, cd)) return detail::fail<T>(status::nonfinite);
  if (!(rho_kg_m3 > T(0)) || !(diameter_m > T(0)) || !(cd > T(0)) || !(cd <= T(1)))
    return detail::fail<T>(status::domain);
  const T area = detail::pi<T>() * diameter_m * diameter_m / 4;
  const T v = q_m3_s / (cd * area);
  return {rho_kg_m3 / 2 * v * (v < T(0) ? -v : v), status::ok};
}

/// Orifice diameter that passes a given flow at a given pressure drop (inverse of
/// orifice_flow()).
///
/// \f[ d = \sqrt{\frac{4 q}{\pi C_d \sqrt{2 \Delta p/\rho}}} \f]
///
/// @param q_m3_s    \f$q\f$ flow, m^3/s, same sign as dp, nonzero
/// @param dp_pa     \f$\Delta p\f$, Pa, nonzero
/// @param rho_kg_m3 \f$\rho\f$, kg/m^3, > 0
/// @param cd        \f$C_d\f$, 0 < Cd <= 1
/// @return d in m; status::domain when q and dp differ in sign or are zero.
/// @par Validity
/// As orifice_flow().
/// @par Accuracy
/// Within 3 ulp of the 50-digit evaluation.
/// @par Source
/// M. Galal Rabie, Fluid Power Engineering, McGraw-Hill 2009, Eqs. 2.34-2.39; docs/pages/theory_gap.md.
template <class T, detail::if_real<T> = 0>
inline result<T> orifice_diameter(T q_m3_s, T dp_pa, T rho_kg_m3, T cd) {
  using std::fabs;
  using std::sqrt;
  if (!detail::all_finite(q_m3_s, dp_pa, rho_kg_m3, cd)) return detail::fail<T>(status::nonfinite);
  if (!(rho_kg_m3 > T(0)) || !(cd > T(0)) || !(cd <= T(1))) return detail::fail<T>(status::domain);
  if (!(q_m3_s / dp_pa > T(0)) || !detail::finite(q_m3_s / dp_pa)) return detail::fail<T>(status::domain);
  const T area = fabs(q_m3_s) / (cd * sqrt(T(2) * fabs(dp_pa) / rho_kg_m3));
  return {sqrt(T(4) * area / detail::pi<T>()), status::ok};
}

/// Orifice Reynolds number based on the orifice diameter and the mean velocity in it.
///
/// \f[ Re = \frac{\rho v d}{\mu} = \frac{4 \rho |q|}{\pi d \mu} \f]
///
/// @param q_m3_s     \f$q\f$ flow, m^3/s (sign ignored)
/// @param diameter_m \f$d\f$, m, > 0
/// @param rho_kg_m3  \f$\rho\f$, kg/m^3, > 0
/// @param mu_pa_s    \f$\mu\f$, Pa s, > 0
/// @return Re; status::regime when Re < 1000, where a constant turbulent Cd is no longer
///         valid (the blended Cd of orifice_cd_low_re() is then about 1 % or more below the
///         turbulent value for Cd = 0.611; threshold a convention here).
/// @par Validity
/// Definition.
/// @par Accuracy
/// A few ulp.
/// @par Source
/// Definition of the orifice Reynolds number (docs/pages/theory_gap.md).
template <class T, detail::if_real<T> = 0>
inline result<T> orifice_reynolds(T q_m3_s, T diameter_m, T rho_kg_m3, T mu_pa_s) {
  using std::fabs;
  if (!detail::all_finite(q_m3_s, diameter_m, rho_kg_m3, mu_pa_s)) return detail::fail<T>(status::nonfinite);
  if (!(diameter_m > T(0)) || !(rho_kg_m3 > T(0)) || !(mu_pa_s > T(0))) return detail::fail<T>(status::domain);
  const T re = T(4) * rho_kg_m3 * fabs(q_m3_s) / (detail::pi<T>() * diameter_m * mu_pa_s);
  return {re, re < T(1000) ? status::regime : status::ok};
}

/// Sampson's creeping-flow coefficient \f$\delta = 1/\sqrt{12\pi} = 0.16287\f$ of the
/// low-Reynolds law \f$C_d = \delta\sqrt{Re}\f$.
/// @return delta (dimensionless)
/// @par Source
/// Sampson's flow through a circular hole in a thin plate, q = d^3 dp/(24 mu) (from memory);
/// delta = 1/sqrt(12 pi) derived from Sampson's flow (self-calculated, docs/pages/theory_gap.md).
template <class T>
inline T orifice_sampson_delta() {
  using std::sqrt;
  return T(1) / sqrt(T(12) * detail::pi<T>());
}

/// Discharge coefficient over the whole Reynolds range: a blend of the low-Reynolds law
/// \f$C_d = \delta\sqrt{Re}\f$ and the turbulent constant.
///
/// \f[ \frac{1}{C_d^2} = \frac{1}{C_{d\infty}^2} + \frac{1}{\delta^2 Re} \f]
///
/// @param re       \f$Re\f$ orifice Reynolds number (orifice_reynolds()), >= 0
/// @param cd_inf   \f$C_{d\infty}\f$ turbulent discharge coefficient, 0 < Cd <= 1
/// @param delta    \f$\delta\f$ laminar coefficient, > 0 (orifice_sampson_delta() = 0.163;
///                 Merritt gives about 0.2, from memory)
/// @return Cd; status::domain for bad arguments. Cd = 0 at Re = 0.
/// @par Validity
/// The blend is a modelling choice of this library, exact in both limits.
/// @par Accuracy
/// Within 3 ulp of the 50-digit evaluation.
/// @par Source
/// Low-Re law: Merritt, Hydraulic Control Systems, Wiley 1967 (delta about 0.2, from memory);
/// Sampson's creeping flow (delta = 1/sqrt(12 pi)); blend: this library's choice (docs/pages/theory_gap.md).
template <class T, detail::if_real<T> = 0>
inline result<T> orifice_cd_low_re(T re, T cd_inf, T delta) {
  using std::sqrt;
  if (!detail::all_finite(re, cd_inf, delta)) return detail::fail<T>(status::nonfinite);
  if (!(re >= T(0)) || !(cd_inf > T(0)) || !(cd_inf <= T(1)) || !(delta > T(0))) return detail::fail<T>(status::domain);
  if (re == T(0)) return {T(0), status::ok};
  const T x = delta * delta * re;  // laminar Cd^2
  return {cd_inf * sqrt(x / (x + cd_inf * cd_inf)), status::ok};
}

/// Flow through a sharp-edged orifice at any Reynolds number, with the blended discharge
/// coefficient of orifice_cd_low_re() solved exactly (a quadratic in Cd).
///
/// With \f$v_0 = \sqrt{2\Delta p/\rho}\f$ and \f$Re_0 = \rho v_0 d/\mu\f$ the blend gives
/// \f$ C_d^2/C_{d\infty}^2 + C_d/(\delta^2 Re_0) = 1 \f$, solved as
/// \f[ C_d = \frac{2}{1/(\delta^2 Re_0) + \sqrt{1/(\delta^2 Re_0)^2 + 4/C_{d\infty}^2}},
///     \qquad q = C_d A_0 v_0 \f]
/// In the creeping limit \f$ q = 2\delta^2 A_0 d\,\Delta p/\mu \f$ (linear in dp).
///
/// @param dp_pa      \f$\Delta p\f$, Pa, any sign
/// @param rho_kg_m3  \f$\rho\f$, kg/m^3, > 0
/// @param mu_pa_s    \f$\mu\f$, Pa s, > 0
/// @param diameter_m \f$d\f$, m, > 0
/// @param cd_inf     \f$C_{d\infty}\f$, 0 < Cd <= 1
/// @param delta      \f$\delta\f$, > 0
/// @return q in m^3/s; errors for bad input.
/// @par Validity
/// As orifice_cd_low_re().
/// @par Accuracy
/// Within 1e-14 relative of the 50-digit evaluation (tests/orifice_test.cpp).
/// @par Source
/// H. E. Merritt, Hydraulic Control Systems, Wiley 1967 (low-Re Cd, from memory); docs/pages/theory_gap.md.
template <class T, detail::if_real<T> = 0>
inline result<T> orifice_flow_viscous(T dp_pa, T rho_kg_m3, T mu_pa_s, T diameter_m, T cd_inf, T delta) {
  using std::fabs;
  using std::sqrt;
  if (!detail::all_finite(dp_pa, rho_kg_m3, mu_pa_s, diameter_m, cd_inf, delta))
    return detail::fail<T>(status::nonfinite);
  if (!(rho_kg_m3 > T(0)) || !(mu_pa_s > T(0)) || !(diameter_m > T(0)) || !(cd_inf > T(0)) || !(cd_inf <= T(1)) ||
      !(delta > T(0)))
    return detail::fail<T>(status::domain);
  if (dp_pa == T(0)) return {T(0), status::ok};
  const T area = detail::pi<T>() * diameter_m * diameter_m / 4;
  const T v0 = sqrt(T(2) * fabs(dp_pa) / rho_kg_m3);
  const T re0 = rho_kg_m3 * v0 * diameter_m / mu_pa_s;
  const T inv = T(1) / (delta * delta * re0);
  const T cd = T(2) / (inv + sqrt(inv * inv + T(4) / (cd_inf * cd_inf)));
  const T q = cd * area * v0;
  return {dp_pa < T(0) ? -q : q, status::ok};
}
/// @}

/// @name Capillary tube
/// @{

namespace detail {
template <class T>
inline status capillary_check(T rho, T mu, T d, T l, T k) {
  if (!(rho > T(0)) || !(mu > T(0)) || !(d > T(0)) || !(l > T(0)) || !(k >= T(0))) return status::domain;
  return status::ok;
}
}  // namespace detail

/// Pressure drop of a capillary tube: Hagen-Poiseuille plus an entrance/exit loss.
///
/// \f[ \Delta p = \frac{128 \mu L q}{\pi d^4} + K \frac{\rho v^2}{2}, \quad v = \frac{4q}{\pi d^2} \f]
///
/// @param q_m3_s          \f$q\f$ flow, m^3/s, any sign (the loss keeps the sign of q)
/// @param rho_kg_m3       \f$\rho\f$, kg/m^3, > 0
/// @param mu_pa_s         \f$\mu\f$, Pa s, > 0
/// @param diameter_m      \f$d\f$ bore of the tube, m, > 0
/// @param length_m        \f$L\f$ tube length, m, > 0
/// @param loss_coefficient \f$K\f$ entrance + developing-flow + exit loss, >= 0 (about 1.2-2.3,
///                        from memory; 0 for Hagen-Poiseuille alone)
/// @return dp in Pa; status::regime when the tube Reynolds number exceeds 2000.
/// @par Validity
/// Laminar (Re < 2000); the fully developed part needs L well above the entrance length
/// 0.06 Re d (from memory), the K term covers the rest approximately.
/// @par Accuracy
/// Within 2 ulp of the 50-digit evaluation.
/// @par Source
/// Hagen-Poiseuille law; K range from memory (docs/pages/theory_gap.md).
template <class T, detail::if_real<T> = 0>
inline result<T> capillary_dp(T q_m3_s, T rho_kg_m3, T mu_pa_s, T diameter_m, T length_m, T loss_coefficient) {
  using std::fabs;
  if (!detail::all_finite(q_m3_s, rho_kg_m3, mu_pa_s, diameter_m, length_m, loss_coefficient))
    return detail::fail<T>(status::nonfinite);
  const status s = detail::capillary_check(rho_kg_m3, mu_pa_s, diameter_m, length_m, loss_coefficient);
  if (is_error(s)) return detail::fail<T>(s);
  const T d2 = diameter_m * diameter_m;
  const T pi = detail::pi<T>();
  const T v = T(4) * q_m3_s / (pi * d2);
  const T dp = T(32) * mu_pa_s * length_m * v / d2 + loss_coefficient * rho_kg_m3 * v * fabs(v) / 2;
  const T re = rho_kg_m3 * fabs(v) * diameter_m / mu_pa_s;
  return {dp, re > T(2000) ? status::regime : status::ok};
}

/// Flow through a capillary tube at a given pressure drop: the positive root of
/// \f$ k q^2 + R q - \Delta p = 0 \f$ with \f$R = 128\mu L/(\pi d^4)\f$ and
/// \f$k = K\rho/(2A^2)\f$, in the cancellation-free form
/// \f[ q = \frac{2\Delta p}{R + \sqrt{R^2 + 4 k \Delta p}} \f]
///
/// @param dp_pa            \f$\Delta p\f$, Pa, any sign (flow follows it)
/// @param rho_kg_m3        \f$\rho\f$, kg/m^3, > 0
/// @param mu_pa_s          \f$\mu\f$, Pa s, > 0
/// @param diameter_m       \f$d\f$, m, > 0
/// @param length_m         \f$L\f$, m, > 0
/// @param loss_coefficient \f$K\f$, >= 0
/// @return q in m^3/s; status::regime when the tube Reynolds number exceeds 2000.
/// @par Validity
/// As capillary_dp().
/// @par Accuracy
/// Within 1e-14 relative of the 50-digit evaluation (tests/orifice_test.cpp).
/// @par Source
/// docs/pages/theory_gap.md (quadratic solved here in its stable form).
template <class T, detail::if_real<T> = 0>
inline result<T> capillary_flow(T dp_pa, T rho_kg_m3, T mu_pa_s, T diameter_m, T length_m, T loss_coefficient) {
  using std::fabs;
  using std::sqrt;
  if (!detail::all_finite(dp_pa, rho_kg_m3, mu_pa_s, diameter_m, length_m, loss_coefficient))
    return detail::fail<T>(status::nonfinite);
  const status s = detail::capillary_check(rho_kg_m3, mu_pa_s, diameter_m, length_m, loss_coefficient);
  if (is_error(s)) return detail::fail<T>(s);
  const T d2 = diameter_m * diameter_m;
  const T pi = detail::pi<T>();
  const T area = pi * d2 / 4;
  const T r = T(128) * mu_pa_s * length_m / (pi * d2 * d2);
  const T k = loss_coefficient * rho_kg_m3 / (T(2) * area * area);
  const T adp = fabs(dp_pa);
  const T q = T(2) * adp / (r + sqrt(r * r + T(4) * k * adp));
  const T re = rho_kg_m3 * (q / area) * diameter_m / mu_pa_s;
  return {dp_pa < T(0) ? -q : q, re > T(2000) ? status::regime : status::ok};
}
/// @}

/// @name Orifices in series and parallel
/// @{

/// Effective area \f$(C_d A)_{eq}\f$ of square-law restrictions in series (same flow).
///
/// \f[ \frac{1}{(C_dA)_{eq}^2} = \sum_i \frac{1}{(C_{d,i} A_i)^2} \f]
/// evaluated for two elements as \f$ c_1 c_2/\sqrt{c_1^2 + c_2^2} \f$ (scaled, no overflow).
///
/// @param cda1_m2 \f$C_{d,1}A_1\f$, m^2, > 0
/// @param cda2_m2 \f$C_{d,2}A_2\f$, m^2, > 0
/// @return the equivalent Cd A in m^2; chain calls for more elements.
/// @par Validity
/// Square-law (turbulent) elements that do not interact (no pressure recovery between them).
/// @par Accuracy
/// Within 3 ulp of the 50-digit evaluation.
/// @par Source
/// Series combination of square-law restrictions, derived here (docs/pages/theory_gap.md).
template <class T, detail::if_real<T> = 0>
inline result<T> orifice_series_cda(T cda1_m2, T cda2_m2) {
  using std::sqrt;
  if (!detail::all_finite(cda1_m2, cda2_m2)) return detail::fail<T>(status::nonfinite);
  if (!(cda1_m2 > T(0)) || !(cda2_m2 > T(0))) return detail::fail<T>(status::domain);
  const T big = cda1_m2 > cda2_m2 ? cda1_m2 : cda2_m2;
  const T small = cda1_m2 > cda2_m2 ? cda2_m2 : cda1_m2;
  const T r = small / big;
  return {small / sqrt(T(1) + r * r), status::ok};
}

/// Effective area of square-law restrictions in parallel (same pressure drop):
/// \f$ (C_dA)_{eq} = \sum_i C_{d,i}A_i \f$.
///
/// @param cda1_m2 \f$C_{d,1}A_1\f$, m^2, >= 0
/// @param cda2_m2 \f$C_{d,2}A_2\f$, m^2, >= 0
/// @return the sum in m^2.
/// @par Validity
/// Square-law elements at the same pressure drop.
/// @par Accuracy
/// One rounding.
/// @par Source
/// Parallel combination of square-law restrictions, derived here (docs/pages/theory_gap.md).
template <class T, detail::if_real<T> = 0>
inline result<T> orifice_parallel_cda(T cda1_m2, T cda2_m2) {
  if (!detail::all_finite(cda1_m2, cda2_m2)) return detail::fail<T>(status::nonfinite);
  if (!(cda1_m2 >= T(0)) || !(cda2_m2 >= T(0))) return detail::fail<T>(status::domain);
  return {cda1_m2 + cda2_m2, status::ok};
}

/// Flow through a square-law restriction of effective area Cd A (for series/parallel
/// equivalents): \f$ q = (C_dA)\sqrt{2\Delta p/\rho} \f$.
///
/// @param dp_pa     \f$\Delta p\f$, Pa, any sign
/// @param rho_kg_m3 \f$\rho\f$, kg/m^3, > 0
/// @param cda_m2    \f$C_dA\f$, m^2, >= 0
/// @return q in m^3/s.
/// @par Validity
/// As orifice_flow().
/// @par Accuracy
/// Within 2 ulp.
/// @par Source
/// M. Galal Rabie, Fluid Power Engineering, McGraw-Hill 2009, Eqs. 2.34-2.39; docs/pages/theory_gap.md.
template <class T, detail::if_real<T> = 0>
inline result<T> orifice_flow_cda(T dp_pa, T rho_kg_m3, T cda_m2) {
  if (!detail::all_finite(dp_pa, rho_kg_m3, cda_m2)) return detail::fail<T>(status::nonfinite);
  if (!(rho_kg_m3 > T(0)) || !(cda_m2 >= T(0))) return detail::fail<T>(status::domain);
  return {cda_m2 * detail::signed_sqrt(T(2) * dp_pa / rho_kg_m3), status::ok};
}
/// @}

// Mixed argument types (an int literal beside doubles), promoted as Boost.Math promotes:
// one line per public template whose parameters are all scalars (promote.hpp).
PUMPLOSS_PROMOTE(capillary_dp)
PUMPLOSS_PROMOTE(capillary_flow)
PUMPLOSS_PROMOTE(orifice_cd_low_re)
PUMPLOSS_PROMOTE(orifice_diameter)
PUMPLOSS_PROMOTE(orifice_dp)
PUMPLOSS_PROMOTE(orifice_flow)
PUMPLOSS_PROMOTE(orifice_flow_cda)
PUMPLOSS_PROMOTE(orifice_flow_viscous)
PUMPLOSS_PROMOTE(orifice_parallel_cda)
PUMPLOSS_PROMOTE(orifice_reynolds)
PUMPLOSS_PROMOTE(orifice_series_cda)

}  // namespace pumploss

#endif
