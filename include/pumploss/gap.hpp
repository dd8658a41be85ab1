/// @file gap.hpp
/// @brief Laminar clearance (gap) flows: parallel plates with a moving wall, concentric and
/// eccentric annulus (exact, stable in double precision), axial drag flow of a sliding piston,
/// radial flow between discs and arc sectors, hydrostatic pads fed through an orifice or a
/// capillary, the inverse problems (gap from leakage) and the validity numbers.
///
/// All quantities SI: pressure difference dp in Pa, dynamic viscosity mu in Pa s, lengths in m,
/// speeds in m/s, flow q in m^3/s, force in N, power in W. Viscosity comes from the caller (for
/// example from fluid.hpp at the gap temperature); nothing here assumes an oil.
///
/// Building blocks of a piston-pump leakage budget (see @ref theory_gap):
/// - piston/bore: gap_annulus_flow() (eccentric, exact) + gap_annulus_drag_flow() (sliding
///   piston), or both at once with gap_piston_leakage();
/// - slipper: gap_pad_orifice() / gap_pad_capillary() (feed restrictor plus land);
/// - valve plate sealing lands: gap_radial_sector_flow() and gap_radial_land_force();
/// - plain orifices: orifice.hpp.
#ifndef PUMPLOSS_GAP_HPP
#define PUMPLOSS_GAP_HPP

#include <cmath>
#include <type_traits>

#include "detail/eccentric_annulus.hpp"
#include "detail/roots.hpp"
#include "scalar_traits.hpp"
#include "status.hpp"

