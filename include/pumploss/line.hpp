/// @file line.hpp
/// @brief Hydraulic lines: pipe segments, fittings (constant K, Crane f_T L/D, Hooper 2-K,
/// Darby 3-K), lumped components (pressure-drop curves), a static height difference; total
/// pressure drop, the share of each element, the flow a pressure drop allows, the case drain
/// check over a temperature range, and drain line sizing from a table of standard bores.
///
/// All quantities SI. Results are engineering estimates: the pump maker's allowed case
/// pressure and instructions govern.
#ifndef PUMPLOSS_LINE_HPP
#define PUMPLOSS_LINE_HPP

#include <array>
#include <cmath>
#include <cstddef>
#include <vector>

#include "detail/roots.hpp"
#include "fluid.hpp"
#include "friction.hpp"
#include "scalar_traits.hpp"
#include "status.hpp"
#include "units.hpp"

namespace pumploss {

/// @name Fitting loss coefficients
/// @{

/// Entrance loss coefficient of a sharp-edged inlet from a tank (Rennels, as the python3-fluids
/// default): K = 0.57.
inline constexpr double k_entrance_sharp = 0.57;
/// Exit loss coefficient into a tank: K = 1.0 (the whole velocity head is lost).
inline constexpr double k_exit = 1.0;

/// Crane's fully turbulent friction factor f_T of clean commercial steel pipe.
///
/// \f[ f_T = f_{CW}\!\left(Re = 7.5\cdot 10^6\, D,\ \varepsilon/D = 3.4126825352925\cdot 10^{-5} D^{-1.0112}\right) \f]
/// (D in m) - the fit of python3-fluids (ft_Crane) that reproduces the rounded table of
/// Crane TP-410 with the Colebrook equation.
/// @param diameter_m inside diameter, m, > 0
/// @return f_T; status::domain for D <= 0; status::regime outside 5 mm to 1 m.
/// @par Accuracy
/// Colebrook solved as friction_colebrook() (2 ulp); within 3e-6 of python3-fluids' ft_Crane,
/// which takes a single Clamond iteration (tests/line_test.cpp).
/// @par Source
/// Crane Co., Flow of Fluids Through Valves, Fittings, and Pipe, Technical Paper 410, 2009;
/// fit by C. Bell in python3-fluids 1.0.22 (fluids.fittings.ft_Crane).
template <class T>
inline result<T> crane_ft(T diameter_m) {
  using std::pow;
  if (!detail::finite(diameter_m)) return detail::fail<T>(status::nonfinite);
  if (!(diameter_m > T(0))) return detail::fail<T>(status::domain);
  const T re = detail::constant<T>(7.5e6L, "7500000") * diameter_m;
  const T rr = detail::constant<T>(3.4126825352925e-5L, "0.000034126825352925") *
               pow(diameter_m, -detail::constant<T>(1.0112L, "1.0112"));
  if (!(re >= T(1000)) || rr > T(1)) return detail::fail<T>(status::out_of_validity);
  const T f = detail::colebrook_unchecked(re, rr);
  const bool in_range = diameter_m >= detail::constant<T>(0.005L, "0.005") && diameter_m <= T(1);
  return {f, in_range ? status::ok : status::regime};
}

/// Hooper's 2-K loss coefficient of a fitting: \f[ K = \frac{K_1}{Re} + K_\infty\left(1 + \frac{1}{D_\mathrm{in}}\right) \f]
/// @param k1 K_1 (laminar constant), >= 0
/// @param k_inf K_infinity, >= 0
/// @param diameter_m inside diameter, m, > 0 (D_in is the same in inches)
/// @param reynolds Reynolds number in the fitting's bore, > 0
/// @return K; status::domain for negative constants or non-positive D or Re.
/// @par Accuracy
/// Rounding only; matches python3-fluids' Hooper2K to 1e-14 (tests/line_test.cpp).
/// @par Source
/// W. B. Hooper, "The two-K method predicts head losses in pipe fittings", Chem. Eng., 24 Aug
/// 1981, 96-100; constants as tabulated in python3-fluids (fluids.fittings.Hooper).
template <class T>
inline result<T> k_hooper(T k1, T k_inf, T diameter_m, T reynolds) {
  if (!detail::all_finite(k1, k_inf, diameter_m, reynolds)) return detail::fail<T>(status::nonfinite);
  if (!(k1 >= T(0)) || !(k_inf >= T(0)) || !(diameter_m > T(0)) || !(reynolds > T(0)))
    return detail::fail<T>(status::domain);
  return {k1 / reynolds + k_inf * (T(1) + inch_m<T>() / diameter_m), status::ok};
}

/// Darby's 3-K loss coefficient of a fitting: \f[ K = \frac{K_1}{Re} + K_i\left(1 + \frac{K_d}{D_n^{0.3}}\right) \f]
/// @param k1 K_1, >= 0
/// @param k_i K_i, >= 0
/// @param k_d K_d, >= 0
/// @param nominal_size_in nominal size D_n in inches, > 0 (for tube and hose this library uses the
///        inside diameter in inches)
/// @param reynolds Reynolds number, > 0
/// @return K; status::domain for negative constants or non-positive size or Re.
/// @par Accuracy
/// Rounding only; matches python3-fluids' Darby3K to 1e-14 (tests/line_test.cpp).
/// @par Source
/// R. Darby, "Correlate pressure drops through fittings: three constants accurately calculate
/// flow through elbows, valves and tees", Chem. Eng. 106(7) (1999) 101; constants as tabulated
/// in python3-fluids (fluids.fittings.Darby).
template <class T>
inline result<T> k_darby(T k1, T k_i, T k_d, T nominal_size_in, T reynolds) {
  using std::pow;
  if (!detail::all_finite(k1, k_i, k_d, nominal_size_in, reynolds)) return detail::fail<T>(status::nonfinite);
  if (!(k1 >= T(0)) || !(k_i >= T(0)) || !(k_d >= T(0)) || !(nominal_size_in > T(0)) || !(reynolds > T(0)))
    return detail::fail<T>(status::domain);
  return {k1 / reynolds + k_i * (T(1) + k_d * pow(nominal_size_in, -detail::constant<T>(0.3L, "0.3"))),
          status::ok};
}

/// Equivalent length of a loss coefficient: \f$ L_\mathrm{eq} = K D / f \f$.
/// @param k loss coefficient, >= 0
/// @param diameter_m bore, m, > 0
/// @param f_darcy the line's Darcy friction factor, > 0
/// @return L_eq in m; status::domain for invalid input.
/// @par Accuracy
/// Rounding only.
/// @par Source
/// Definition (Crane TP-410, 2009: K = f L/D).
template <class T>
inline result<T> equivalent_length(T k, T diameter_m, T f_darcy) {
  if (!detail::all_finite(k, diameter_m, f_darcy)) return detail::fail<T>(status::nonfinite);
  if (!(k >= T(0)) || !(diameter_m > T(0)) || !(f_darcy > T(0))) return detail::fail<T>(status::domain);
  return {k * diameter_m / f_darcy, status::ok};
}
/// @}

/// @name Line elements
/// @{

/// What a line element is.
enum class line_element_kind : int {
  pipe = 0,              ///< straight pipe, tube or hose (Darcy-Weisbach)
  fitting_k = 1,         ///< fitting with a constant K (entrance, exit, user value)
  fitting_crane = 2,     ///< fitting by Crane: K = f_T (L/D)_eq
  fitting_hooper = 3,    ///< fitting by Hooper's 2-K method
  fitting_darby = 4,     ///< fitting by Darby's 3-K method
  component_power = 5,   ///< lumped component, dp = dp_ref (q/q_ref)^n (nu/nu_ref)^m
  component_points = 6   ///< lumped component, dp interpolated in measured points, times (nu/nu_ref)^m
};

/// Largest number of points of a component_points element.
inline constexpr int component_max_points = 16;

/// One element of a line. Build it with the line_* functions below.
template <class T>
struct line_element {
  line_element_kind kind = line_element_kind::pipe;  ///< what the element is
  T diameter_m{};   ///< bore of pipes and fittings (the velocity a K refers to), m
  T length_m{};     ///< pipe length, m
  T roughness_m{};  ///< pipe absolute roughness, m
  T c1{};           ///< K (fitting_k), (L/D)_eq (crane), K_1 (hooper, darby)
  T c2{};           ///< K_infinity (hooper), K_i (darby)
  T c3{};           ///< K_d (darby)
  T q_ref_m3_s{};   ///< reference flow of a power-law component, m^3/s
  T dp_ref_pa{};    ///< pressure drop at q_ref and nu_ref, Pa
  T exponent{};     ///< flow exponent n of a power-law component
  T nu_ref_m2_s{};  ///< kinematic viscosity at which a component's data hold, m^2/s
  T nu_exponent{};  ///< viscosity exponent m (1 laminar element such as filter media, 0 none)
  int n_points = 0; ///< number of points of component_points
  std::array<T, component_max_points> q_points{};   ///< flows of the points, m^3/s, increasing
  std::array<T, component_max_points> dp_points{};  ///< pressure drops at the points, Pa, non-decreasing
};

/// A pipe, tube or hose segment.
/// @param diameter_m inside diameter, m
/// @param length_m length, m
/// @param roughness_m absolute roughness, m
/// @return the element (checked when evaluated)
template <class T>
inline line_element<T> line_pipe(T diameter_m, T length_m, T roughness_m) {
  line_element<T> e;
  e.kind = line_element_kind::pipe;
  e.diameter_m = diameter_m;
  e.length_m = length_m;
  e.roughness_m = roughness_m;
  return e;
}
/// A fitting with a constant loss coefficient (k_entrance_sharp, k_exit, or a maker's value).
/// @param diameter_m bore the K refers to, m
/// @param k loss coefficient
/// @return the element
template <class T>
inline line_element<T> line_fitting_k(T diameter_m, T k) {
  line_element<T> e;
  e.kind = line_element_kind::fitting_k;
  e.diameter_m = diameter_m;
  e.c1 = k;
  return e;
}
/// A fitting by Crane's method, K = f_T (L/D)_eq (gate valve 8, ball valve 3, globe valve 340:
/// Crane TP-410 2009, as in python3-fluids).
/// @param diameter_m bore, m
/// @param l_over_d equivalent length in diameters
/// @return the element
template <class T>
inline line_element<T> line_fitting_crane(T diameter_m, T l_over_d) {
  line_element<T> e;
  e.kind = line_element_kind::fitting_crane;
  e.diameter_m = diameter_m;
  e.c1 = l_over_d;
  return e;
}
/// A fitting by Hooper's 2-K method (k_hooper()).
/// @param diameter_m bore, m
/// @param k1 K_1
/// @param k_inf K_infinity
/// @return the element
template <class T>
inline line_element<T> line_fitting_hooper(T diameter_m, T k1, T k_inf) {
  line_element<T> e;
  e.kind = line_element_kind::fitting_hooper;
  e.diameter_m = diameter_m;
  e.c1 = k1;
  e.c2 = k_inf;
  return e;
}
/// A fitting by Darby's 3-K method (k_darby(), nominal size = inside diameter in inches).
/// @param diameter_m bore, m
/// @param k1 K_1
/// @param k_i K_i
/// @param k_d K_d
/// @return the element
template <class T>
inline line_element<T> line_fitting_darby(T diameter_m, T k1, T k_i, T k_d) {
  line_element<T> e;
  e.kind = line_element_kind::fitting_darby;
  e.diameter_m = diameter_m;
  e.c1 = k1;
  e.c2 = k_i;
  e.c3 = k_d;
  return e;
}
/// A lumped component with \f$ \Delta p = \Delta p_\mathrm{ref} (q/q_\mathrm{ref})^n (\nu/\nu_\mathrm{ref})^m \f$.
/// @param q_ref_m3_s reference flow, m^3/s, > 0
/// @param dp_ref_pa pressure drop at q_ref and nu_ref, Pa, >= 0
/// @param exponent n, > 0 (1 laminar, 2 turbulent/orifice-like)
/// @param nu_ref_m2_s viscosity of the data, m^2/s, > 0
/// @param nu_exponent m, >= 0 (1 for laminar elements such as filter media, 0 for none)
/// @return the element
template <class T>
inline line_element<T> line_component_power(T q_ref_m3_s, T dp_ref_pa, T exponent, T nu_ref_m2_s, T nu_exponent) {
  line_element<T> e;
  e.kind = line_element_kind::component_power;
  e.q_ref_m3_s = q_ref_m3_s;
  e.dp_ref_pa = dp_ref_pa;
  e.exponent = exponent;
  e.nu_ref_m2_s = nu_ref_m2_s;
  e.nu_exponent = nu_exponent;
  return e;
}
/// A lumped component given by measured points (q_i, dp_i), linearly interpolated (through
/// (0, 0) below the first point, extrapolated from the last segment above the last point),
/// times \f$ (\nu/\nu_\mathrm{ref})^m \f$.
/// @param n number of points, 1 to component_max_points
/// @param q_m3_s flows, increasing, > 0
/// @param dp_pa pressure drops, non-decreasing, >= 0
/// @param nu_ref_m2_s viscosity of the data, m^2/s, > 0
/// @param nu_exponent m, >= 0
/// @return the element; status::domain for a bad count, NULL data or non-monotone data.
template <class T>
inline result<line_element<T>> line_component_points(int n, const T* q_m3_s, const T* dp_pa, T nu_ref_m2_s,
                                                     T nu_exponent) {
  line_element<T> e;
  e.kind = line_element_kind::component_points;
  e.nu_ref_m2_s = nu_ref_m2_s;
  e.nu_exponent = nu_exponent;
  if (n < 1 || n > component_max_points || q_m3_s == nullptr || dp_pa == nullptr) return {e, status::domain};
  for (int i = 0; i < n; ++i) {
    if (!detail::all_finite(q_m3_s[i], dp_pa[i])) return {e, status::nonfinite};
    if (!(q_m3_s[i] > T(0)) || !(dp_pa[i] >= T(0))) return {e, status::domain};
    if (i > 0 && (!(q_m3_s[i] > q_m3_s[i - 1]) || dp_pa[i] < dp_pa[i - 1])) return {e, status::domain};
    e.q_points[static_cast<std::size_t>(i)] = q_m3_s[i];
    e.dp_points[static_cast<std::size_t>(i)] = dp_pa[i];
  }
  e.n_points = n;
  return {e, status::ok};
}
/// @}

namespace detail {

template <class T>
inline result<T> element_dp(const line_element<T>& e, T q, T rho, T mu, T d_override) {
  using std::fabs;
  using std::pow;
  const T d = d_override > T(0) ? d_override : e.diameter_m;
  const T sign = q < T(0) ? T(-1) : T(1);
  const T aq = fabs(q);
  switch (e.kind) {
    case line_element_kind::pipe: {
      const auto r = pipe_pressure_drop(q, rho, mu, d, e.length_m, e.roughness_m);
      return {r.dp_pa, r.st};
    }
    case line_element_kind::fitting_k:
    case line_element_kind::fitting_crane:
    case line_element_kind::fitting_hooper:
    case line_element_kind::fitting_darby: {
      if (!all_finite(d, e.c1, e.c2, e.c3)) return fail<T>(status::nonfinite);
      if (!(d > T(0)) || !(e.c1 >= T(0)) || !(e.c2 >= T(0)) || !(e.c3 >= T(0))) return fail<T>(status::domain);
      const T v = aq / (pi<T>() * d * d / 4);
      const T head = rho * v * v / 2;
      const T re = rho * v * d / mu;
      if (e.kind == line_element_kind::fitting_k) return {sign * e.c1 * head, status::ok};
      if (e.kind == line_element_kind::fitting_crane) {
        const auto ft = crane_ft(d);
        if (is_error(ft.st)) return fail<T>(ft.st);
        // A constant K is a turbulent concept: report laminar and transitional use.
        return {sign * ft.value * e.c1 * head, re < T(turbulent_reynolds_limit) && q != T(0) ? status::regime : ft.st};
      }
      // K_1/Re times the velocity head = K_1 mu v / (2 D): finite at zero flow.
      const T lam = e.c1 * mu * v / (2 * d);
      T kt;
      if (e.kind == line_element_kind::fitting_hooper) {
        kt = e.c2 * (T(1) + inch_m<T>() / d);
      } else {
        kt = e.c2 * (T(1) + e.c3 * pow(d / inch_m<T>(), -constant<T>(0.3L, "0.3")));
      }
      return {sign * (lam + kt * head), status::ok};
    }
    case line_element_kind::component_power: {
      if (!all_finite(e.q_ref_m3_s, e.dp_ref_pa, e.exponent, e.nu_ref_m2_s, e.nu_exponent))
        return fail<T>(status::nonfinite);
      if (!(e.q_ref_m3_s > T(0)) || !(e.dp_ref_pa >= T(0)) || !(e.exponent > T(0)) || !(e.nu_ref_m2_s > T(0)) ||
          !(e.nu_exponent >= T(0)))
        return fail<T>(status::domain);
      const T scale = pow(mu / rho / e.nu_ref_m2_s, e.nu_exponent);
      return {sign * e.dp_ref_pa * pow(aq / e.q_ref_m3_s, e.exponent) * scale, status::ok};
    }
    case line_element_kind::component_points: {
      if (e.n_points < 1 || e.n_points > component_max_points) return fail<T>(status::domain);
      if (!all_finite(e.nu_ref_m2_s, e.nu_exponent)) return fail<T>(status::nonfinite);
      if (!(e.nu_ref_m2_s > T(0)) || !(e.nu_exponent >= T(0))) return fail<T>(status::domain);
      const T scale = pow(mu / rho / e.nu_ref_m2_s, e.nu_exponent);
      const auto n = static_cast<std::size_t>(e.n_points);
      T q0 = T(0), p0 = T(0), q1 = e.q_points[0], p1 = e.dp_points[0];
      status st = status::ok;
      std::size_t i = 0;
      while (i + 1 < n && aq > e.q_points[i]) ++i;
      if (i > 0 || aq > e.q_points[0]) {
        if (i == 0) i = 1;  // only possible when n == 1 and q > q_0: extrapolate through (0, 0)
        if (n == 1) {
          q0 = T(0); p0 = T(0); q1 = e.q_points[0]; p1 = e.dp_points[0];
        } else {
          q0 = e.q_points[i - 1]; p0 = e.dp_points[i - 1]; q1 = e.q_points[i]; p1 = e.dp_points[i];
        }
        if (aq > e.q_points[n - 1]) st = status::extrapolated;
      }
      const T dp = p0 + (p1 - p0) * (aq - q0) / (q1 - q0);
      return {sign * dp * scale, st};
    }
  }
  return fail<T>(status::internal);
}

}  // namespace detail

/// @name Lines
/// @{

/// A hydraulic line: an ordered list of elements and the height of its outlet above its inlet.
template <class T>
struct line {
  std::vector<line_element<T>> elements;  ///< the elements in flow order
  T height_m{};  ///< height of the discharge above the inlet (case port), m; negative if below
};

/// Total pressure drop of a line.
template <class T>
struct [[nodiscard]] line_drop {
  T dp_pa;          ///< total: friction, fittings and components plus the static part, Pa
  T dp_static_pa;   ///< static part rho g dz, Pa
  pumploss::status st;  ///< worst status of the elements
  /// @return true when the status is exactly ok.
  bool ok() const noexcept { return st == pumploss::status::ok; }
  /// @return true when the results are usable (ok or a report such as regime).
  bool usable() const noexcept { return pumploss::is_usable(st); }
};

/// Pressure drop of a line at a flow, density and viscosity.
///
/// \f[ \Delta p = \rho g \Delta z + \sum_\mathrm{pipes} f \frac{L}{D}\frac{\rho v^2}{2}
///     + \sum_\mathrm{fittings} K \frac{\rho v^2}{2} + \sum_\mathrm{components} \Delta p_i(q, \nu) \f]
///
/// @param elements the elements (may be NULL when count is 0)
/// @param count number of elements
/// @param height_m height of the outlet above the inlet, m
/// @param q_m3_s flow, m^3/s (any sign; friction terms take its sign, the static part does not)
/// @param rho_kg_m3 density, kg/m^3, > 0
/// @param mu_pa_s dynamic viscosity, Pa s, > 0
/// @param element_dp_pa receives count per-element drops (may be NULL)
/// @param d_override_m when > 0, every pipe and fitting uses this bore instead of its own
///        (used by the sizing); 0 to keep the elements' bores
/// @return total and static drop with the worst element status (errors: NaN outputs).
/// @par Validity
/// Steady, incompressible, isothermal flow; each element as its own method.
/// @par Accuracy
/// As the element methods (pipe_pressure_drop(), k_hooper(), k_darby(), crane_ft()).
/// @par Source
/// docs/pages/theory_friction.md (case drain back pressure); elements as cited at each method.
template <class T>
inline line_drop<T> line_pressure_drop(const line_element<T>* elements, std::size_t count, T height_m, T q_m3_s,
                                       T rho_kg_m3, T mu_pa_s, T* element_dp_pa = nullptr, T d_override_m = T(0)) {
  const T nan = scalar_traits<T>::nan();
  auto fail = [&](status s) {
    if (element_dp_pa != nullptr) for (std::size_t i = 0; i < count; ++i) element_dp_pa[i] = nan;
    return line_drop<T>{nan, nan, s};
  };
  if (!detail::all_finite(height_m, q_m3_s, rho_kg_m3, mu_pa_s, d_override_m)) return fail(status::nonfinite);
  if (!(rho_kg_m3 > T(0)) || !(mu_pa_s > T(0)) || (elements == nullptr && count > 0)) return fail(status::domain);
  const T dp_static = rho_kg_m3 * standard_gravity<T>() * height_m;
  T total = dp_static;
  status st = status::ok;
  for (std::size_t i = 0; i < count; ++i) {
    const auto r = detail::element_dp(elements[i], q_m3_s, rho_kg_m3, mu_pa_s, d_override_m);
    if (is_error(r.st)) return fail(r.st);
    st = worst(st, r.st);
    if (element_dp_pa != nullptr) element_dp_pa[i] = r.value;
    total += r.value;
  }
  if (!detail::finite(total)) return fail(status::overflow);
  return {total, dp_static, st};
}

/// Pressure drop of a line object (see the pointer overload).
/// @param l the line
/// @param q_m3_s flow, m^3/s
/// @param rho_kg_m3 density, kg/m^3
/// @param mu_pa_s dynamic viscosity, Pa s
/// @param element_dp_pa receives l.elements.size() per-element drops (may be NULL)
/// @return as the pointer overload.
template <class T>
inline line_drop<T> line_pressure_drop(const line<T>& l, T q_m3_s, T rho_kg_m3, T mu_pa_s,
                                       T* element_dp_pa = nullptr) {
  return line_pressure_drop(l.elements.data(), l.elements.size(), l.height_m, q_m3_s, rho_kg_m3, mu_pa_s,
                            element_dp_pa);
}

/// Pressure drop of a line at a flow and oil temperature: density and viscosity of the oil at
/// t_k and zero gauge pressure from the fluid module (oil_density_at(), oil_dynamic_viscosity()).
/// @param l the line
/// @param q_m3_s flow, m^3/s
/// @param o the oil
/// @param t_k oil temperature, K
/// @param element_dp_pa receives per-element drops (may be NULL)
/// @return as line_pressure_drop(), with the worst of the oil and line statuses.
template <class T>
inline line_drop<T> line_pressure_drop_at(const line<T>& l, T q_m3_s, const oil<T>& o, T t_k,
                                          T* element_dp_pa = nullptr) {
  const T nan = scalar_traits<T>::nan();
  const auto rho = oil_density_at(o, t_k, T(0));
  const auto mu = oil_dynamic_viscosity(o, t_k, T(0));
  if (is_error(rho.st) || is_error(mu.st)) return {nan, nan, is_error(rho.st) ? rho.st : mu.st};
  auto r = line_pressure_drop(l, q_m3_s, rho.value, mu.value, element_dp_pa);
  if (!is_error(r.st)) r.st = worst(r.st, worst(rho.st, mu.st));
  return r;
}

/// The flow a given pressure drop drives through a line (the inverse of line_pressure_drop()).
///
/// The drop rises monotonically with flow (friction_factor()'s transition bridge keeps
/// \f$ f\,Re^2 \f$ rising), so the root is unique: it is bracketed by doubling from 1e-9 m^3/s
/// (at most scalar_traits<T>::max_iterations doublings) and found by Brent's method
/// (detail/roots.hpp) to 4 machine epsilons.
/// @param elements the elements
/// @param count number of elements
/// @param height_m height of the outlet above the inlet, m
/// @param dp_pa available pressure difference across the line, Pa
/// @param rho_kg_m3 density, kg/m^3, > 0
/// @param mu_pa_s dynamic viscosity, Pa s, > 0
/// @return q in m^3/s; status::out_of_validity when dp does not exceed the static part (no
///         forward flow); status::no_convergence at the iteration caps; element errors.
/// @par Accuracy
/// Round trip q -> dp -> q within 1e-12 relative (tests/line_test.cpp).
/// @par Source
/// Brent's method: R. P. Brent, Algorithms for Minimization without Derivatives, Prentice-Hall
/// 1973, ch. 4.
template <class T>
inline result<T> line_flow_for_pressure(const line_element<T>* elements, std::size_t count, T height_m, T dp_pa,
                                        T rho_kg_m3, T mu_pa_s) {
  using std::fabs;
  if (!detail::all_finite(height_m, dp_pa, rho_kg_m3, mu_pa_s)) return detail::fail<T>(status::nonfinite);
  if (!(rho_kg_m3 > T(0)) || !(mu_pa_s > T(0))) return detail::fail<T>(status::domain);
  status st = status::ok;
  auto g = [&](T q, bool& err) {
    const auto r = line_pressure_drop(elements, count, height_m, q, rho_kg_m3, mu_pa_s);
    if (is_error(r.st)) { st = r.st; err = true; return T(0); }
    st = worst(st, r.st);
    return r.dp_pa - dp_pa;
  };
  bool err = false;
  T lo = T(0), glo = g(lo, err);
  if (err) return detail::fail<T>(st);
  if (glo == T(0)) return {T(0), status::ok};
  if (glo > T(0)) return detail::fail<T>(status::out_of_validity);
  const int cap = scalar_traits<T>::max_iterations;
  auto f = [&](T q) {
    const T v = err ? T(0) : g(q, err);
    return err ? scalar_traits<T>::nan() : v;
  };
  // bracket: double the flow from 1e-9 m^3/s until the drop exceeds dp
  const T q1 = detail::constant<T>(1e-9L, "0.000000001");
  const T g1 = f(q1);
  detail::bracket<T> br{lo, glo, q1, g1, 0, status::ok};
  if (!err && g1 < T(0)) br = detail::expand_bracket(f, q1, g1, [](T q) { return q * 2; }, cap);
  if (err) return detail::fail<T>(st);
  if (br.st != status::ok) return detail::fail<T>(status::no_convergence);
  st = status::ok;
  const T tol = 4 * scalar_traits<T>::epsilon();
  const auto r = detail::brent(f, br.a, br.b, br.fa, br.fb, tol, T(0), cap);
  if (err) return detail::fail<T>(st);
  if (r.st != status::ok) return detail::fail<T>(status::no_convergence);
  return {r.x, st};
}
/// @}

/// @name Case drain check and sizing
/// @{

/// Result of the case drain check at one temperature.
template <class T>
struct [[nodiscard]] drain_point {
  T t_k;               ///< oil temperature, K
  T nu_m2_s;           ///< kinematic viscosity at t_k, m^2/s
  T case_pressure_pa;  ///< case pressure p_tank + line drop, Pa
  T margin_pa;         ///< allowed case pressure minus case pressure, Pa (>= 0 passes)
  bool pass;           ///< margin >= 0
  pumploss::status st; ///< status of the calculation at this temperature
  /// @return true when the status is exactly ok.
  bool ok() const noexcept { return st == pumploss::status::ok; }
  /// @return true when the results are usable (ok or a report such as regime).
  bool usable() const noexcept { return pumploss::is_usable(st); }
};

/// Summary of a case drain check over a temperature range.
template <class T>
struct [[nodiscard]] drain_summary {
  bool pass;               ///< passes at every temperature checked
  T worst_margin_pa;       ///< smallest margin, Pa
  T worst_t_k;             ///< temperature of the smallest margin, K
  pumploss::status st;     ///< worst status
  /// @return true when the status is exactly ok.
  bool ok() const noexcept { return st == pumploss::status::ok; }
  /// @return true when the results are usable (ok or a report such as regime).
  bool usable() const noexcept { return pumploss::is_usable(st); }
};

/// Case drain check: case pressure at the pump for a drain flow over an oil temperature range.
///
/// \f[ p_3(\theta) = p_\mathrm{tank} + \Delta p_\mathrm{line}(q_3, \rho(\theta), \mu(\theta)),
///     \qquad \mathrm{margin} = p_\mathrm{allowed} - p_3 \f]
/// evaluated at n temperatures equally spaced from cold start to maximum.
/// @param l the drain line (from the case port to the tank)
/// @param o the oil
/// @param q_drain_m3_s drain flow, m^3/s, >= 0 (use the worst case: worn pump, maximum pressure)
/// @param t_cold_k cold-start temperature, K
/// @param t_max_k maximum oil temperature, K, >= t_cold_k
/// @param n_temps number of temperatures, >= 1 (1 checks t_cold_k only), at most 1000
/// @param p_tank_pa pressure in the tank at the line's outlet, Pa (same reference as the allowed
///        pressure, gauge or absolute)
/// @param p_allowed_pa the maker's allowed case pressure, Pa
/// @param points receives n_temps results (may be NULL)
/// @return the summary; status::domain for bad counts or ranges; oil/line errors.
/// @par Validity
/// As line_pressure_drop(); the drain flow is taken as independent of the case pressure.
/// Engineering estimate: the maker's case pressure limit and instructions govern.
/// @par Accuracy
/// As line_pressure_drop() and d341_viscosity().
/// @par Source
/// docs/pages/theory_friction.md (case drain back pressure; limits common practice, no source).
template <class T>
inline drain_summary<T> drain_check(const line<T>& l, const oil<T>& o, T q_drain_m3_s, T t_cold_k, T t_max_k,
                                    int n_temps, T p_tank_pa, T p_allowed_pa, drain_point<T>* points) {
  const T nan = scalar_traits<T>::nan();
  auto fail = [&](status s) {
    if (points != nullptr) {
      for (int i = 0; i < n_temps && i < 1000; ++i) points[i] = drain_point<T>{nan, nan, nan, nan, false, s};
    }
    return drain_summary<T>{false, nan, nan, s};
  };
  if (!detail::all_finite(q_drain_m3_s, t_cold_k, t_max_k, p_tank_pa, p_allowed_pa)) return fail(status::nonfinite);
  if (n_temps < 1 || n_temps > 1000 || !(q_drain_m3_s >= T(0)) || !(t_cold_k > T(0)) || !(t_max_k >= t_cold_k))
    return fail(status::domain);
  drain_summary<T> sum{true, nan, nan, status::ok};
  for (int i = 0; i < n_temps; ++i) {
    const T t = n_temps == 1 ? t_cold_k : t_cold_k + (t_max_k - t_cold_k) * T(i) / T(n_temps - 1);
    const auto r = line_pressure_drop_at(l, q_drain_m3_s, o, t);
    if (is_error(r.st)) return fail(r.st);
    const auto nu = oil_kinematic_viscosity(o, t);
    const T pc = p_tank_pa + r.dp_pa;
    const T margin = p_allowed_pa - pc;
    const bool pass = margin >= T(0);
    if (points != nullptr) points[i] = drain_point<T>{t, nu.value, pc, margin, pass, r.st};
    sum.pass = sum.pass && pass;
    if (i == 0 || margin < sum.worst_margin_pa) {
      sum.worst_margin_pa = margin;
      sum.worst_t_k = t;
    }
    sum.st = worst(sum.st, r.st);
  }
  return sum;
}

/// Kind of a standard bore.
enum class bore_kind : int {
  tube = 1,  ///< metric hydraulic tube, OD x wall (inside diameter = OD - 2 wall)
  hose = 2   ///< hose by dash size (inside diameter = dash/16 inch, a trade convention)
};

/// A standard inside diameter.
struct standard_bore {
  const char* name;          ///< e.g. "tube 12x1" or "hose -8"
  double inside_diameter_m;  ///< inside diameter, m
  bore_kind kind;            ///< tube or hose
};

/// Common tube and hose bores, ascending by inside diameter. Hose: dash sizes -4 to -32, inside
/// diameter = dash/16 in (trade convention). Tube: metric outside diameter x wall pairs often
/// stocked for low-pressure return and drain lines (common practice, no source; check the
/// tube maker's pressure rating for other duties).
inline constexpr standard_bore standard_bores[] = {
    {"tube 6x1", 0.004, bore_kind::tube},        {"tube 8x1", 0.006, bore_kind::tube},
    {"hose -4", 0.00635, bore_kind::hose},       {"hose -5", 0.0079375, bore_kind::hose},
    {"tube 10x1", 0.008, bore_kind::tube},       {"hose -6", 0.009525, bore_kind::hose},
    {"tube 12x1", 0.010, bore_kind::tube},       {"tube 15x1.5", 0.012, bore_kind::tube},
    {"hose -8", 0.0127, bore_kind::hose},        {"tube 18x1.5", 0.015, bore_kind::tube},
    {"hose -10", 0.015875, bore_kind::hose},     {"tube 22x1.5", 0.019, bore_kind::tube},
    {"hose -12", 0.01905, bore_kind::hose},      {"tube 28x2", 0.024, bore_kind::tube},
    {"hose -16", 0.0254, bore_kind::hose},       {"tube 35x2", 0.031, bore_kind::tube},
    {"hose -20", 0.03175, bore_kind::hose},      {"tube 42x2", 0.038, bore_kind::tube},
    {"hose -24", 0.0381, bore_kind::hose},       {"hose -32", 0.0508, bore_kind::hose}};

/// Number of entries of standard_bores.
inline constexpr int standard_bore_count = static_cast<int>(sizeof(standard_bores) / sizeof(standard_bores[0]));

/// Service of a line, for the recommended velocity.
enum class line_service : int {
  suction = 0,   ///< pump suction
  pressure = 1,  ///< pressure line
  return_ = 2,   ///< return line
  drain = 3      ///< case drain line
};

/// A velocity range, m/s.
struct velocity_range {
  double min_m_s;  ///< lower end, m/s
  double max_m_s;  ///< upper end, m/s
};

/// Recommended mean line velocities (common practice, no source; guidance, never a limit):
/// suction 0.6-1.2 m/s, pressure 2-5.5 m/s, return 1.5-4 m/s, drain up to 1.5 m/s (the low end
/// of the return range).
/// @param s the service
/// @return the range in m/s
/// @par Source
/// Common practice, no source.
constexpr velocity_range recommended_velocity(line_service s) noexcept {
  switch (s) {
    case line_service::suction: return {0.6, 1.2};
    case line_service::pressure: return {2.0, 5.5};
    case line_service::return_: return {1.5, 4.0};
    case line_service::drain: return {0.0, 1.5};
  }
  return {0.0, 0.0};
}

/// Result of drain line sizing.
template <class T>
struct [[nodiscard]] drain_sizing {
  int bore_index;          ///< index into standard_bores, -1 when none passes
  T diameter_m;            ///< the chosen inside diameter, m
  T velocity_m_s;          ///< mean velocity at the drain flow, m/s
  T worst_margin_pa;       ///< smallest case pressure margin over the temperature range, Pa
  T worst_t_k;             ///< temperature of the smallest margin, K
  pumploss::status st;     ///< status; status::out_of_validity when no standard bore passes
  /// @return true when the status is exactly ok.
  bool ok() const noexcept { return st == pumploss::status::ok; }
  /// @return true when the results are usable (ok or a report such as regime).
  bool usable() const noexcept { return pumploss::is_usable(st); }
};

/// Smallest standard bore for a case drain line that passes the drain check over the whole
/// temperature range and keeps the mean velocity at or below v_max.
///
/// Every pipe and fitting of the line takes the trial bore (one bore throughout, as a drain
/// line should be); components keep their curves. Bores are tried in ascending order of
/// standard_bores, restricted to the kinds in kinds_mask.
/// @param l the drain line (its pipes' and fittings' bores are replaced by the trial bore)
/// @param o the oil
/// @param q_drain_m3_s drain flow, m^3/s, > 0
/// @param t_cold_k cold-start temperature, K
/// @param t_max_k maximum oil temperature, K
/// @param n_temps number of temperatures checked, 2 to 1000
/// @param p_tank_pa tank pressure at the outlet, Pa
/// @param p_allowed_pa allowed case pressure, Pa
/// @param v_max_m_s largest recommended velocity, m/s, > 0
///        (recommended_velocity(line_service::drain).max_m_s = 1.5 m/s, common practice)
/// @param kinds_mask 1 tubes, 2 hoses, 3 both
/// @return the bore with margin and velocity; status::out_of_validity when none passes.
/// @par Validity
/// As drain_check(). Engineering estimate: the maker's limits govern.
/// @par Accuracy
/// As drain_check().
/// @par Source
/// docs/pages/theory_friction.md (common practice, no source); bore table: hose dash sizes (trade convention), tube sizes common
/// practice, no source.
template <class T>
inline drain_sizing<T> size_drain_line(const line<T>& l, const oil<T>& o, T q_drain_m3_s, T t_cold_k, T t_max_k,
                                       int n_temps, T p_tank_pa, T p_allowed_pa, T v_max_m_s, int kinds_mask) {
  const T nan = scalar_traits<T>::nan();
  auto fail = [&](status s) { return drain_sizing<T>{-1, nan, nan, nan, nan, s}; };
  if (!detail::all_finite(q_drain_m3_s, t_cold_k, t_max_k, p_tank_pa, p_allowed_pa, v_max_m_s))
    return fail(status::nonfinite);
  if (!(q_drain_m3_s > T(0)) || !(t_cold_k > T(0)) || !(t_max_k >= t_cold_k) || n_temps < 2 || n_temps > 1000 ||
      !(v_max_m_s > T(0)) || (kinds_mask & 3) == 0)
    return fail(status::domain);
  for (int b = 0; b < standard_bore_count; ++b) {
    const auto& bore = standard_bores[b];
    if ((kinds_mask & static_cast<int>(bore.kind)) == 0) continue;
    const T d = T(bore.inside_diameter_m);
    const auto v = pipe_velocity(q_drain_m3_s, d);
    if (!(v.value <= v_max_m_s)) continue;
    drain_summary<T> sum{true, nan, nan, status::ok};
    bool skip = false;
    for (int i = 0; i < n_temps; ++i) {
      const T t = t_cold_k + (t_max_k - t_cold_k) * T(i) / T(n_temps - 1);
      const auto rho = oil_density_at(o, t, T(0));
      const auto mu = oil_dynamic_viscosity(o, t, T(0));
      if (is_error(rho.st) || is_error(mu.st)) return fail(is_error(rho.st) ? rho.st : mu.st);
      const auto r = line_pressure_drop(l.elements.data(), l.elements.size(), l.height_m, q_drain_m3_s, rho.value,
                                        mu.value, static_cast<T*>(nullptr), d);
      if (is_error(r.st)) {
        if (r.st == status::domain) { skip = true; break; }  // e.g. roughness larger than this bore
        return fail(r.st);
      }
      const T margin = p_allowed_pa - (p_tank_pa + r.dp_pa);
      if (i == 0 || margin < sum.worst_margin_pa) {
        sum.worst_margin_pa = margin;
        sum.worst_t_k = t;
      }
      sum.pass = sum.pass && margin >= T(0);
      sum.st = worst(sum.st, worst(r.st, worst(rho.st, mu.st)));
    }
    if (!skip && sum.pass) return {b, d, v.value, sum.worst_margin_pa, sum.worst_t_k, sum.st};
  }
  return fail(status::out_of_validity);
}
/// @}

// Mixed argument types (an int literal beside doubles), promoted as Boost.Math promotes:
// one line per public template whose parameters are all scalars (promote.hpp).
PUMPLOSS_PROMOTE(crane_ft)
PUMPLOSS_PROMOTE(equivalent_length)
PUMPLOSS_PROMOTE(k_darby)
PUMPLOSS_PROMOTE(k_hooper)
PUMPLOSS_PROMOTE(line_component_power)
PUMPLOSS_PROMOTE(line_fitting_crane)
PUMPLOSS_PROMOTE(line_fitting_darby)
PUMPLOSS_PROMOTE(line_fitting_hooper)
PUMPLOSS_PROMOTE(line_fitting_k)
PUMPLOSS_PROMOTE(line_pipe)

}  // namespace pumploss

#endif
