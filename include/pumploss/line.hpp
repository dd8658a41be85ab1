/// @file line.hpp
/// @brief Hydraulic lines: pipe segments, fittings (fittings.hpp), lumped components
/// (pressure-drop curves), a static height difference; total pressure drop, the share of each
/// element, and the flow a pressure drop allows. The case drain check and sizing are in
/// drain_check.hpp.
///
/// All quantities SI. Results are engineering estimates: the pump maker's allowed case
/// pressure and instructions govern.
#ifndef PUMPLOSS_LINE_HPP
#define PUMPLOSS_LINE_HPP

#include <array>
#include <cmath>
#include <cstddef>
#include <type_traits>
#include <vector>

#include "detail/roots.hpp"
#include "fittings.hpp"
#include "fluid.hpp"
#include "friction.hpp"
#include "scalar_traits.hpp"
#include "status.hpp"
#include "units.hpp"

namespace pumploss {

/// @name Line elements
/// @{

/// What a line element is.
enum class line_element_kind : int {
  pipe = 0,              ///< straight pipe, tube or hose (Darcy-Weisbach)
  fitting_k = 1,         ///< fitting with a constant K (entrance, a maker's value); reported below constant_k_min_reynolds
  fitting_l_over_d = 2,  ///< fitting by the equivalent-length method: K = f_T (L/D)_eq
  fitting_hooper = 3,    ///< fitting by Hooper's 2-K method
  fitting_darby = 4,     ///< fitting by Darby's 3-K method
  component_power = 5,   ///< lumped component, dp = dp_ref (q/q_ref)^n (nu/nu_ref)^m
  component_points = 6,  ///< lumped component, dp interpolated in measured points, times (nu/nu_ref)^m
  exit_kinetic = 7       ///< exit into a tank, K = kinetic energy factor (2 laminar, 1 turbulent; k_exit_kinetic())
};

/// Largest number of points of a component_points element.
inline constexpr int component_max_points = 16;

/// One element of a line. Build it with the line_* functions below.
template <class T>
struct line_element {
  line_element_kind kind = line_element_kind::pipe;  ///< what the element is
  T diameter_m{};   ///< bore of pipes and fittings (the velocity a K refers to), m; 0 for a
                    ///< fitting: the bore of the element it follows (line_pressure_drop())
  T length_m{};     ///< pipe length, m
  T roughness_m{};  ///< pipe absolute roughness, m
  T c1{};           ///< K (fitting_k), (L/D)_eq (fitting_l_over_d), K_1 (hooper, darby)
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
template <class T, detail::if_real<T> = 0>
inline line_element<T> line_pipe(T diameter_m, T length_m, T roughness_m) {
  line_element<T> e;
  e.kind = line_element_kind::pipe;
  e.diameter_m = diameter_m;
  e.length_m = length_m;
  e.roughness_m = roughness_m;
  return e;
}
/// A fitting with a constant loss coefficient (k_entrance_sharp, k_exit, or a maker's value).
/// A constant K holds in turbulent flow only: below constant_k_min_reynolds the element is
/// reported (status::regime); prefer line_fitting_named() or line_exit().
/// @param diameter_m bore the K refers to, m (0: the bore of the element it follows)
/// @param k loss coefficient
/// @return the element
template <class T, detail::if_real<T> = 0>
inline line_element<T> line_fitting_k(T diameter_m, T k) {
  line_element<T> e;
  e.kind = line_element_kind::fitting_k;
  e.diameter_m = diameter_m;
  e.c1 = k;
  return e;
}
/// A fitting by the equivalent-length method, K = f_T (L/D)_eq with f_T from
/// friction_factor_ft() (gate valve 8, ball valve 3, globe valve 340: Crane Technical Paper 410,
/// 2009, as in python3-fluids). A turbulent method: reported (status::regime) below
/// Re = 4000.
/// @param diameter_m bore, m (0: the bore of the element it follows)
/// @param l_over_d equivalent length in diameters
/// @return the element
template <class T, detail::if_real<T> = 0>
inline line_element<T> line_fitting_l_over_d(T diameter_m, T l_over_d) {
  line_element<T> e;
  e.kind = line_element_kind::fitting_l_over_d;
  e.diameter_m = diameter_m;
  e.c1 = l_over_d;
  return e;
}
/// A fitting by Hooper's 2-K method (k_hooper()).
/// @param diameter_m bore, m (0: the bore of the element it follows)
/// @param k1 K_1
/// @param k_inf K_infinity
/// @return the element
template <class T, detail::if_real<T> = 0>
inline line_element<T> line_fitting_hooper(T diameter_m, T k1, T k_inf) {
  line_element<T> e;
  e.kind = line_element_kind::fitting_hooper;
  e.diameter_m = diameter_m;
  e.c1 = k1;
  e.c2 = k_inf;
  return e;
}
/// A fitting by Darby's 3-K method (k_darby(), nominal size = inside diameter in inches).
/// @param diameter_m bore, m (0: the bore of the element it follows)
/// @param k1 K_1
/// @param k_i K_i
/// @param k_d K_d
/// @return the element
template <class T, detail::if_real<T> = 0>
inline line_element<T> line_fitting_darby(T diameter_m, T k1, T k_i, T k_d) {
  line_element<T> e;
  e.kind = line_element_kind::fitting_darby;
  e.diameter_m = diameter_m;
  e.c1 = k1;
  e.c2 = k_i;
  e.c3 = k_d;
  return e;
}
/// A named fitting kind with Reynolds-dependent K (k_fitting(); Darby 3-K by default).
/// @param diameter_m bore, m (0: the bore of the element it follows)
/// @param type the fitting kind (fitting_table)
/// @param method Darby 3-K or Hooper 2-K
/// @return the element (a fitting_darby or fitting_hooper element); status::domain for an
///         unknown kind or a method not tabulated for it.
template <class T>
inline result<line_element<T>> line_fitting_named(T diameter_m, fitting_type type,
                                                  fitting_method method = fitting_method::darby_3k) {
  const int i = static_cast<int>(type);
  if (i < 0 || i >= fitting_type_count) return {line_element<T>{}, status::domain};
  const auto& c = fitting_table[i];
  if (method == fitting_method::hooper_2k) {
    if (!(c.hooper_k1 >= 0)) return {line_element<T>{}, status::domain};
    return {line_fitting_hooper(diameter_m, T(c.hooper_k1), T(c.hooper_k_inf)), status::ok};
  }
  if (method != fitting_method::darby_3k) return {line_element<T>{}, status::domain};
  return {line_fitting_darby(diameter_m, T(c.darby_k1), T(c.darby_k_i), T(c.darby_k_d)), status::ok};
}
/// The exit of a line into a tank, K = kinetic energy factor of the profile (k_exit_kinetic():
/// 2 in laminar flow, 1 in turbulent flow).
/// @param diameter_m bore, m (0: the bore of the element it follows)
/// @return the element
template <class T, detail::if_real<T> = 0>
inline line_element<T> line_exit(T diameter_m) {
  line_element<T> e;
  e.kind = line_element_kind::exit_kinetic;
  e.diameter_m = diameter_m;
  return e;
}
/// A lumped component with \f$ \Delta p = \Delta p_\mathrm{ref} (q/q_\mathrm{ref})^n (\nu/\nu_\mathrm{ref})^m \f$.
/// @param q_ref_m3_s reference flow, m^3/s, > 0
/// @param dp_ref_pa pressure drop at q_ref and nu_ref, Pa, >= 0
/// @param exponent n, > 0 (1 laminar, 2 turbulent/orifice-like)
/// @param nu_ref_m2_s viscosity of the data, m^2/s, > 0
/// @param nu_exponent m, >= 0 (1 for laminar elements such as filter media, 0 for none)
/// @return the element
template <class T, detail::if_real<T> = 0>
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

/// Whether an element has a bore (pipes and fittings; components have none).
template <class T>
inline bool has_bore(const line_element<T>& e) {
  return e.kind != line_element_kind::component_power && e.kind != line_element_kind::component_points;
}

/// The bore element i is evaluated in: d_override when > 0; else its own bore; a fitting with
/// bore 0 takes the bore of the nearest element with a bore before it (the element it follows),
/// or, at the start of the line, of the first one after it. 0 when there is none.
template <class T>
inline T element_bore(const line_element<T>* elements, std::size_t count, std::size_t i, T d_override) {
  if (d_override > T(0)) return d_override;
  const auto& e = elements[i];
  if (!has_bore(e) || e.kind == line_element_kind::pipe || e.diameter_m != T(0)) return e.diameter_m;
  for (std::size_t j = i; j-- > 0;)
    if (has_bore(elements[j]) && elements[j].diameter_m != T(0)) return elements[j].diameter_m;
  for (std::size_t j = i + 1; j < count; ++j)
    if (has_bore(elements[j]) && elements[j].diameter_m != T(0)) return elements[j].diameter_m;
  return T(0);
}

/// A line element in the scalar type U: the element itself for its own type, else its value
/// parts as constants (scalar_as()), so a line given in dual numbers can be read in the value
/// type one element at a time.
template <class U, class T>
inline decltype(auto) element_as(const line_element<T>& e) {
  if constexpr (std::is_same_v<U, T>) {
    return (e);
  } else {
    line_element<U> r;
    r.kind = e.kind;
    r.diameter_m = scalar_as<U>(e.diameter_m);
    r.length_m = scalar_as<U>(e.length_m);
    r.roughness_m = scalar_as<U>(e.roughness_m);
    r.c1 = scalar_as<U>(e.c1);
    r.c2 = scalar_as<U>(e.c2);
    r.c3 = scalar_as<U>(e.c3);
    r.q_ref_m3_s = scalar_as<U>(e.q_ref_m3_s);
    r.dp_ref_pa = scalar_as<U>(e.dp_ref_pa);
    r.exponent = scalar_as<U>(e.exponent);
    r.nu_ref_m2_s = scalar_as<U>(e.nu_ref_m2_s);
    r.nu_exponent = scalar_as<U>(e.nu_exponent);
    r.n_points = e.n_points;
    for (std::size_t i = 0; i < r.q_points.size(); ++i) {
      r.q_points[i] = scalar_as<U>(e.q_points[i]);
      r.dp_points[i] = scalar_as<U>(e.dp_points[i]);
    }
    return r;
  }
}

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
    case line_element_kind::fitting_l_over_d:
    case line_element_kind::fitting_hooper:
    case line_element_kind::fitting_darby:
    case line_element_kind::exit_kinetic: {
      if (!all_finite(d, e.c1, e.c2, e.c3)) return fail<T>(status::nonfinite);
      if (!(d > T(0)) || !(e.c1 >= T(0)) || !(e.c2 >= T(0)) || !(e.c3 >= T(0))) return fail<T>(status::domain);
      const T v = aq / (pi<T>() * d * d / 4);
      const T head = rho * v * v / 2;
      const T re = rho * v * d / mu;
      if (e.kind == line_element_kind::fitting_k) {
        // A constant K is a turbulent value: report its use at lower Reynolds numbers.
        return {sign * e.c1 * head, re < T(constant_k_min_reynolds) && q != T(0) ? status::regime : status::ok};
      }
      if (e.kind == line_element_kind::exit_kinetic) {
        const auto k = k_exit_kinetic(re);
        return {sign * k.value * head, k.st};
      }
      if (e.kind == line_element_kind::fitting_l_over_d) {
        const auto ft = friction_factor_ft(d);
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
/// @param elements the elements (may be NULL when count is 0); their scalar type E may differ
///        from T: then each element is read as constants in T (detail::element_as()), as the
///        inverse line_flow_for_pressure() does for dual numbers
/// @param count number of elements
/// @param height_m height of the outlet above the inlet, m
/// @param q_m3_s flow, m^3/s (any sign; friction terms take its sign, the static part does not)
/// @param rho_kg_m3 density, kg/m^3, > 0
/// @param mu_pa_s dynamic viscosity, Pa s, > 0
/// @param element_dp_pa receives count per-element drops (may be NULL)
/// @param d_override_m when > 0, every pipe and fitting uses this bore instead of its own
///        (used by the sizing); 0 to keep the elements' bores. A fitting given bore 0 takes the
///        bore of the element it follows (at the start of the line, of the first one after it).
/// @param element_st receives count per-element statuses (may be NULL), e.g. status::regime for
///        a constant K below constant_k_min_reynolds
/// @return total and static drop with the worst element status (errors: NaN outputs).
/// @par Validity
/// Steady, incompressible, isothermal flow; each element as its own method.
/// @par Accuracy
/// As the element methods (pipe_pressure_drop(), k_hooper(), k_darby(), friction_factor_ft()).
/// @par Source
/// Darcy-Weisbach and the K method (F. M. White, Fluid Mechanics, 7th ed., 2011, Sec. 6.9);
/// elements as cited at each method (fittings.hpp, friction.hpp).
template <class T, class E = T>
inline line_drop<T> line_pressure_drop(const line_element<E>* elements, std::size_t count, T height_m, T q_m3_s,
                                       T rho_kg_m3, T mu_pa_s, T* element_dp_pa = nullptr, T d_override_m = T(0),
                                       status* element_st = nullptr) {
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
    const T d = d_override_m > T(0) ? d_override_m : detail::scalar_as<T>(detail::element_bore(elements, count, i, E(0)));
    const auto r = detail::element_dp(detail::element_as<T>(elements[i]), q_m3_s, rho_kg_m3, mu_pa_s, d);
    if (is_error(r.st)) return fail(r.st);
    st = worst(st, r.st);
    if (element_dp_pa != nullptr) element_dp_pa[i] = r.value;
    if (element_st != nullptr) element_st[i] = r.st;
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

namespace detail {
/// line_flow_for_pressure() in the scalar type T of elements given in E (the value type of a
/// dual line, or the same type): Brent's method on a bracket grown by doubling.
template <class T, class E>
inline result<T> line_flow_solve(const line_element<E>* elements, std::size_t count, T height_m, T dp_pa,
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
}  // namespace detail

/// The flow a given pressure drop drives through a line (the inverse of line_pressure_drop()).
///
/// The drop rises monotonically with flow (friction_factor()'s transition bridge keeps
/// \f$ f\,Re^2 \f$ rising), so the root is unique: it is bracketed by doubling from 1e-9 m^3/s
/// (at most scalar_traits<T>::max_iterations doublings) and found by Brent's method
/// (detail/roots.hpp) to 4 machine epsilons. For dual numbers (in the scalars or the elements)
/// the root is found in the value type and the derivatives follow from the implicit-function
/// rule (dq/dp = -F_p/F_q, detail::implicit_root()).
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
  if constexpr (detail::is_dual_v<T>) {  // root in the value type, derivatives by the implicit rule
    using detail::primal;
    using V = detail::value_type_of_t<T>;
    const auto v = detail::line_flow_solve(elements, count, V(primal(height_m)), V(primal(dp_pa)),
                                           V(primal(rho_kg_m3)), V(primal(mu_pa_s)));
    if (is_error(v.st)) return detail::fail<T>(v.st);
    auto residual = [&](auto q, auto h, auto dp, auto rho, auto mu) {  // F(q) = drop(q) - dp
      return decltype(q)(line_pressure_drop(elements, count, h, q, rho, mu).dp_pa - dp);
    };
    return {detail::implicit_root<T>(v.value, residual, height_m, dp_pa, rho_kg_m3, mu_pa_s), v.st};
  } else {
    return detail::line_flow_solve(elements, count, height_m, dp_pa, rho_kg_m3, mu_pa_s);
  }
}
/// @}

// Mixed argument types (an int literal beside doubles), promoted as Boost.Math promotes:
// one line per public template whose parameters are all scalars (promote.hpp).
PUMPLOSS_PROMOTE(line_component_power)
PUMPLOSS_PROMOTE(line_fitting_l_over_d)
PUMPLOSS_PROMOTE(line_fitting_darby)
PUMPLOSS_PROMOTE(line_fitting_hooper)
PUMPLOSS_PROMOTE(line_fitting_k)
PUMPLOSS_PROMOTE(line_pipe)
PUMPLOSS_PROMOTE(line_exit)

}  // namespace pumploss

#endif