namespace pumploss {

namespace detail {

/// Common checks of the annulus functions: finite inputs, bore > piston > 0, eps in [0, 1].
template <class T>
inline status annulus_check(T mu, T bore_d, T piston_d, T length, T eps) {
  if (!(mu > T(0)) || !(piston_d > T(0)) || !(bore_d > piston_d) || !(length > T(0))) return status::domain;
  if (!(eps >= T(0)) || !(eps <= T(1))) return status::domain;
  return status::ok;
}

/// The unique positive root of y^3 + p y - r = 0 for r > 0, closed form (Cardano with the
/// cancellation-free branch choice, or the trigonometric form when there are three real roots).
template <class T>
inline T cubic_positive_root(T p, T r) {
  using std::acos;
  using std::cbrt;
  using std::cos;
  using std::sqrt;
  const T disc = r * r / 4 + p * p * p / 27;
  if (disc >= T(0)) {
    const T s = sqrt(disc);
    const T u = cbrt(r / 2 + s);
    const T v = -p / (T(3) * u);
    if (p >= T(0)) return r / (u * u - u * v + v * v);
    return u + v;
  }
  // p < 0, three real roots; the positive one is the largest
  const T k = sqrt(-p / 3);
  T cth = (r / 2) / (k * k * k);
  if (cth > T(1)) cth = T(1);
  return T(2) * k * cos(acos(cth) / 3);
}

}  // namespace detail

/// @name Parallel plates
/// @{

/// Leakage between parallel plates with pressure flow and one wall moving along the flow
/// (plane Poiseuille plus Couette flow).
///
/// \f[ q = \frac{b h^3 \Delta p}{12 \mu L} + \frac{b h U}{2} \f]
///
/// @param dp_pa          \f$\Delta p\f$ pressure drop along the gap (inlet minus outlet), Pa, any sign
/// @param mu_pa_s        \f$\mu\f$ dynamic viscosity, Pa s, > 0
/// @param width_m        \f$b\f$ gap width across the flow, m, > 0
/// @param height_m       \f$h\f$ gap height, m, > 0
/// @param length_m       \f$L\f$ gap length in the flow direction, m, > 0
/// @param wall_speed_m_s \f$U\f$ speed of the moving wall in the flow direction, m/s, any sign
/// @return q in m^3/s; status::domain for a non-positive mu, b, h or L; status::nonfinite for
///         NaN/inf. Check the laminar assumption with gap_reynolds().
/// @par Validity
/// Laminar, fully developed, incompressible flow, h much smaller than b and L, constant
/// viscosity (docs/pages/theory_gap.md).
/// @par Accuracy
/// Within 2 ulp of the 50-digit evaluation (tests/gap_test.cpp).
/// @par Source
/// Standard lubrication result; e.g. Rabie, Fluid Power Engineering, McGraw-Hill 2009, Eq. 2.19
/// (annulus form); docs/pages/theory_gap.md.
template <class T, detail::if_real<T> = 0>
inline result<T> gap_plates_flow(T dp_pa, T mu_pa_s, T width_m, T height_m, T length_m, T wall_speed_m_s) {
  if (!detail::all_finite(dp_pa, mu_pa_s, width_m, height_m, length_m, wall_speed_m_s))
    return detail::fail<T>(status::nonfinite);
  if (!(mu_pa_s > T(0)) || !(width_m > T(0)) || !(height_m > T(0)) || !(length_m > T(0)))
    return detail::fail<T>(status::domain);
  const T h = height_m;
  return {width_m * h * (h * h * dp_pa / (T(12) * mu_pa_s * length_m) + wall_speed_m_s / 2), status::ok};
}

/// Velocity at height y in the parallel-plate gap (wall at y = 0 fixed, wall at y = h moving).
///
/// \f[ u(y) = \frac{\Delta p}{2 \mu L} y (h - y) + U \frac{y}{h} \f]
///
/// @param dp_pa          \f$\Delta p\f$ pressure drop along the gap, Pa
/// @param mu_pa_s        \f$\mu\f$ dynamic viscosity, Pa s, > 0
/// @param height_m       \f$h\f$ gap height, m, > 0
/// @param length_m       \f$L\f$ gap length, m, > 0
/// @param wall_speed_m_s \f$U\f$ speed of the wall at y = h, m/s
/// @param y_m            \f$y\f$ distance from the fixed wall, m, 0 <= y <= h
/// @return u in m/s; status::domain for y outside [0, h] or non-positive mu, h, L.
/// @par Validity
/// As gap_plates_flow().
/// @par Accuracy
/// A few ulp (closed form).
/// @par Source
/// Standard plane Couette-Poiseuille profile (docs/pages/theory_gap.md).
template <class T, detail::if_real<T> = 0>
inline result<T> gap_plates_velocity(T dp_pa, T mu_pa_s, T height_m, T length_m, T wall_speed_m_s, T y_m) {
  if (!detail::all_finite(dp_pa, mu_pa_s, height_m, length_m, wall_speed_m_s, y_m))
    return detail::fail<T>(status::nonfinite);
  if (!(mu_pa_s > T(0)) || !(height_m > T(0)) || !(length_m > T(0)) || !(y_m >= T(0)) || !(y_m <= height_m))
    return detail::fail<T>(status::domain);
  return {dp_pa / (T(2) * mu_pa_s * length_m) * y_m * (height_m - y_m) + wall_speed_m_s * y_m / height_m,
          status::ok};
}

/// Force needed to move the wall of a parallel-plate gap at speed U (the viscous friction of
/// the gap); positive when it opposes the motion.
///
/// \f[ F = \frac{\mu U b L}{h} - \frac{b h \Delta p}{2} \f]
///
/// @param dp_pa          \f$\Delta p\f$ pressure drop along the gap in the direction of U, Pa
/// @param mu_pa_s        \f$\mu\f$ dynamic viscosity, Pa s, > 0
/// @param width_m        \f$b\f$ gap width, m, > 0
/// @param height_m       \f$h\f$ gap height, m, > 0
/// @param length_m       \f$L\f$ gap length, m, > 0
/// @param wall_speed_m_s \f$U\f$ wall speed, m/s
/// @return F in N; status::domain / status::nonfinite as gap_plates_flow().
/// @par Validity
/// As gap_plates_flow().
/// @par Accuracy
/// Within a few ulp of the 50-digit evaluation except where the two terms cancel.
/// @par Source
/// Wall shear of the plane Couette-Poiseuille profile (docs/pages/theory_gap.md).
template <class T, detail::if_real<T> = 0>
inline result<T> gap_plates_shear_force(T dp_pa, T mu_pa_s, T width_m, T height_m, T length_m, T wall_speed_m_s) {
  if (!detail::all_finite(dp_pa, mu_pa_s, width_m, height_m, length_m, wall_speed_m_s))
    return detail::fail<T>(status::nonfinite);
  if (!(mu_pa_s > T(0)) || !(width_m > T(0)) || !(height_m > T(0)) || !(length_m > T(0)))
    return detail::fail<T>(status::domain);
  return {width_m * (mu_pa_s * wall_speed_m_s * length_m / height_m - height_m * dp_pa / 2), status::ok};
}

/// Power dissipated in a parallel-plate gap: leakage loss plus viscous friction (the cross
/// term cancels).
///
/// \f[ P = \frac{b h^3 \Delta p^2}{12 \mu L} + \frac{\mu U^2 b L}{h} = \Delta p\, q + F U \f]
///
/// @param dp_pa          \f$\Delta p\f$ pressure drop along the gap, Pa
/// @param mu_pa_s        \f$\mu\f$ dynamic viscosity, Pa s, > 0
/// @param width_m        \f$b\f$ gap width, m, > 0
/// @param height_m       \f$h\f$ gap height, m, > 0
/// @param length_m       \f$L\f$ gap length, m, > 0
/// @param wall_speed_m_s \f$U\f$ wall speed, m/s
/// @return P in W (>= 0); status::domain / status::nonfinite as gap_plates_flow().
/// @par Validity
/// As gap_plates_flow(). The gap minimising P is \f$h = \sqrt[4]{12 \mu^2 U^2 L^2/\Delta p^2}\f$.
/// @par Accuracy
/// Within 2 ulp of the 50-digit evaluation (sum of positive terms).
/// @par Source
/// Plane Couette-Poiseuille flow (docs/pages/theory_gap.md).
template <class T, detail::if_real<T> = 0>
inline result<T> gap_plates_power_loss(T dp_pa, T mu_pa_s, T width_m, T height_m, T length_m, T wall_speed_m_s) {
  if (!detail::all_finite(dp_pa, mu_pa_s, width_m, height_m, length_m, wall_speed_m_s))
    return detail::fail<T>(status::nonfinite);
  if (!(mu_pa_s > T(0)) || !(width_m > T(0)) || !(height_m > T(0)) || !(length_m > T(0)))
    return detail::fail<T>(status::domain);
  const T h = height_m;
  return {width_m * (h * h * h * dp_pa * dp_pa / (T(12) * mu_pa_s * length_m) +
                     mu_pa_s * wall_speed_m_s * wall_speed_m_s * length_m / h),
          status::ok};
}

/// Gap height that explains a measured leakage through a parallel-plate gap (pressure flow
/// only): the inverse of gap_plates_flow() with U = 0.
///
/// \f[ h = \sqrt[3]{\frac{12 \mu L q}{b \Delta p}} \f]
///
/// @param q_m3_s   \f$q\f$ measured leakage, m^3/s, same sign as dp, nonzero
/// @param dp_pa    \f$\Delta p\f$ pressure drop, Pa, nonzero
/// @param mu_pa_s  \f$\mu\f$ dynamic viscosity, Pa s, > 0
/// @param width_m  \f$b\f$ gap width, m, > 0
/// @param length_m \f$L\f$ gap length, m, > 0
/// @return h in m; status::domain when q and dp differ in sign or are zero.
/// @par Validity
/// As gap_plates_flow(). One measurement gives one lumped gap; parallel paths cannot be
/// separated.
/// @par Accuracy
/// Within 2 ulp of the 50-digit evaluation.
/// @par Source
/// Inverse of the laminar gap flow, derived here (docs/pages/theory_gap.md).
template <class T, detail::if_real<T> = 0>
inline result<T> gap_plates_height(T q_m3_s, T dp_pa, T mu_pa_s, T width_m, T length_m) {
  using std::cbrt;
  if (!detail::all_finite(q_m3_s, dp_pa, mu_pa_s, width_m, length_m)) return detail::fail<T>(status::nonfinite);
  if (!(mu_pa_s > T(0)) || !(width_m > T(0)) || !(length_m > T(0))) return detail::fail<T>(status::domain);
  const T ratio = q_m3_s / dp_pa;
  if (!(ratio > T(0)) || !detail::finite(ratio)) return detail::fail<T>(status::domain);
  return {cbrt(T(12) * mu_pa_s * length_m * ratio / width_m), status::ok};
}

/// Gap height from leakage with the Couette term: the unique positive root of
/// \f$ \frac{b \Delta p}{12 \mu L} h^3 + \frac{b U}{2} h - q = 0 \f$, in closed form (no iteration).
///
/// The cubic is scaled by the pressure-only root (or the shear-only root when shear dominates)
/// and solved by Cardano's formula in its cancellation-free arrangement, or the trigonometric
/// form when it has three real roots (wall moving against the pressure flow).
///
/// @param q_m3_s         \f$q\f$ measured leakage, m^3/s, > 0
/// @param dp_pa          \f$\Delta p\f$ pressure drop, Pa, >= 0
/// @param mu_pa_s        \f$\mu\f$ dynamic viscosity, Pa s, > 0
/// @param width_m        \f$b\f$ gap width, m, > 0
/// @param length_m       \f$L\f$ gap length, m, > 0
/// @param wall_speed_m_s \f$U\f$ wall speed along the flow, m/s (may be negative)
/// @return h in m; status::domain when no positive gap gives q (q <= 0, dp < 0, or dp = 0 with
///         U <= 0).
/// @par Validity
/// As gap_plates_flow(). For q > 0 and dp > 0 the positive root is unique.
/// @par Accuracy
/// Within 1e-14 relative of the 50-digit evaluation across shear/pressure ratios 1e-8..1e8
/// (tests/gap_test.cpp).
/// @par Source
/// docs/pages/theory_gap.md (inverse problem); cubic formulas: standard algebra (Cardano, Viete).
template <class T, detail::if_real<T> = 0>
inline result<T> gap_plates_height_couette(T q_m3_s, T dp_pa, T mu_pa_s, T width_m, T length_m, T wall_speed_m_s) {
  using std::cbrt;
  if (!detail::all_finite(q_m3_s, dp_pa, mu_pa_s, width_m, length_m, wall_speed_m_s))
    return detail::fail<T>(status::nonfinite);
  if (!(mu_pa_s > T(0)) || !(width_m > T(0)) || !(length_m > T(0)) || !(q_m3_s > T(0)) || !(dp_pa >= T(0)))
    return detail::fail<T>(status::domain);
  const T bcoef = width_m * wall_speed_m_s / 2;
  if (dp_pa == T(0)) {
    if (!(bcoef > T(0))) return detail::fail<T>(status::domain);
    return {q_m3_s / bcoef, status::ok};
  }
  const T acoef = width_m * dp_pa / (T(12) * mu_pa_s * length_m);
  const T h1 = cbrt(q_m3_s / acoef);  // pressure-only root
  const T p1 = bcoef * h1 / q_m3_s;   // y^3 + p1 y - 1 = 0 with h = h1 y
  if (!detail::finite(h1)) return detail::fail<T>(status::overflow);
  if (p1 <= T(1)) return {h1 * detail::cubic_positive_root(p1, T(1)), status::ok};
  // shear dominates: h = h0 z with h0 = q/B, z^3 + k z - k = 0, k = 1/(A h0^2) = p1^3
  const T h0 = q_m3_s / bcoef;
  const T kk = p1 * p1 * p1;
  if (!detail::finite(kk)) return {h0, status::ok};  // pressure term below rounding
  return {h0 * detail::cubic_positive_root(kk, kk), status::ok};
}
/// @}

/// @name Annulus (piston in bore)
/// @{

/// Exact laminar leakage through an eccentric annulus (piston in bore), for any clearance and
/// eccentricity ratio 0..1 inclusive.
///
/// \f[ q = \frac{\pi \Delta p}{8 \mu L}\Big[a^4 - b^4 - \frac{4c^2M^2}{\beta-\alpha}
///     - 8c^2M^2 \sum_{n\ge1} \frac{n\, e^{-n(\beta+\alpha)}}{\sinh n(\beta-\alpha)}\Big] \f]
/// with bore radius a, piston radius b, offset \f$c = \varepsilon (a-b)\f$,
/// \f$F = (a^2-b^2+c^2)/(2c)\f$, \f$M = \sqrt{F^2-a^2}\f$, \f$\alpha = \mathrm{asinh}(M/a)\f$,
/// \f$\beta = \mathrm{asinh}(M/b)\f$. At \f$\varepsilon = 0\f$ it is the concentric
/// Hagen-Poiseuille annulus \f$ q = \frac{\pi\Delta p}{8\mu L}[a^4 - b^4 - (a^2-b^2)^2/\ln(a/b)] \f$.
///
/// Evaluated without cancellation (see @ref theory_gap): \f$\beta - \alpha = \mathrm{asinh}(cM/(ab))\f$,
/// \f$cM = \tfrac{h}{2}\sqrt{(1-\varepsilon^2)((a+b)^2-c^2)}\f$, the bracket is regrouped so that
/// the leading orders cancel analytically, the series is summed by a cancellation-free
/// recurrence or, near \f$\varepsilon = 1\f$, by Euler-Maclaurin with a closed-form
/// (trigamma) integral; \f$\varepsilon = 1\f$ is its own closed-form limit.
///
/// @param dp_pa              \f$\Delta p\f$ pressure drop along the piston, Pa, any sign
/// @param mu_pa_s            \f$\mu\f$ dynamic viscosity, Pa s, > 0
/// @param bore_diameter_m    \f$2a\f$ bore diameter, m, > piston diameter
/// @param piston_diameter_m  \f$2b\f$ piston diameter, m, > 0
/// @param length_m           \f$L\f$ sealing length, m, > 0
/// @param eccentricity_ratio \f$\varepsilon = c/(a-b)\f$, 0 (concentric) to 1 (touching)
/// @return q in m^3/s; status::domain for piston >= bore, eps outside [0, 1], non-positive
///         mu, L or piston; status::nonfinite for NaN/inf.
/// @par Validity
/// Laminar, fully developed, incompressible; rigid, parallel piston and bore. Check the
/// laminar assumption with gap_reynolds() (wetted width pi (a+b)).
/// @par Accuracy
/// Relative error at most 1e-12 (observed below 2e-14) against the 50-digit evaluation for
/// clearance/radius 1e-7..0.9 and eps 0..1 (tests/gap_test.cpp); agrees with an independent
/// mpmath evaluation of the series above (tests/python/test_gap_annulus.py).
/// @par Source
/// Eccentric annulus: Piercy, Hooper and Winny, Phil. Mag. 15 (1933); as given in F. M. White,
/// Viscous Fluid Flow (McGraw-Hill), section on the eccentric annulus (equation number from
/// memory, not cited); docs/pages/theory_gap.md (concentric and eccentric annulus).
template <class T, detail::if_real<T> = 0>
inline result<T> gap_annulus_flow(T dp_pa, T mu_pa_s, T bore_diameter_m, T piston_diameter_m, T length_m,
                                  T eccentricity_ratio) {
  if (!detail::all_finite(dp_pa, mu_pa_s, bore_diameter_m, piston_diameter_m, length_m, eccentricity_ratio))
    return detail::fail<T>(status::nonfinite);
  const status s = detail::annulus_check(mu_pa_s, bore_diameter_m, piston_diameter_m, length_m, eccentricity_ratio);
  if (is_error(s)) return detail::fail<T>(s);
  const T a = bore_diameter_m / 2, b = piston_diameter_m / 2;
  const T br = detail::eccentric_bracket(a, b, eccentricity_ratio);
  const T q = detail::pi<T>() * dp_pa * br / (T(8) * mu_pa_s * length_m);
  if (!detail::finite(q)) return detail::fail<T>(status::overflow);
  return {q, status::ok};
}

/// Narrow-gap annulus leakage (the form usually used for pistons), for comparison with
/// gap_annulus_flow().
///
/// \f[ q = \frac{\pi D_m h^3 \Delta p}{12 \mu L}\,(1 + 1.5\,\varepsilon^2), \qquad
///     D_m = \frac{D_{bore} + D_{piston}}{2},\ h = \frac{D_{bore} - D_{piston}}{2} \f]
///
/// @param dp_pa              \f$\Delta p\f$ pressure drop, Pa
/// @param mu_pa_s            \f$\mu\f$ dynamic viscosity, Pa s, > 0
/// @param bore_diameter_m    bore diameter, m, > piston diameter
/// @param piston_diameter_m  piston diameter, m, > 0
/// @param length_m           \f$L\f$ sealing length, m, > 0
/// @param eccentricity_ratio \f$\varepsilon\f$, 0..1
/// @return q in m^3/s; status::regime when h / r_piston > 0.05 (narrow-gap assumption; the
///         error against the exact form then exceeds about 1e-4 concentric and 1 % at
///         eps = 1); errors as gap_annulus_flow().
/// @par Validity
/// h much smaller than the radius (narrow gap).
/// @par Accuracy
/// A few ulp of its own 50-digit evaluation; against the exact annulus the relative
/// difference is t^2/60 at eps = 0 and of order t at eps > 0 (tests/gap_test.cpp).
/// @par Source
/// Rabie, Fluid Power Engineering, McGraw-Hill 2009, Eq. 2.19 (concentric); eccentricity
/// factor: Manring, Hydraulic Control Systems, Wiley 2005 (equation number from memory);
/// docs/pages/theory_gap.md (concentric and eccentric annulus).
template <class T, detail::if_real<T> = 0>
inline result<T> gap_annulus_narrow_flow(T dp_pa, T mu_pa_s, T bore_diameter_m, T piston_diameter_m, T length_m,
                                         T eccentricity_ratio) {
  if (!detail::all_finite(dp_pa, mu_pa_s, bore_diameter_m, piston_diameter_m, length_m, eccentricity_ratio))
    return detail::fail<T>(status::nonfinite);
  const status s = detail::annulus_check(mu_pa_s, bore_diameter_m, piston_diameter_m, length_m, eccentricity_ratio);
  if (is_error(s)) return detail::fail<T>(s);
  const T h = (bore_diameter_m - piston_diameter_m) / 2;
  const T dm = (bore_diameter_m + piston_diameter_m) / 2;
  const T e2 = eccentricity_ratio * eccentricity_ratio;
  const T q = detail::pi<T>() * dm * h * h * h * dp_pa / (T(12) * mu_pa_s * length_m) * (T(1) + T(3) * e2 / 2);
  const bool narrow = h <= detail::constant<T>(0.05L, "0.05") * (piston_diameter_m / 2);
  return {q, narrow ? status::ok : status::regime};
}

/// Exact axial drag (Couette) flow through an eccentric annulus when the piston slides at
/// speed U relative to the bore (no pressure difference).
///
/// In bipolar coordinates the drag velocity is linear in the coordinate, which gives
/// \f[ q = \pi U\,\big(c M / (\beta - \alpha) - b^2\big)
///       = \pi U b\,\big(a\,[\sinh D / D - 1] + h\big),\quad D = \beta-\alpha \f]
/// (concentric: \f$ q = \pi U [(a^2-b^2)/(2\ln(a/b)) - b^2] \f$; narrow gap:
/// \f$ q \approx \pi D_m h U/2 \f$).
///
/// @param bore_diameter_m    \f$2a\f$ bore diameter, m, > piston diameter
/// @param piston_diameter_m  \f$2b\f$ piston diameter, m, > 0
/// @param eccentricity_ratio \f$\varepsilon\f$, 0..1
/// @param piston_speed_m_s   \f$U\f$ piston speed relative to the bore, m/s; positive in the
///                           direction counted as positive flow
/// @return q in m^3/s; status::domain / status::nonfinite as gap_annulus_flow().
/// @par Validity
/// Laminar, fully developed; end effects of a finite stroke neglected.
/// @par Accuracy
/// Within 1e-14 relative of the 50-digit evaluation (tests/gap_test.cpp).
/// @par Source
/// Derived here (narrow form: M. Galal Rabie, Fluid Power Engineering, McGraw-Hill 2009, Eq. 2.19): harmonic solution
/// (xi - alpha)/(beta - alpha) in the bipolar coordinates of the eccentric-annulus solution
/// (Piercy, Hooper and Winny 1933), integrated over the cross-section.
template <class T, detail::if_real<T> = 0>
inline result<T> gap_annulus_drag_flow(T bore_diameter_m, T piston_diameter_m, T eccentricity_ratio,
                                       T piston_speed_m_s) {
  using std::asinh;
  using std::sqrt;
  if (!detail::all_finite(bore_diameter_m, piston_diameter_m, eccentricity_ratio, piston_speed_m_s))
    return detail::fail<T>(status::nonfinite);
  const status s = detail::annulus_check(T(1), bore_diameter_m, piston_diameter_m, T(1), eccentricity_ratio);
  if (is_error(s)) return detail::fail<T>(s);
  const T a = bore_diameter_m / 2, b = piston_diameter_m / 2, h = a - b;
  const T eps = eccentricity_ratio;
  const T c = eps * h;
  // c M = (h/2) sqrt((1 - eps^2)((a+b)^2 - c^2)); D = asinh(cM/(ab))
  const T cm = h / 2 * sqrt((T(1) - eps) * (T(1) + eps) * (a + b - c) * (a + b + c));
  const T dd = asinh(cm / (a * b));
  return {detail::pi<T>() * piston_speed_m_s * b * (a * detail::sinhc_m1(dd) + h), status::ok};
}

/// Leakage past a piston in its bore: pressure flow (exact eccentric annulus) plus the drag
/// flow of the sliding piston, \f$ q = q_p(\Delta p, \varepsilon) + q_d(U, \varepsilon) \f$.
///
/// @param dp_pa              \f$\Delta p\f$ pressure drop from displacement chamber to case, Pa
/// @param mu_pa_s            \f$\mu\f$ dynamic viscosity, Pa s, > 0
/// @param bore_diameter_m    bore diameter, m
/// @param piston_diameter_m  piston diameter, m
/// @param length_m           sealing (engaged) length, m, > 0
/// @param eccentricity_ratio \f$\varepsilon\f$, 0..1
/// @param piston_speed_m_s   piston speed, m/s, positive when moving towards the case
///                           (dragging oil in the direction of the pressure flow)
/// @return q in m^3/s; statuses as gap_annulus_flow().
/// @par Validity
/// As gap_annulus_flow() and gap_annulus_drag_flow() (superposition of two laminar flows).
/// @par Accuracy
/// Each part within 1e-12 relative; the sum can cancel when the drag opposes the pressure flow.
/// @par Source
/// Superposition of gap_annulus_flow() and gap_annulus_drag_flow().
template <class T, detail::if_real<T> = 0>
inline result<T> gap_piston_leakage(T dp_pa, T mu_pa_s, T bore_diameter_m, T piston_diameter_m, T length_m,
                                    T eccentricity_ratio, T piston_speed_m_s) {
  const result<T> qp = gap_annulus_flow(dp_pa, mu_pa_s, bore_diameter_m, piston_diameter_m, length_m,
                                        eccentricity_ratio);
  if (is_error(qp.st)) return qp;
  const result<T> qd = gap_annulus_drag_flow(bore_diameter_m, piston_diameter_m, eccentricity_ratio, piston_speed_m_s);
  if (is_error(qd.st)) return qd;
  return {qp.value + qd.value, worst(qp.st, qd.st)};
}

/// Radial clearance that explains a measured leakage through an annulus of known bore
/// (inverse of gap_annulus_flow()).
///
/// Solved on log q against log h (q grows like h^3) by Brent's method (detail/roots.hpp) on a
/// bracket grown from the narrow-gap estimate; typically 5 to 7 evaluations. For dual numbers
/// the root is found in the value type and the derivatives follow from the implicit-function
/// rule (dh/dp = -F_p/F_h).
///
/// @param q_m3_s             \f$q\f$ measured leakage, m^3/s, same sign as dp, nonzero
/// @param dp_pa              \f$\Delta p\f$ pressure drop, Pa, nonzero
/// @param mu_pa_s            \f$\mu\f$ dynamic viscosity, Pa s, > 0
/// @param bore_diameter_m    bore diameter, m, > 0
/// @param length_m           sealing length, m, > 0
/// @param eccentricity_ratio \f$\varepsilon\f$, 0..1 (assumed)
/// @return radial clearance h = (D_bore - D_piston)/2 in m; status::domain when the signs
///         differ or the leakage needs a clearance above 0.99 of the bore radius;
///         status::no_convergence if the cap is reached (not observed).
/// @par Validity
/// As gap_annulus_flow().
/// @par Accuracy
/// Round trip within 1e-14 relative (tests/gap_test.cpp).
/// @par Source
/// Inverse of the laminar gap flow, derived here (docs/pages/theory_gap.md).
template <class T, detail::if_real<T> = 0>
inline result<T> gap_annulus_clearance(T q_m3_s, T dp_pa, T mu_pa_s, T bore_diameter_m, T length_m,
                                       T eccentricity_ratio) {
  using std::cbrt;
  using std::log;
  using std::exp;
  if (!detail::all_finite(q_m3_s, dp_pa, mu_pa_s, bore_diameter_m, length_m, eccentricity_ratio))
    return detail::fail<T>(status::nonfinite);
  if (!(mu_pa_s > T(0)) || !(bore_diameter_m > T(0)) || !(length_m > T(0)) || !(eccentricity_ratio >= T(0)) ||
      !(eccentricity_ratio <= T(1)))
    return detail::fail<T>(status::domain);
  const T ratio = q_m3_s / dp_pa;
  if (!(ratio > T(0)) || !detail::finite(ratio)) return detail::fail<T>(status::domain);
  // F(h) = log B(h) - log(8 mu L q / (pi dp)): zero at the clearance, increasing in h
  auto residual = [](auto h, auto q, auto dp, auto mu, auto d, auto l, auto e) {
    using std::log;
    using U = decltype(h);
    const U a = d / 2;
    return log(detail::eccentric_bracket_abh(a, U(a - h), h, e)) -
           log(U(8) * mu * l * (q / dp) / detail::pi<U>());
  };
  if constexpr (detail::is_dual_v<T>) {  // root in the value type, derivatives by the implicit rule
    using detail::primal;
    const auto v = gap_annulus_clearance(primal(q_m3_s), primal(dp_pa), primal(mu_pa_s), primal(bore_diameter_m),
                                         primal(length_m), primal(eccentricity_ratio));
    if (is_error(v.st)) return detail::fail<T>(v.st);
    return {detail::implicit_root<T>(v.value, residual, q_m3_s, dp_pa, mu_pa_s, bore_diameter_m, length_m,
                                     eccentricity_ratio),
            v.st};
  } else {
    const T a = bore_diameter_m / 2;
    const T hmax = detail::constant<T>(0.99L, "0.99") * a;
    auto f = [&](T x) {
      return residual(T(exp(x)), q_m3_s, dp_pa, mu_pa_s, bore_diameter_m, length_m, eccentricity_ratio);
    };
    const T xmax = log(hmax);
    const T e2 = eccentricity_ratio * eccentricity_ratio;
    T h0 = cbrt(T(12) * mu_pa_s * length_m * ratio / (detail::pi<T>() * T(2) * a * (T(1) + T(3) * e2 / 2)));
    if (!(h0 < hmax)) h0 = hmax / 2;
    const T x0 = log(h0), f0 = f(x0);
    const int cap = scalar_traits<T>::max_iterations;
    const T tol = 4 * scalar_traits<T>::epsilon();
    // bracket from the estimate: F grows like 3 log h, so step by -F/3 (a sixteenth more, to
    // cross the root at once), doubling the step until F changes sign; the last step stops at
    // hmax, and F < 0 there means no clearance explains the leakage (NaN ends the search)
    T step = -f0 / 3 * detail::constant<T>(1.0625L, "1.0625");
    const auto br = detail::expand_bracket(
        f, x0, f0,
        [&](T x) {
          if (x == xmax) return scalar_traits<T>::nan();
          const T next = x + step;
          step *= 2;
          return next < xmax ? next : xmax;
        },
        cap);
    if (br.st != status::ok) return detail::fail<T>(br.st == status::nonfinite ? status::domain : br.st);
    const auto r = detail::brent(f, br.a, br.b, br.fa, br.fb, tol, T(0), cap);
    if (r.st != status::ok) return detail::fail<T>(r.st == status::nonfinite ? status::domain : r.st);
    return {exp(r.x), status::ok};
  }
}
/// @}

/// @name Radial flow between parallel discs
/// @{

namespace detail {
template <class T>
inline status radial_check(T mu, T ri, T ro, T h) {
  if (!(mu > T(0)) || !(ri > T(0)) || !(ro > ri) || !(h > T(0))) return status::domain;
  return status::ok;
}
}  // namespace detail

/// Laminar radial flow between parallel discs (outward from radius r_i to r_o): sealing
/// lands of valve plates, slipper pads, hydrostatic bearings.
///
/// \f[ q = \frac{\pi h^3 \Delta p}{6 \mu \ln(r_o/r_i)} \f] with \f$\ln(r_o/r_i)\f$ formed as
/// log1p((r_o - r_i)/r_i).
///
/// @param dp_pa          \f$\Delta p = p(r_i) - p(r_o)\f$, Pa, any sign
/// @param mu_pa_s        \f$\mu\f$ dynamic viscosity, Pa s, > 0
/// @param inner_radius_m \f$r_i\f$ inner radius, m, > 0
/// @param outer_radius_m \f$r_o\f$ outer radius, m, > r_i
/// @param height_m       \f$h\f$ gap height, m, > 0
/// @return q in m^3/s; status::domain / status::nonfinite for bad input.
/// @par Validity
/// Laminar, creeping (inertia and centrifugal terms neglected), parallel surfaces.
/// @par Accuracy
/// Within 1e-14 relative of the 50-digit evaluation (tests/gap_test.cpp).
/// @par Source
/// Standard lubrication result (docs/pages/theory_gap.md).
template <class T, detail::if_real<T> = 0>
inline result<T> gap_radial_flow(T dp_pa, T mu_pa_s, T inner_radius_m, T outer_radius_m, T height_m) {
  using std::log1p;
  if (!detail::all_finite(dp_pa, mu_pa_s, inner_radius_m, outer_radius_m, height_m))
    return detail::fail<T>(status::nonfinite);
  const status s = detail::radial_check(mu_pa_s, inner_radius_m, outer_radius_m, height_m);
  if (is_error(s)) return detail::fail<T>(s);
  const T ln = log1p((outer_radius_m - inner_radius_m) / inner_radius_m);
  const T h = height_m;
  return {detail::pi<T>() * h * h * h * dp_pa / (T(6) * mu_pa_s * ln), status::ok};
}

/// Radial flow through an arc sector of angle phi (for example a valve plate sealing land
/// between kidney ports).
///
/// \f[ q = \frac{\varphi h^3 \Delta p}{12 \mu \ln(r_o/r_i)} \f]
///
/// @param dp_pa          \f$\Delta p = p(r_i) - p(r_o)\f$, Pa
/// @param mu_pa_s        \f$\mu\f$ dynamic viscosity, Pa s, > 0
/// @param inner_radius_m \f$r_i\f$, m, > 0
/// @param outer_radius_m \f$r_o\f$, m, > r_i
/// @param height_m       \f$h\f$ gap height, m, > 0
/// @param angle_rad      \f$\varphi\f$ sector angle, rad, 0 < phi <= 2 pi
/// @return q in m^3/s; status::domain for bad geometry or angle.
/// @par Validity
/// As gap_radial_flow(); side leakage across the sector's radial edges neglected.
/// @par Accuracy
/// Within 1e-14 relative of the 50-digit evaluation.
/// @par Source
/// docs/pages/theory_gap.md (sector fraction of the disc flow).
template <class T, detail::if_real<T> = 0>
inline result<T> gap_radial_sector_flow(T dp_pa, T mu_pa_s, T inner_radius_m, T outer_radius_m, T height_m,
                                        T angle_rad) {
  using std::log1p;
  if (!detail::all_finite(dp_pa, mu_pa_s, inner_radius_m, outer_radius_m, height_m, angle_rad))
    return detail::fail<T>(status::nonfinite);
  const status s = detail::radial_check(mu_pa_s, inner_radius_m, outer_radius_m, height_m);
  if (is_error(s)) return detail::fail<T>(s);
  if (!(angle_rad > T(0)) || !(angle_rad <= T(2) * detail::pi<T>())) return detail::fail<T>(status::domain);
  const T ln = log1p((outer_radius_m - inner_radius_m) / inner_radius_m);
  const T h = height_m;
  return {angle_rad * h * h * h * dp_pa / (T(12) * mu_pa_s * ln), status::ok};
}

/// Pressure at radius r in a radial land between r_i (pressure p_i) and r_o (pressure p_o).
///
/// \f[ p(r) = p_o + (p_i - p_o)\,\frac{\ln(r_o/r)}{\ln(r_o/r_i)} \f]
///
/// @param inner_pressure_pa \f$p_i\f$ pressure at r_i, Pa
/// @param outer_pressure_pa \f$p_o\f$ pressure at r_o, Pa
/// @param inner_radius_m    \f$r_i\f$, m, > 0
/// @param outer_radius_m    \f$r_o\f$, m, > r_i
/// @param radius_m          \f$r\f$, m, r_i <= r <= r_o
/// @return p in Pa; status::domain outside the land.
/// @par Validity
/// As gap_radial_flow().
/// @par Accuracy
/// Within a few ulp (log1p forms).
/// @par Source
/// Standard lubrication result (docs/pages/theory_gap.md).
template <class T, detail::if_real<T> = 0>
inline result<T> gap_radial_pressure(T inner_pressure_pa, T outer_pressure_pa, T inner_radius_m, T outer_radius_m,
                                     T radius_m) {
  using std::log1p;
  if (!detail::all_finite(inner_pressure_pa, outer_pressure_pa, inner_radius_m, outer_radius_m, radius_m))
    return detail::fail<T>(status::nonfinite);
  if (!(inner_radius_m > T(0)) || !(outer_radius_m > inner_radius_m) || !(radius_m >= inner_radius_m) ||
      !(radius_m <= outer_radius_m))
    return detail::fail<T>(status::domain);
  const T num = log1p((outer_radius_m - radius_m) / radius_m);
  const T den = log1p((outer_radius_m - inner_radius_m) / inner_radius_m);
  return {outer_pressure_pa + (inner_pressure_pa - outer_pressure_pa) * (num / den), status::ok};
}

/// Separating force of the pressure field on a radial land (annular sector r_i..r_o of angle
/// phi), the integral of p(r) over the land.
///
/// \f[ F = \varphi\Big[p_o\frac{r_o^2 - r_i^2}{2} + (p_i - p_o)\Big(\frac{r_o^2-r_i^2}{4\ln(r_o/r_i)}
///     - \frac{r_i^2}{2}\Big)\Big] \f]
/// evaluated as \f$(p_i-p_o)\,\tfrac{r_i}{2}\,[r_o(\sinh D/D - 1) + r_o - r_i]\f$,
/// \f$D = \ln(r_o/r_i)\f$, without cancellation for narrow lands. A full circular pad with a
/// recess at p_r inside r_i carries \f$W = p_r \pi (r_o^2 - r_i^2)/(2\ln(r_o/r_i))\f$ (land plus
/// recess, p_o = 0).
///
/// @param inner_pressure_pa \f$p_i\f$, Pa
/// @param outer_pressure_pa \f$p_o\f$, Pa
/// @param inner_radius_m    \f$r_i\f$, m, > 0
/// @param outer_radius_m    \f$r_o\f$, m, > r_i
/// @param angle_rad         \f$\varphi\f$, rad, 0 < phi <= 2 pi
/// @return F in N; status::domain for bad geometry or angle.
/// @par Validity
/// As gap_radial_flow().
/// @par Accuracy
/// Within 1e-14 relative of the 50-digit evaluation (tests/gap_test.cpp).
/// @par Source
/// Integration of the logarithmic land pressure p(r) of gap_radial_flow() (docs/pages/theory_gap.md).
template <class T, detail::if_real<T> = 0>
inline result<T> gap_radial_land_force(T inner_pressure_pa, T outer_pressure_pa, T inner_radius_m,
                                       T outer_radius_m, T angle_rad) {
  using std::log1p;
  if (!detail::all_finite(inner_pressure_pa, outer_pressure_pa, inner_radius_m, outer_radius_m, angle_rad))
    return detail::fail<T>(status::nonfinite);
  if (!(inner_radius_m > T(0)) || !(outer_radius_m > inner_radius_m) || !(angle_rad > T(0)) ||
      !(angle_rad <= T(2) * detail::pi<T>()))
    return detail::fail<T>(status::domain);
  const T ri = inner_radius_m, ro = outer_radius_m;
  const T dd = log1p((ro - ri) / ri);
  const T part = ri / 2 * (ro * detail::sinhc_m1(dd) + (ro - ri));
  const T area_half = (ro - ri) * (ro + ri) / 2;
  return {angle_rad * (outer_pressure_pa * area_half + (inner_pressure_pa - outer_pressure_pa) * part), status::ok};
}

/// Gap height that explains a measured radial leakage (inverse of gap_radial_flow()).
///
/// \f[ h = \sqrt[3]{\frac{6 \mu q \ln(r_o/r_i)}{\pi \Delta p}} \f]
///
/// @param q_m3_s         \f$q\f$ leakage, m^3/s, same sign as dp, nonzero
/// @param dp_pa          \f$\Delta p\f$, Pa, nonzero
/// @param mu_pa_s        \f$\mu\f$, Pa s, > 0
/// @param inner_radius_m \f$r_i\f$, m, > 0
/// @param outer_radius_m \f$r_o\f$, m, > r_i
/// @return h in m; status::domain when q and dp differ in sign or are zero.
/// @par Validity
/// As gap_radial_flow().
/// @par Accuracy
/// Within 2 ulp of the 50-digit evaluation.
/// @par Source
/// Inverse of the laminar gap flow, derived here (docs/pages/theory_gap.md).
template <class T, detail::if_real<T> = 0>
inline result<T> gap_radial_height(T q_m3_s, T dp_pa, T mu_pa_s, T inner_radius_m, T outer_radius_m) {
  using std::cbrt;
  using std::log1p;
  if (!detail::all_finite(q_m3_s, dp_pa, mu_pa_s, inner_radius_m, outer_radius_m))
    return detail::fail<T>(status::nonfinite);
  const status s = detail::radial_check(mu_pa_s, inner_radius_m, outer_radius_m, T(1));
  if (is_error(s)) return detail::fail<T>(s);
  const T ratio = q_m3_s / dp_pa;
  if (!(ratio > T(0)) || !detail::finite(ratio)) return detail::fail<T>(status::domain);
  const T ln = log1p((outer_radius_m - inner_radius_m) / inner_radius_m);
  return {cbrt(T(6) * mu_pa_s * ratio * ln / detail::pi<T>()), status::ok};
}
/// @}

/// @name Hydrostatic pad (slipper) with a feed restrictor
/// @{

/// State of a hydrostatic circular pad (recess inside r_i, land r_i..r_o) fed from a supply
/// pressure through a restrictor.
template <class T>
struct [[nodiscard]] pad_state {
  T pocket_pressure_pa;  ///< recess (pocket) pressure p_r, Pa (gauge, outside at 0)
  T q_m3_s;              ///< leakage through restrictor and land, m^3/s
  T force_n;             ///< hydrostatic separating force W = p_r A_eff, N
  T pressure_ratio;      ///< p_r / p_s (restrictor design ratio)
  T balance_ratio;       ///< W / (p_s pi d_piston^2 / 4): pad force over piston force
  pumploss::status st;   ///< status of the calculation
  /// @return true when the status is exactly ok.
  bool ok() const noexcept { return st == pumploss::status::ok; }
  /// @return true when the results are usable (ok or a report such as regime).
  bool usable() const noexcept { return pumploss::is_usable(st); }
};

namespace detail {
/// Effective area of a circular recessed pad, pi (ro^2 - ri^2)/(2 ln(ro/ri)) = pi ro ri sinh(D)/D.
template <class T>
inline T pad_effective_area(T ri, T ro) {
  using std::log1p;
  const T dd = log1p((ro - ri) / ri);
  return pi<T>() * ro * ri * (T(1) + sinhc_m1(dd));
}
/// Land resistance R_L = 6 mu ln(ro/ri)/(pi h^3).
template <class T>
inline T pad_land_resistance(T mu, T ri, T ro, T h) {
  using std::log1p;
  return T(6) * mu * log1p((ro - ri) / ri) / (pi<T>() * h * h * h);
}
template <class T>
inline pad_state<T> pad_fail(status s) {
  const T nan = scalar_traits<T>::nan();
  return {nan, nan, nan, nan, nan, s};
}
template <class T>
inline pad_state<T> pad_finish(T ps, T pr, T q, T ri, T ro, T piston_d) {
  const T w = pr * pad_effective_area(ri, ro);
  const T fp = ps * pi<T>() * piston_d * piston_d / 4;
  return {pr, q, w, pr / ps, w / fp, status::ok};
}
}  // namespace detail

/// Hydrostatic pad fed through a capillary: pocket pressure, leakage, force and balance ratio.
///
/// \f[ R_L = \frac{6\mu\ln(r_o/r_i)}{\pi h^3},\quad R_c = \frac{128\mu l_c}{\pi d_c^4},\quad
///     p_r = p_s\frac{R_L}{R_L + R_c},\quad q = \frac{p_s}{R_L + R_c},\quad
///     W = p_r\,\frac{\pi(r_o^2 - r_i^2)}{2\ln(r_o/r_i)} \f]
///
/// @param supply_pressure_pa \f$p_s\f$ supply (displacement chamber) pressure, Pa, > 0
/// @param mu_pa_s            \f$\mu\f$, Pa s, > 0
/// @param capillary_diameter_m \f$d_c\f$, m, > 0
/// @param capillary_length_m \f$l_c\f$, m, > 0
/// @param inner_radius_m     \f$r_i\f$ recess radius, m, > 0
/// @param outer_radius_m     \f$r_o\f$ outer land radius, m, > r_i
/// @param height_m           \f$h\f$ land gap, m, > 0
/// @param piston_diameter_m  \f$d_p\f$ piston diameter for the balance ratio, m, > 0
/// @return pad_state; status::domain / status::nonfinite for bad input.
/// @par Validity
/// Laminar capillary (Hagen-Poiseuille, no entrance loss) and land; parallel, non-tilted pad;
/// no rotation, squeeze or centrifugal effects; outside pressure 0 (gauge).
/// @par Accuracy
/// Within 1e-14 relative of the 50-digit evaluation (tests/gap_test.cpp).
/// @par Source
/// Rowe, Hydrostatic, Aerostatic and Hybrid Bearing Design, 2012; Stachowiak and Batchelor,
/// Engineering Tribology, chapter on hydrostatic lubrication (citations from memory);
/// algebra in docs/pages/theory_gap.md.
template <class T, detail::if_real<T> = 0>
inline pad_state<T> gap_pad_capillary(T supply_pressure_pa, T mu_pa_s, T capillary_diameter_m, T capillary_length_m,
                                      T inner_radius_m, T outer_radius_m, T height_m, T piston_diameter_m) {
  if (!detail::all_finite(supply_pressure_pa, mu_pa_s, capillary_diameter_m, capillary_length_m, inner_radius_m,
                          outer_radius_m, height_m, piston_diameter_m))
    return detail::pad_fail<T>(status::nonfinite);
  if (!(supply_pressure_pa > T(0)) || !(mu_pa_s > T(0)) || !(capillary_diameter_m > T(0)) ||
      !(capillary_length_m > T(0)) || !(inner_radius_m > T(0)) || !(outer_radius_m > inner_radius_m) ||
      !(height_m > T(0)) || !(piston_diameter_m > T(0)))
    return detail::pad_fail<T>(status::domain);
  const T rl = detail::pad_land_resistance(mu_pa_s, inner_radius_m, outer_radius_m, height_m);
  const T d2 = capillary_diameter_m * capillary_diameter_m;
  const T rc = T(128) * mu_pa_s * capillary_length_m / (detail::pi<T>() * d2 * d2);
  const T pr = supply_pressure_pa * (rl / (rl + rc));
  const T q = supply_pressure_pa / (rl + rc);
  return detail::pad_finish(supply_pressure_pa, pr, q, inner_radius_m, outer_radius_m, piston_diameter_m);
}

/// Hydrostatic pad fed through a sharp-edged orifice: pocket pressure from the flow balance
/// \f$ K_0\sqrt{p_s - p_r} = p_r/R_L \f$, \f$K_0 = C_d A_0\sqrt{2/\rho}\f$, solved in closed form:
/// \f[ m = (K_0 R_L)^2,\qquad p_r = \frac{2 p_s}{1 + \sqrt{1 + 4p_s/m}} \f]
///
/// @param supply_pressure_pa \f$p_s\f$, Pa, > 0
/// @param rho_kg_m3          \f$\rho\f$, kg/m^3, > 0
/// @param mu_pa_s            \f$\mu\f$, Pa s, > 0
/// @param orifice_diameter_m \f$d_0\f$, m, > 0
/// @param cd                 \f$C_d\f$ of the feed orifice, 0 < Cd <= 1
/// @param inner_radius_m     \f$r_i\f$, m, > 0
/// @param outer_radius_m     \f$r_o\f$, m, > r_i
/// @param height_m           \f$h\f$, m, > 0
/// @param piston_diameter_m  \f$d_p\f$, m, > 0
/// @return pad_state; status::domain / status::nonfinite for bad input.
/// @par Validity
/// As gap_pad_capillary(), turbulent feed orifice with constant Cd.
/// @par Accuracy
/// Within 1e-14 relative of the 50-digit evaluation (tests/gap_test.cpp).
/// @par Source
/// As gap_pad_capillary().
template <class T, detail::if_real<T> = 0>
inline pad_state<T> gap_pad_orifice(T supply_pressure_pa, T rho_kg_m3, T mu_pa_s, T orifice_diameter_m, T cd,
                                    T inner_radius_m, T outer_radius_m, T height_m, T piston_diameter_m) {
  using std::sqrt;
  if (!detail::all_finite(supply_pressure_pa, rho_kg_m3, mu_pa_s, orifice_diameter_m, cd, inner_radius_m,
                          outer_radius_m, height_m, piston_diameter_m))
    return detail::pad_fail<T>(status::nonfinite);
  if (!(supply_pressure_pa > T(0)) || !(rho_kg_m3 > T(0)) || !(mu_pa_s > T(0)) || !(orifice_diameter_m > T(0)) ||
      !(cd > T(0)) || !(cd <= T(1)) || !(inner_radius_m > T(0)) || !(outer_radius_m > inner_radius_m) ||
      !(height_m > T(0)) || !(piston_diameter_m > T(0)))
    return detail::pad_fail<T>(status::domain);
  const T rl = detail::pad_land_resistance(mu_pa_s, inner_radius_m, outer_radius_m, height_m);
  const T k0 = cd * detail::pi<T>() * orifice_diameter_m * orifice_diameter_m / 4 * sqrt(T(2) / rho_kg_m3);
  const T m = (k0 * rl) * (k0 * rl);
  const T pr = T(2) * supply_pressure_pa / (T(1) + sqrt(T(1) + T(4) * supply_pressure_pa / m));
  return detail::pad_finish(supply_pressure_pa, pr, pr / rl, inner_radius_m, outer_radius_m, piston_diameter_m);
}

/// Land gap at which a capillary-fed pad carries a given load (inverse of gap_pad_capillary()).
///
/// \f[ p_r = W/A_{eff},\quad R_L = R_c\frac{p_r}{p_s - p_r},\quad h = \sqrt[3]{\frac{6\mu\ln(r_o/r_i)}{\pi R_L}} \f]
///
/// @param supply_pressure_pa \f$p_s\f$, Pa, > 0
/// @param mu_pa_s            \f$\mu\f$, Pa s, > 0
/// @param capillary_diameter_m \f$d_c\f$, m, > 0
/// @param capillary_length_m \f$l_c\f$, m, > 0
/// @param inner_radius_m     \f$r_i\f$, m, > 0
/// @param outer_radius_m     \f$r_o\f$, m, > r_i
/// @param load_n             \f$W\f$ load to carry, N, 0 < W < p_s A_eff
/// @return h in m; status::domain when the load cannot be carried (W >= p_s A_eff: the pad
///         touches down) or is not positive.
/// @par Validity
/// As gap_pad_capillary().
/// @par Accuracy
/// Round trip with gap_pad_capillary() within 1e-14 relative.
/// @par Source
/// W. B. Rowe, Hydrostatic, Aerostatic and Hybrid Bearing Design, 2012 (from memory), inverted here; docs/pages/theory_gap.md.
template <class T, detail::if_real<T> = 0>
inline result<T> gap_pad_capillary_height(T supply_pressure_pa, T mu_pa_s, T capillary_diameter_m,
                                          T capillary_length_m, T inner_radius_m, T outer_radius_m, T load_n) {
  using std::cbrt;
  using std::log1p;
  if (!detail::all_finite(supply_pressure_pa, mu_pa_s, capillary_diameter_m, capillary_length_m, inner_radius_m,
                          outer_radius_m, load_n))
    return detail::fail<T>(status::nonfinite);
  if (!(supply_pressure_pa > T(0)) || !(mu_pa_s > T(0)) || !(capillary_diameter_m > T(0)) ||
      !(capillary_length_m > T(0)) || !(inner_radius_m > T(0)) || !(outer_radius_m > inner_radius_m) ||
      !(load_n > T(0)))
    return detail::fail<T>(status::domain);
  const T pr = load_n / detail::pad_effective_area(inner_radius_m, outer_radius_m);
  if (!(pr < supply_pressure_pa)) return detail::fail<T>(status::domain);
  const T d2 = capillary_diameter_m * capillary_diameter_m;
  const T rc = T(128) * mu_pa_s * capillary_length_m / (detail::pi<T>() * d2 * d2);
  const T rl = rc * pr / (supply_pressure_pa - pr);
  const T ln = log1p((outer_radius_m - inner_radius_m) / inner_radius_m);
  return {cbrt(T(6) * mu_pa_s * ln / (detail::pi<T>() * rl)), status::ok};
}

/// Land gap at which an orifice-fed pad carries a given load (inverse of gap_pad_orifice()).
///
/// \f[ p_r = W/A_{eff},\quad q = K_0\sqrt{p_s - p_r},\quad R_L = p_r/q,\quad
///     h = \sqrt[3]{\frac{6\mu\ln(r_o/r_i)}{\pi R_L}} \f]
///
/// @param supply_pressure_pa \f$p_s\f$, Pa, > 0
/// @param rho_kg_m3          \f$\rho\f$, kg/m^3, > 0
/// @param mu_pa_s            \f$\mu\f$, Pa s, > 0
/// @param orifice_diameter_m \f$d_0\f$, m, > 0
/// @param cd                 \f$C_d\f$, 0 < Cd <= 1
/// @param inner_radius_m     \f$r_i\f$, m, > 0
/// @param outer_radius_m     \f$r_o\f$, m, > r_i
/// @param load_n             \f$W\f$, N, 0 < W < p_s A_eff
/// @return h in m; status::domain when the load cannot be carried.
/// @par Validity
/// As gap_pad_orifice().
/// @par Accuracy
/// Round trip with gap_pad_orifice() within 1e-14 relative.
/// @par Source
/// W. B. Rowe, Hydrostatic, Aerostatic and Hybrid Bearing Design, 2012 (from memory), inverted here; docs/pages/theory_gap.md.
template <class T, detail::if_real<T> = 0>
inline result<T> gap_pad_orifice_height(T supply_pressure_pa, T rho_kg_m3, T mu_pa_s, T orifice_diameter_m, T cd,
                                        T inner_radius_m, T outer_radius_m, T load_n) {
  using std::cbrt;
  using std::log1p;
  using std::sqrt;
  if (!detail::all_finite(supply_pressure_pa, rho_kg_m3, mu_pa_s, orifice_diameter_m, cd, inner_radius_m,
                          outer_radius_m, load_n))
    return detail::fail<T>(status::nonfinite);
  if (!(supply_pressure_pa > T(0)) || !(rho_kg_m3 > T(0)) || !(mu_pa_s > T(0)) || !(orifice_diameter_m > T(0)) ||
      !(cd > T(0)) || !(cd <= T(1)) || !(inner_radius_m > T(0)) || !(outer_radius_m > inner_radius_m) ||
      !(load_n > T(0)))
    return detail::fail<T>(status::domain);
  const T pr = load_n / detail::pad_effective_area(inner_radius_m, outer_radius_m);
  if (!(pr < supply_pressure_pa)) return detail::fail<T>(status::domain);
  const T k0 = cd * detail::pi<T>() * orifice_diameter_m * orifice_diameter_m / 4 * sqrt(T(2) / rho_kg_m3);
  const T q = k0 * sqrt(supply_pressure_pa - pr);
  const T rl = pr / q;
  const T ln = log1p((outer_radius_m - inner_radius_m) / inner_radius_m);
  return {cbrt(T(6) * mu_pa_s * ln / (detail::pi<T>() * rl)), status::ok};
}
/// @}

/// @name Validity numbers
/// @{

/// Gap Reynolds number based on the hydraulic diameter 2h, and the laminar check.
///
/// \f[ Re = \frac{\rho \bar u D_h}{\mu} = \frac{2 \rho q}{\mu b} \f]
///
/// @param q_m3_s    \f$q\f$ flow through the gap, m^3/s (sign ignored)
/// @param width_m   \f$b\f$ wetted width across the flow, m, > 0 (pi D_m for an annulus,
///                  2 pi r or phi r for a radial gap at radius r)
/// @param rho_kg_m3 \f$\rho\f$ density, kg/m^3, > 0
/// @param mu_pa_s   \f$\mu\f$ dynamic viscosity, Pa s, > 0
/// @return Re (dimensionless); status::regime when Re > 2000 (laminar gap formulas no longer
///         apply; threshold from memory).
/// @par Validity
/// Also check the reduced number Re h/L << 1 for inertia-free flow (see gap_reduced_reynolds()).
/// @par Accuracy
/// A few ulp.
/// @par Source
/// Definition of the Reynolds number with D_h = 2h (docs/pages/theory_gap.md).
template <class T, detail::if_real<T> = 0>
inline result<T> gap_reynolds(T q_m3_s, T width_m, T rho_kg_m3, T mu_pa_s) {
  using std::fabs;
  if (!detail::all_finite(q_m3_s, width_m, rho_kg_m3, mu_pa_s)) return detail::fail<T>(status::nonfinite);
  if (!(width_m > T(0)) || !(rho_kg_m3 > T(0)) || !(mu_pa_s > T(0))) return detail::fail<T>(status::domain);
  const T re = T(2) * rho_kg_m3 * fabs(q_m3_s) / (mu_pa_s * width_m);
  return {re, re > T(2000) ? status::regime : status::ok};
}

/// Reduced gap Reynolds number Re h / L: inertia is negligible when it is well below 1.
///
/// \f[ Re^* = \frac{2 \rho q}{\mu b}\,\frac{h}{L} \f]
///
/// @param q_m3_s    \f$q\f$, m^3/s
/// @param width_m   \f$b\f$ wetted width, m, > 0
/// @param height_m  \f$h\f$ gap height, m, > 0
/// @param length_m  \f$L\f$ gap length, m, > 0
/// @param rho_kg_m3 \f$\rho\f$, kg/m^3, > 0
/// @param mu_pa_s   \f$\mu\f$, Pa s, > 0
/// @return Re* ; status::regime when Re* > 1 or Re > 2000.
/// @par Validity
/// Threshold 1 is a convention of this library for "inertia-free when Re h/L << 1".
/// @par Accuracy
/// A few ulp.
/// @par Source
/// Definition of the Reynolds number with D_h = 2h (docs/pages/theory_gap.md).
template <class T, detail::if_real<T> = 0>
inline result<T> gap_reduced_reynolds(T q_m3_s, T width_m, T height_m, T length_m, T rho_kg_m3, T mu_pa_s) {
  const result<T> re = gap_reynolds(q_m3_s, width_m, rho_kg_m3, mu_pa_s);
  if (is_error(re.st)) return re;
  if (!detail::all_finite(height_m, length_m)) return detail::fail<T>(status::nonfinite);
  if (!(height_m > T(0)) || !(length_m > T(0))) return detail::fail<T>(status::domain);
  const T red = re.value * height_m / length_m;
  return {red, (red > T(1) || re.st != status::ok) ? status::regime : status::ok};
}

/// Narrow-gap ratio h / r of an annulus: radial clearance over piston radius.
///
/// @param bore_diameter_m   bore diameter, m, > piston diameter
/// @param piston_diameter_m piston diameter, m, > 0
/// @return (D_bore - D_piston)/D_piston; status::regime above 0.05, where the narrow-gap forms
///         (gap_annulus_narrow_flow()) should give way to the exact ones.
/// @par Validity
/// Geometric ratio.
/// @par Accuracy
/// Exact up to one rounding.
/// @par Source
/// M. Galal Rabie, Fluid Power Engineering, McGraw-Hill 2009, Eq. 2.19 (docs/pages/theory_gap.md).
template <class T, detail::if_real<T> = 0>
inline result<T> gap_narrow_ratio(T bore_diameter_m, T piston_diameter_m) {
  if (!detail::all_finite(bore_diameter_m, piston_diameter_m)) return detail::fail<T>(status::nonfinite);
  if (!(piston_diameter_m > T(0)) || !(bore_diameter_m > piston_diameter_m)) return detail::fail<T>(status::domain);
  const T t = (bore_diameter_m - piston_diameter_m) / piston_diameter_m;
  return {t, t > detail::constant<T>(0.05L, "0.05") ? status::regime : status::ok};
}
/// @}

// Mixed argument types (an int literal beside doubles), promoted as Boost.Math promotes:
// one line per public template whose parameters are all scalars (promote.hpp).
PUMPLOSS_PROMOTE(gap_annulus_clearance)
PUMPLOSS_PROMOTE(gap_annulus_drag_flow)
PUMPLOSS_PROMOTE(gap_annulus_flow)
PUMPLOSS_PROMOTE(gap_annulus_narrow_flow)
PUMPLOSS_PROMOTE(gap_narrow_ratio)
PUMPLOSS_PROMOTE(gap_pad_capillary)
PUMPLOSS_PROMOTE(gap_pad_capillary_height)
PUMPLOSS_PROMOTE(gap_pad_orifice)
PUMPLOSS_PROMOTE(gap_pad_orifice_height)
PUMPLOSS_PROMOTE(gap_piston_leakage)
PUMPLOSS_PROMOTE(gap_plates_flow)
PUMPLOSS_PROMOTE(gap_plates_height)
PUMPLOSS_PROMOTE(gap_plates_height_couette)
PUMPLOSS_PROMOTE(gap_plates_power_loss)
PUMPLOSS_PROMOTE(gap_plates_shear_force)
PUMPLOSS_PROMOTE(gap_plates_velocity)
PUMPLOSS_PROMOTE(gap_radial_flow)
PUMPLOSS_PROMOTE(gap_radial_height)
PUMPLOSS_PROMOTE(gap_radial_land_force)
PUMPLOSS_PROMOTE(gap_radial_pressure)
PUMPLOSS_PROMOTE(gap_radial_sector_flow)
PUMPLOSS_PROMOTE(gap_reduced_reynolds)
PUMPLOSS_PROMOTE(gap_reynolds)

}  // namespace pumploss

#endif
