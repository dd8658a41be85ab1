/// @file loss_model.hpp
/// @brief Loss models of positive-displacement pumps and motors fitted to test points: Wilson's
/// model (slip, viscous drag, Coulomb friction, constant torque loss) and the Schlösser extension
/// (turbulent slip, hydrodynamic torque); diagnostics, prediction and efficiency maps.
///
/// SI: pressure Pa, speed rev/s (omega = 2 pi n inside), viscosity Pa s, flow m^3/s, torque N m,
/// displacement m^3/rev (D = V_i / (2 pi) per radian inside). Results are engineering estimates.
#ifndef PUMPLOSS_LOSS_MODEL_HPP
#define PUMPLOSS_LOSS_MODEL_HPP

#include <cmath>
#include <cstddef>

#include "detail/lsq.hpp"
#include "efficiency.hpp"
#include "scalar_traits.hpp"
#include "status.hpp"

namespace pumploss {

/// Which loss model.
enum class loss_model_kind : int {
  wilson = 0,     ///< Wilson: laminar slip C_s; viscous C_v, Coulomb C_f, constant T_c torque losses
  schloesser = 1  ///< Wilson plus turbulent slip C_st (sqrt(dp)) and hydrodynamic torque C_h (speed^2)
};

/// A fitted loss model with its diagnostics.
template <class T>
struct [[nodiscard]] loss_model {
  machine kind;                 ///< pump or motor (the signs of the losses differ)
  loss_model_kind model;        ///< wilson or schloesser
  T displacement_m3_rev;        ///< V_i used (state the estimator that gave it)
  T rho_kg_m3;                  ///< density used by the Schlösser terms, kg/m^3
  T c_s;                        ///< laminar slip coefficient C_s (dimensionless)
  T c_st;                       ///< turbulent slip coefficient C_st (dimensionless; 0 for Wilson)
  T c_v;                        ///< viscous drag coefficient C_v (dimensionless)
  T c_f;                        ///< Coulomb friction coefficient C_f (dimensionless)
  T t_c_n_m;                    ///< constant torque loss T_c, N m
  T c_h;                        ///< hydrodynamic torque coefficient C_h (dimensionless; 0 for Wilson)
  T u_c_s;                      ///< standard error of C_s
  T u_c_st;                     ///< standard error of C_st (0 for Wilson)
  T u_c_v;                      ///< standard error of C_v
  T u_c_f;                      ///< standard error of C_f
  T u_t_c_n_m;                  ///< standard error of T_c, N m
  T u_c_h;                      ///< standard error of C_h (0 for Wilson)
  T r2_flow;                    ///< coefficient of determination of the flow-loss regression
  T r2_torque;                  ///< coefficient of determination of the torque-loss regression
  T rms_flow_m3_s;              ///< RMS flow residual, m^3/s
  T rms_torque_n_m;             ///< RMS torque residual, N m
  T cond_flow;                  ///< condition number of the column-scaled flow design matrix
  T cond_torque;                ///< condition number of the column-scaled torque design matrix
  T dp_min;                     ///< lowest pressure of the data, Pa
  T dp_max;                     ///< highest pressure of the data, Pa
  T n_min;                      ///< lowest speed of the data, rev/s
  T n_max;                      ///< highest speed of the data, rev/s
  T mu_min;                     ///< lowest viscosity of the data, Pa s
  T mu_max;                     ///< highest viscosity of the data, Pa s
  T q_c_m3_s;                   ///< constant flow loss Q_c, m^3/s (0 unless the constant column was chosen)
  T c_k;                        ///< compression coefficient C_k of the column D omega dp / K (0 unless chosen)
  T u_q_c_m3_s;                 ///< standard error of Q_c, m^3/s
  T u_c_k;                      ///< standard error of C_k
  T bulk_modulus_pa;            ///< K used by the compression column, Pa
  unsigned flow_terms;          ///< loss_flow_term bits of the extra flow columns in the chosen model
  T aic_flow;                   ///< Akaike information criterion of the chosen flow regression
  T bic_flow;                   ///< Bayesian (Schwarz) information criterion of the chosen flow regression
  T resid_corr_dp;              ///< correlation of the flow residuals with the pressure (systematic: |r| > 0.5)
  T resid_corr_speed;           ///< correlation of the flow residuals with the speed
  T resid_corr_mu;              ///< correlation of the flow residuals with the viscosity
  T max_std_resid_flow;         ///< largest |residual| / s of the flow regression (outlier: > 3)
  T u_displacement_m3_rev;      ///< standard uncertainty of V_i included in the coefficients' errors, m^3/rev
  std::size_t points;           ///< number of test points
  status st;                    ///< ok, ill_conditioned (report), or an error
  /// @return true when the status is exactly ok.
  bool ok() const noexcept { return st == pumploss::status::ok; }
  /// @return true when the results are usable (ok or a report such as regime).
  bool usable() const noexcept { return pumploss::is_usable(st); }
};

/// Extra columns of the flow-loss regression (bits of loss_fit_options::flow_terms).
enum loss_flow_term : unsigned {
  flow_term_constant = 1u,    ///< a constant flow loss Q_c (e.g. a compensator's pilot flow)
  flow_term_compression = 2u  ///< compression of the delivered oil, C_k D omega dp / K
};

/// Information criterion that chooses among the flow models.
enum class info_criterion : int {
  aic = 0,  ///< Akaike: m ln(RSS/m) + 2k (Akaike, IEEE Trans. Autom. Control 19 (1974) 716-723)
  bic = 1   ///< Schwarz: m ln(RSS/m) + k ln m (Schwarz, Ann. Stat. 6 (1978) 461-464)
};

/// Fit options.
template <class T>
struct loss_fit_options {
  T cond_limit = T(1e8);  ///< condition number above which the fit is reported ill_conditioned
  unsigned flow_terms = 0u;  ///< extra flow columns offered (loss_flow_term bits)
  bool select_flow_terms = true;  ///< choose the subset of flow_terms with the lowest criterion (false: all)
  info_criterion criterion = info_criterion::bic;  ///< the criterion that chooses
  T bulk_modulus_pa = T(1.4e9);  ///< K of the compression column, Pa
  T u_displacement_m3_rev = T(0);  ///< standard uncertainty of V_i, propagated into every coefficient's error
};

/// Workspace (number of T values) fit_loss_model() needs for `count` points.
/// @param count number of test points
/// @return 6 * count
constexpr std::size_t loss_fit_workspace(std::size_t count) noexcept { return 6 * count; }

/// A prediction of flow, torque and efficiencies from a fitted model.
template <class T>
struct [[nodiscard]] loss_prediction {
  T flow_m3_s;   ///< pump outlet flow or motor inlet flow, m^3/s
  T torque_n_m;  ///< pump input torque or motor output torque, N m
  T eta_v;       ///< volumetric efficiency
  T eta_hm;      ///< hydromechanical efficiency
  T eta_t;       ///< overall efficiency
  status st;     ///< ok, extrapolated (outside the data's ranges), or an error
  /// @return true when the status is exactly ok.
  bool ok() const noexcept { return st == pumploss::status::ok; }
  /// @return true when the results are usable (ok or a report such as regime).
  bool usable() const noexcept { return pumploss::is_usable(st); }
};

namespace detail {
template <class T>
struct loss_terms {
  T omega, d, flow_slip, flow_turb, tq_visc, tq_coul, tq_hydro;
};
// Regressor columns of the linear loss-model fit at one point (docs/pages/theory_efficiency.md).
template <class T>
inline loss_terms<T> loss_columns(T d, T rho, T dp, T n, T mu) {
  using std::cbrt;
  using std::sqrt;
  const T omega = 2 * pi<T>() * n;
  const T d13 = cbrt(d);
  return {omega,
          d,
          d * dp / mu,
          d13 * d13 * sqrt(2 * dp / rho),
          d * mu * omega,
          d * dp,
          rho * omega * omega * d * d13 * d13};
}
// Pearson correlation of two series (0 when either is constant).
template <class T>
inline T correlation(std::size_t n, const T* x, const T* y) {
  using std::sqrt;
  T mx = T(0), my = T(0);
  for (std::size_t i = 0; i < n; ++i) {
    mx += x[i];
    my += y[i];
  }
  mx /= T(static_cast<double>(n));
  my /= T(static_cast<double>(n));
  T sxy = T(0), sxx = T(0), syy = T(0);
  for (std::size_t i = 0; i < n; ++i) {
    sxy += (x[i] - mx) * (y[i] - my);
    sxx += (x[i] - mx) * (x[i] - mx);
    syy += (y[i] - my) * (y[i] - my);
  }
  return sxx > T(0) && syy > T(0) ? sxy / sqrt(sxx * syy) : T(0);
}
template <class T>
inline loss_model<T> loss_model_fail(machine kind, loss_model_kind model, T v, T rho, std::size_t count, status s) {
  const T nan = scalar_traits<T>::nan();
  loss_model<T> r;
  r.kind = kind;
  r.model = model;
  r.displacement_m3_rev = v;
  r.rho_kg_m3 = rho;
  r.c_s = r.c_st = r.c_v = r.c_f = r.t_c_n_m = r.c_h = nan;
  r.u_c_s = r.u_c_st = r.u_c_v = r.u_c_f = r.u_t_c_n_m = r.u_c_h = nan;
  r.r2_flow = r.r2_torque = r.rms_flow_m3_s = r.rms_torque_n_m = r.cond_flow = r.cond_torque = nan;
  r.dp_min = r.dp_max = r.n_min = r.n_max = r.mu_min = r.mu_max = nan;
  r.q_c_m3_s = r.c_k = r.u_q_c_m3_s = r.u_c_k = r.bulk_modulus_pa = nan;
  r.flow_terms = 0u;
  r.aic_flow = r.bic_flow = r.resid_corr_dp = r.resid_corr_speed = r.resid_corr_mu = r.max_std_resid_flow = nan;
  r.u_displacement_m3_rev = nan;
  r.points = count;
  r.st = s;
  return r;
}
}  // namespace detail

/// Fit Wilson's loss model (or the Schlösser extension) to test points by linear least squares,
/// optionally with a constant flow loss and a compression column chosen by an information
/// criterion.
///
/// Pump (motor: the loss terms change sign, \f$ y_q = q - D\omega \f$, \f$ y_T = D\Delta p - T \f$):
/// \f[ y_q = D\omega - q = C_s \frac{D \Delta p}{\mu} \;[+\, C_{st} D^{2/3}\sqrt{2\Delta p/\rho}]
///     \;[+\, Q_c] \;[+\, C_k D\omega\frac{\Delta p}{K}] \f]
/// \f[ y_T = T - D\Delta p = C_v D \mu \omega + C_f D \Delta p + T_c \;[+\, C_h \rho \omega^2 D^{5/3}] \f]
/// with \f$ D = V_i/(2\pi) \f$, \f$ \omega = 2\pi n \f$. The constant \f$Q_c\f$ takes a
/// compensator's pilot flow; \f$C_k\f$ the compression of the delivered oil and its dead volume
/// (about 1 + z V_dead / V_i; see piston_pump_flow_loss()). Without them a constant loss is
/// forced into C_s (or C_st) and the residuals are systematic. Among the subsets of
/// opt.flow_terms the one with the lowest criterion is kept (BIC by default:
/// \f$ m\ln(RSS/m) + k\ln m \f$; AIC: \f$ m\ln(RSS/m) + 2k \f$). Each regression is solved by
/// Householder QR after scaling the columns to unit norm (never the normal equations); standard
/// errors from \f$ s^2 (R^T R)^{-1} \f$, plus \f$ (\partial c/\partial V_i)^2 u^2(V_i) \f$ when the
/// displacement's uncertainty is given (the coefficients refitted at \f$V_i \pm 10^{-6}V_i\f$);
/// condition number \f$ \|R\|_1 \|R^{-1}\|_1 \f$ of the scaled matrix. Residual diagnostics: the
/// correlation of the flow residuals with pressure, speed and viscosity (a missing term shows as
/// |r| well above 0.3) and the largest standardised residual.
///
/// @param kind machine::pump or machine::motor
/// @param model loss_model_kind::wilson or loss_model_kind::schloesser
/// @param displacement_m3_rev V_i, m^3/rev, > 0 (from the derived-displacement estimators)
/// @param rho_kg_m3 oil density for the Schlösser terms, kg/m^3, > 0
/// @param dp_pa array of pressure differences, Pa, > 0
/// @param speed_rev_s array of speeds, rev/s, > 0
/// @param mu_pa_s array of dynamic viscosities at the gaps (case or drain temperature), Pa s, > 0
/// @param flow_m3_s array of flows (pump outlet, motor inlet), m^3/s, >= 0
/// @param torque_n_m array of torques (pump input, motor output), N m, >= 0
/// @param count number of points, > number of torque coefficients (3 Wilson, 4 Schlösser)
/// @param work caller's workspace of loss_fit_workspace(count) values
/// @param flow_residual_m3_s optional array of count (may be null): measured minus fitted flow
/// @param torque_residual_n_m optional array of count (may be null): measured minus fitted torque
/// @param opt options (condition limit, extra flow columns and criterion, K, u(V_i))
/// @return the model; status::ill_conditioned (report) when a condition number exceeds
///         opt.cond_limit (e.g. viscosity times speed proportional to pressure on the test grid);
///         status::insufficient_data for too few or degenerate points; status::domain /
///         nonfinite / misuse for bad input; status::overflow when finite data overflow the
///         fit (a coefficient, error or residual would not be finite; residuals NaN).
/// @par Validity
/// Wilson's form assumes laminar slip and linear friction laws; at low Stribeck number
/// mu n / dp (mixed lubrication) real machines depart from it (equations as in Merritt 1967).
/// @par Accuracy
/// Exact synthetic data are recovered to 1e-10 relative; on noisy data the coefficients lie within
/// their reported standard errors (tests/loss_model_test.cpp); agrees with numpy.linalg.lstsq
/// (tests/python/test_efficiency_lsq.py).
/// @par Source
/// Information criteria: H. Akaike, IEEE Trans. Autom. Control 19 (1974) 716-723; G. Schwarz,
/// Ann. Stat. 6 (1978) 461-464. W. E. Wilson, Trans. ASME 71 (1949) and Positive-Displacement Pumps and Fluid Motors (1950), as
/// in H. E. Merritt, Hydraulic Control Systems, Wiley 1967; W. M. J. Schlösser, Hydraulic Pneumatic
/// Power (1961) (both citations from memory); Householder QR as in Golub & Van
/// Loan, Matrix Computations, 4th ed. 2013, 5.3.
template <class T>
inline loss_model<T> fit_loss_model(machine kind, loss_model_kind model, T displacement_m3_rev, T rho_kg_m3,
                                    const T* dp_pa, const T* speed_rev_s, const T* mu_pa_s, const T* flow_m3_s,
                                    const T* torque_n_m, std::size_t count, T* work, T* flow_residual_m3_s = nullptr,
                                    T* torque_residual_n_m = nullptr, const loss_fit_options<T>& opt = {}) {
  using std::sqrt;
  const T v = displacement_m3_rev, rho = rho_kg_m3;
  auto fail = [&](status s) { return detail::loss_model_fail(kind, model, v, rho, count, s); };
  if (dp_pa == nullptr || speed_rev_s == nullptr || mu_pa_s == nullptr || flow_m3_s == nullptr ||
      torque_n_m == nullptr || work == nullptr)
    return fail(status::misuse);
  if (!detail::all_finite(v, rho)) return fail(status::nonfinite);
  if (!(v > T(0)) || !(rho > T(0))) return fail(status::domain);
  loss_model<T> r = fail(status::ok);
  r.dp_min = r.n_min = r.mu_min = scalar_traits<T>::max();
  r.dp_max = r.n_max = r.mu_max = T(0);
  for (std::size_t i = 0; i < count; ++i) {
    if (!detail::all_finite(dp_pa[i], speed_rev_s[i], mu_pa_s[i], flow_m3_s[i], torque_n_m[i]))
      return fail(status::nonfinite);
    if (!(dp_pa[i] > T(0)) || !(speed_rev_s[i] > T(0)) || !(mu_pa_s[i] > T(0)) || !(flow_m3_s[i] >= T(0)) ||
        !(torque_n_m[i] >= T(0)))
      return fail(status::domain);
    r.dp_min = dp_pa[i] < r.dp_min ? dp_pa[i] : r.dp_min;
    r.dp_max = dp_pa[i] > r.dp_max ? dp_pa[i] : r.dp_max;
    r.n_min = speed_rev_s[i] < r.n_min ? speed_rev_s[i] : r.n_min;
    r.n_max = speed_rev_s[i] > r.n_max ? speed_rev_s[i] : r.n_max;
    r.mu_min = mu_pa_s[i] < r.mu_min ? mu_pa_s[i] : r.mu_min;
    r.mu_max = mu_pa_s[i] > r.mu_max ? mu_pa_s[i] : r.mu_max;
  }
  const bool ext = model == loss_model_kind::schloesser;
  const std::size_t pt = ext ? 4 : 3;
  const std::size_t pq = (ext ? 2u : 1u) + ((opt.flow_terms & 1u) ? 1u : 0u) + ((opt.flow_terms & 2u) ? 1u : 0u);
  if (count <= pt || count <= pq) return fail(status::insufficient_data);
  if (!detail::all_finite(opt.bulk_modulus_pa, opt.u_displacement_m3_rev)) return fail(status::nonfinite);
  if (!(opt.bulk_modulus_pa > T(0)) || !(opt.u_displacement_m3_rev >= T(0)) || (opt.flow_terms & ~3u) != 0u)
    return fail(status::domain);
  const T sign = kind == machine::pump ? T(1) : T(-1);
  const T kb = opt.bulk_modulus_pa;
  const std::size_t m = count;
  T* a = work;
  T* b = work + 5 * m;
  // flow columns in order: slip, [turbulent], [constant], [compression]
  auto flow_fit = [&](T vol, unsigned terms) {
    const T dd = vol / (2 * detail::pi<T>());
    std::size_t p = 0;
    for (std::size_t i = 0; i < m; ++i) {
      const auto c = detail::loss_columns(dd, rho, dp_pa[i], speed_rev_s[i], mu_pa_s[i]);
      std::size_t j = 0;
      a[j++ * m + i] = c.flow_slip;
      if (ext) a[j++ * m + i] = c.flow_turb;
      if (terms & flow_term_constant) a[j++ * m + i] = T(1);
      if (terms & flow_term_compression) a[j++ * m + i] = c.d * c.omega * dp_pa[i] / kb;
      b[i] = sign * (c.d * c.omega - flow_m3_s[i]);
      p = j;
    }
    auto res = detail::householder_lsq(a, m, p, b, opt.cond_limit);
    res.p = p;
    return res;
  };
  auto torque_fit = [&](T vol) {
    const T dd = vol / (2 * detail::pi<T>());
    for (std::size_t i = 0; i < m; ++i) {
      const auto c = detail::loss_columns(dd, rho, dp_pa[i], speed_rev_s[i], mu_pa_s[i]);
      a[i] = c.tq_visc;
      a[m + i] = c.tq_coul;
      a[2 * m + i] = T(1);
      if (ext) a[3 * m + i] = c.tq_hydro;
      b[i] = sign * (torque_n_m[i] - dd * dp_pa[i]);
    }
    return detail::householder_lsq(a, m, pt, b, opt.cond_limit);
  };
  auto total_ss = [&](T vol, bool flow) {
    const T dd = vol / (2 * detail::pi<T>());
    T mean = T(0), ss = T(0);
    for (std::size_t i = 0; i < m; ++i)
      mean += flow ? sign * (dd * 2 * detail::pi<T>() * speed_rev_s[i] - flow_m3_s[i]) : sign * (torque_n_m[i] - dd * dp_pa[i]);
    mean /= T(static_cast<double>(m));
    for (std::size_t i = 0; i < m; ++i) {
      const T y = flow ? sign * (dd * 2 * detail::pi<T>() * speed_rev_s[i] - flow_m3_s[i]) : sign * (torque_n_m[i] - dd * dp_pa[i]);
      ss += (y - mean) * (y - mean);
    }
    return ss;
  };
  // --- flow regression: every subset of the offered columns, the lowest criterion wins
  using std::log;
  const T mm = T(static_cast<double>(m));
  T ymax = T(0);
  for (std::size_t i = 0; i < m; ++i) ymax = flow_m3_s[i] > ymax ? flow_m3_s[i] : ymax;
  const T floor_ms = (T(1e-15) * ymax) * (T(1e-15) * ymax);  // rounding floor of RSS/m
  auto criteria = [&](T rss, std::size_t p, T& aic, T& bic) {
    const T ms = rss / mm > floor_ms ? rss / mm : floor_ms;
    aic = mm * log(ms) + T(2) * T(static_cast<double>(p));
    bic = mm * log(ms) + T(static_cast<double>(p)) * log(mm);
  };
  unsigned best_terms = opt.flow_terms;
  if (opt.select_flow_terms && opt.flow_terms != 0u) {
    T best = scalar_traits<T>::max();
    for (unsigned t = 0; t <= 3u; ++t) {
      if ((t & ~opt.flow_terms) != 0u) continue;
      const auto f = flow_fit(v, t);
      if (is_error(f.st)) continue;
      T aic, bic;
      criteria(f.rss, f.p, aic, bic);
      const T ic = opt.criterion == info_criterion::aic ? aic : bic;
      if (ic < best) {
        best = ic;
        best_terms = t;
      }
    }
  }
  const auto fq = flow_fit(v, best_terms);
  if (is_error(fq.st)) return fail(fq.st);
  r.flow_terms = best_terms;
  r.bulk_modulus_pa = kb;
  criteria(fq.rss, fq.p, r.aic_flow, r.bic_flow);
  std::size_t j = 0;
  r.c_s = fq.x[j];
  r.u_c_s = fq.se[j++];
  r.c_st = ext ? fq.x[j] : T(0);
  r.u_c_st = ext ? fq.se[j++] : T(0);
  r.q_c_m3_s = (best_terms & flow_term_constant) ? fq.x[j] : T(0);
  r.u_q_c_m3_s = (best_terms & flow_term_constant) ? fq.se[j++] : T(0);
  r.c_k = (best_terms & flow_term_compression) ? fq.x[j] : T(0);
  r.u_c_k = (best_terms & flow_term_compression) ? fq.se[j++] : T(0);
  r.cond_flow = fq.cond;
  r.rms_flow_m3_s = sqrt(fq.rss / mm);
  const T tss_q = total_ss(v, true);
  r.r2_flow = tss_q > T(0) ? T(1) - fq.rss / tss_q : T(1);
  // --- torque regression
  const auto ft = torque_fit(v);
  if (is_error(ft.st)) return fail(ft.st);
  r.c_v = ft.x[0];
  r.c_f = ft.x[1];
  r.t_c_n_m = ft.x[2];
  r.c_h = ext ? ft.x[3] : T(0);
  r.u_c_v = ft.se[0];
  r.u_c_f = ft.se[1];
  r.u_t_c_n_m = ft.se[2];
  r.u_c_h = ext ? ft.se[3] : T(0);
  r.cond_torque = ft.cond;
  r.rms_torque_n_m = sqrt(ft.rss / mm);
  const T tss_t = total_ss(v, false);
  r.r2_torque = tss_t > T(0) ? T(1) - ft.rss / tss_t : T(1);
  r.st = worst(fq.st, ft.st);
  // --- the displacement's uncertainty: coefficients refitted at V +- h, first order,
  // u^2 = se^2 + (dc/dV u_V)^2 (V_i independent of the regression's noise)
  r.u_displacement_m3_rev = opt.u_displacement_m3_rev;
  if (opt.u_displacement_m3_rev > T(0)) {
    const T h = v * T(1e-6);
    const auto qp = flow_fit(v + h, best_terms), qm = flow_fit(v - h, best_terms);
    const auto tp = torque_fit(v + h), tm = torque_fit(v - h);
    if (is_error(qp.st) || is_error(qm.st) || is_error(tp.st) || is_error(tm.st)) return fail(status::internal);
    auto add = [&](T& u, T xp, T xm) {
      const T g = (xp - xm) / (2 * h) * opt.u_displacement_m3_rev;
      u = sqrt(u * u + g * g);
    };
    std::size_t k = 0;
    add(r.u_c_s, qp.x[k], qm.x[k]);
    ++k;
    if (ext) { add(r.u_c_st, qp.x[k], qm.x[k]); ++k; }
    if (best_terms & flow_term_constant) { add(r.u_q_c_m3_s, qp.x[k], qm.x[k]); ++k; }
    if (best_terms & flow_term_compression) add(r.u_c_k, qp.x[k], qm.x[k]);
    add(r.u_c_v, tp.x[0], tm.x[0]);
    add(r.u_c_f, tp.x[1], tm.x[1]);
    add(r.u_t_c_n_m, tp.x[2], tm.x[2]);
    if (ext) add(r.u_c_h, tp.x[3], tm.x[3]);
  }
  // --- residuals (measured minus fitted) and their diagnostics
  const T d = v / (2 * detail::pi<T>());
  T* rq = work;  // the design matrix is no longer needed
  for (std::size_t i = 0; i < m; ++i) {
    const auto c = detail::loss_columns(d, rho, dp_pa[i], speed_rev_s[i], mu_pa_s[i]);
    const T ql = r.c_s * c.flow_slip + r.c_st * c.flow_turb + r.q_c_m3_s + r.c_k * c.d * c.omega * dp_pa[i] / kb;
    const T tl = r.c_v * c.tq_visc + r.c_f * c.tq_coul + r.t_c_n_m + r.c_h * c.tq_hydro;
    rq[i] = flow_m3_s[i] - (c.d * c.omega - sign * ql);
    if (flow_residual_m3_s != nullptr) flow_residual_m3_s[i] = rq[i];
    if (torque_residual_n_m != nullptr) torque_residual_n_m[i] = torque_n_m[i] - (d * dp_pa[i] + sign * tl);
  }
  const T s_r = sqrt(fq.rss / T(static_cast<double>(m - fq.p)));
  r.max_std_resid_flow = T(0);
  for (std::size_t i = 0; i < m; ++i) {
    using std::fabs;
    const T z = s_r > T(0) ? fabs(rq[i]) / s_r : T(0);
    r.max_std_resid_flow = z > r.max_std_resid_flow ? z : r.max_std_resid_flow;
  }
  r.resid_corr_dp = detail::correlation(m, rq, dp_pa);
  r.resid_corr_speed = detail::correlation(m, rq, speed_rev_s);
  r.resid_corr_mu = detail::correlation(m, rq, mu_pa_s);
  // Finite data can still overflow the fit (flows or torques near the largest double): a model
  // with a non-finite coefficient, error or residual is no model (found by tests/fuzz/fuzz_handles).
  bool finite_fit = detail::all_finite(r.c_s, r.c_st, r.q_c_m3_s, r.c_k, r.c_v, r.c_f, r.t_c_n_m, r.c_h) &&
                    detail::all_finite(r.u_c_s, r.u_c_st, r.u_q_c_m3_s, r.u_c_k, r.u_c_v, r.u_c_f, r.u_t_c_n_m, r.u_c_h) &&
                    detail::all_finite(r.rms_flow_m3_s, r.rms_torque_n_m, r.r2_flow, r.r2_torque);
  for (std::size_t i = 0; i < m && finite_fit; ++i)
    finite_fit = detail::finite(rq[i]) && (torque_residual_n_m == nullptr || detail::finite(torque_residual_n_m[i]));
  if (!finite_fit) {
    for (std::size_t i = 0; i < m; ++i) {
      if (flow_residual_m3_s != nullptr) flow_residual_m3_s[i] = scalar_traits<T>::nan();
      if (torque_residual_n_m != nullptr) torque_residual_n_m[i] = scalar_traits<T>::nan();
    }
    return fail(status::overflow);
  }
  return r;
}

/// Flow, torque and efficiencies predicted by a fitted model at one operating point.
///
/// Pump: \f$ q = D\omega - C_s D\Delta p/\mu - C_{st} D^{2/3}\sqrt{2\Delta p/\rho} - Q_c - C_k D\omega\Delta p/K \f$,
/// \f$ T = D\Delta p + C_v D\mu\omega + C_f D\Delta p + T_c + C_h\rho\omega^2 D^{5/3} \f$;
/// motor: the loss terms with the opposite sign; efficiencies by pump_efficiency() /
/// motor_efficiency().
///
/// @param m a fitted model (fit_loss_model())
/// @param dp_pa pressure difference, Pa, > 0
/// @param speed_rev_s speed, rev/s, > 0
/// @param mu_pa_s dynamic viscosity at the gaps, Pa s, > 0
/// @return the prediction; status::extrapolated outside the data's ranges of pressure, speed or
///         viscosity; the model's error when it failed; status::domain when the predicted flow or
///         torque is negative (far outside the model's range); the efficiency statuses.
/// @par Accuracy
/// As the fitted coefficients; the evaluation itself within a few ulp.
/// @par Source
/// Wilson's model as in H. E. Merritt, Hydraulic Control Systems, Wiley 1967; Schlösser 1961.
template <class T>
inline loss_prediction<T> loss_model_predict(const loss_model<T>& m, T dp_pa, T speed_rev_s, T mu_pa_s) {
  const T nan = scalar_traits<T>::nan();
  loss_prediction<T> p{nan, nan, nan, nan, nan, status::ok};
  if (is_error(m.st)) {
    p.st = m.st;
    return p;
  }
  if (!detail::all_finite(dp_pa, speed_rev_s, mu_pa_s)) {
    p.st = status::nonfinite;
    return p;
  }
  if (!(dp_pa > T(0)) || !(speed_rev_s > T(0)) || !(mu_pa_s > T(0))) {
    p.st = status::domain;
    return p;
  }
  const T d = m.displacement_m3_rev / (2 * detail::pi<T>());
  const T sign = m.kind == machine::pump ? T(1) : T(-1);
  const auto c = detail::loss_columns(d, m.rho_kg_m3, dp_pa, speed_rev_s, mu_pa_s);
  const T q = c.d * c.omega - sign * (m.c_s * c.flow_slip + m.c_st * c.flow_turb + m.q_c_m3_s +
                                      m.c_k * c.d * c.omega * dp_pa / m.bulk_modulus_pa);
  const T t = d * dp_pa + sign * (m.c_v * c.tq_visc + m.c_f * c.tq_coul + m.t_c_n_m + m.c_h * c.tq_hydro);
  if (!(q >= T(0)) || !(t >= T(0))) {
    p.st = status::domain;
    return p;
  }
  const auto e = machine_efficiency(m.kind, m.displacement_m3_rev, speed_rev_s, dp_pa, q, t);
  if (is_error(e.st)) {
    p.st = e.st;
    return p;
  }
  p.flow_m3_s = q;
  p.torque_n_m = t;
  p.eta_v = e.eta_v;
  p.eta_hm = e.eta_hm;
  p.eta_t = e.eta_t;
  const T slack = detail::constant<T>(1e-9L, "0.000000001");
  const bool outside = dp_pa < m.dp_min * (T(1) - slack) || dp_pa > m.dp_max * (T(1) + slack) ||
                       speed_rev_s < m.n_min * (T(1) - slack) || speed_rev_s > m.n_max * (T(1) + slack) ||
                       mu_pa_s < m.mu_min * (T(1) - slack) || mu_pa_s > m.mu_max * (T(1) + slack);
  p.st = worst(worst(m.st, e.st), outside ? status::extrapolated : status::ok);
  return p;
}

/// Overall-efficiency map of a fitted model over a grid of pressures and speeds at one viscosity.
///
/// \f[ \eta_t(\Delta p_i, n_j) \f] by loss_model_predict(), stored row by row:
/// eta_t[i * n_speed + j] for pressure i and speed j.
///
/// @param m a fitted model
/// @param mu_pa_s dynamic viscosity at the gaps, Pa s, > 0
/// @param dp_pa array of n_dp pressures, Pa
/// @param n_dp number of pressures
/// @param speed_rev_s array of n_speed speeds, rev/s
/// @param n_speed number of speeds
/// @param eta_t array of n_dp * n_speed, receives the overall efficiencies (NaN where a point fails)
/// @param point_status optional array of n_dp * n_speed (may be null), receives each point's status
/// @return status::ok; the first report seen (e.g. extrapolated); status::partial when some points
///         failed; status::misuse for null arrays.
/// @par Accuracy
/// As loss_model_predict().
/// @par Source
/// As loss_model_predict().
template <class T>
inline status loss_model_map(const loss_model<T>& m, T mu_pa_s, const T* dp_pa, std::size_t n_dp,
                             const T* speed_rev_s, std::size_t n_speed, T* eta_t, status* point_status) {
  if (dp_pa == nullptr || speed_rev_s == nullptr || eta_t == nullptr) return status::misuse;
  status summary = status::ok;
  bool failed = false;
  for (std::size_t i = 0; i < n_dp; ++i) {
    for (std::size_t j = 0; j < n_speed; ++j) {
      const auto p = loss_model_predict(m, dp_pa[i], speed_rev_s[j], mu_pa_s);
      eta_t[i * n_speed + j] = p.eta_t;
      if (point_status != nullptr) point_status[i * n_speed + j] = p.st;
      if (is_error(p.st)) failed = true;
      else if (summary == status::ok) summary = p.st;
    }
  }
  return failed ? status::partial : summary;
}

}  // namespace pumploss

#endif
