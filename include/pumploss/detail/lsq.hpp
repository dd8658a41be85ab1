// Least squares for the header core: straight lines by centred two-pass sums, general small
// problems by Householder QR with column scaling, non-negative least squares by Lawson-Hanson.
// No heap: callers pass the matrix storage (column-major, overwritten). Internal (detail).
#ifndef PUMPLOSS_DETAIL_LSQ_HPP
#define PUMPLOSS_DETAIL_LSQ_HPP

#include <cmath>
#include <cstddef>

#include "../scalar_traits.hpp"
#include "../status.hpp"

namespace pumploss::detail {

/// Largest number of columns the small dense solvers accept.
inline constexpr std::size_t lsq_max_cols = 8;

/// Straight line y = intercept + slope x with the standard uncertainties of both.
template <class T>
struct [[nodiscard]] line_fit_result {
  T slope, intercept;
  T u_slope, u_intercept;  // standard errors (residual-based)
  T cov;                   // covariance of slope and intercept
  T s_r;                   // residual standard deviation
  std::size_t n;
  status st;
  /// @return true when the status is exactly ok.
  bool ok() const noexcept { return st == pumploss::status::ok; }
  /// @return true when the results are usable (ok or a report such as regime).
  bool usable() const noexcept { return pumploss::is_usable(st); }
};

// Least-squares straight line through n points given by accessors x(i), y(i).
// Centred two-pass sums: Sxx = sum (x - xbar)^2, Sxy = sum (x - xbar)(y - ybar) -- the same
// arithmetic as Householder QR of [1, x] (the first reflector centres), without cancellation.
// u^2(slope) = s_r^2 / Sxx, u^2(intercept) = s_r^2 (1/n + xbar^2/Sxx), cov = -xbar s_r^2 / Sxx.
template <class T, class X, class Y>
inline line_fit_result<T> line_fit(std::size_t n, X&& x, Y&& y) {
  using std::sqrt;
  const T nan = scalar_traits<T>::nan();
  line_fit_result<T> r{nan, nan, nan, nan, nan, nan, n, status::insufficient_data};
  if (n < 3) return r;
  T xbar = T(0), ybar = T(0);
  for (std::size_t i = 0; i < n; ++i) {
    xbar += x(i);
    ybar += y(i);
  }
  xbar /= T(static_cast<double>(n));
  ybar /= T(static_cast<double>(n));
  T sxx = T(0), sxy = T(0);
  for (std::size_t i = 0; i < n; ++i) {
    const T dx = x(i) - xbar;
    sxx += dx * dx;
    sxy += dx * (y(i) - ybar);
  }
  if (!(sxx > T(0))) return r;
  const T slope = sxy / sxx;
  const T icpt = ybar - slope * xbar;
  T rss = T(0);
  for (std::size_t i = 0; i < n; ++i) {
    const T e = y(i) - (ybar + slope * (x(i) - xbar));
    rss += e * e;
  }
  const T s2 = rss / T(static_cast<double>(n - 2));
  r.slope = slope;
  r.intercept = icpt;
  r.u_slope = sqrt(s2 / sxx);
  r.u_intercept = sqrt(s2 * (T(1) / T(static_cast<double>(n)) + xbar * xbar / sxx));
  r.cov = -xbar * s2 / sxx;
  r.s_r = sqrt(s2);
  r.st = status::ok;
  return r;
}

/// Result of a small dense least-squares solve.
template <class T>
struct [[nodiscard]] lsq_result {
  T x[lsq_max_cols];                  // coefficients
  T se[lsq_max_cols];                 // standard errors sigma sqrt(diag((A^T A)^-1))
  T cov[lsq_max_cols][lsq_max_cols];  // covariance sigma^2 (A^T A)^-1
  T rss;                              // residual sum of squares
  T cond;                             // 1-norm condition number of R of the column-scaled matrix
  std::size_t m, p;
  status st;
  /// @return true when the status is exactly ok.
  bool ok() const noexcept { return st == pumploss::status::ok; }
  /// @return true when the results are usable (ok or a report such as regime).
  bool usable() const noexcept { return pumploss::is_usable(st); }
};

// Minimise ||A x - b||_2 for an m x p column-major A (leading dimension m), m > p, p <= 8.
// A and b are overwritten. Columns are scaled to unit 2-norm, then Householder QR (LAPACK
// sign convention, no pivoting); R^-1 is formed explicitly (p is small) for the covariance and
// kappa_1(R) = ||R||_1 ||R^-1||_1, which bounds kappa_2 of the scaled matrix within a factor p.
// Status: insufficient_data for m <= p, a zero column or an exactly singular R; ill_conditioned
// (report) when cond > cond_limit.
template <class T>
inline lsq_result<T> householder_lsq(T* a, std::size_t m, std::size_t p, T* b, T cond_limit) {
  using std::fabs;
  using std::sqrt;
  lsq_result<T> r{};
  const T nan = scalar_traits<T>::nan();
  for (std::size_t i = 0; i < lsq_max_cols; ++i) {
    r.x[i] = nan;
    r.se[i] = nan;
    for (std::size_t j = 0; j < lsq_max_cols; ++j) r.cov[i][j] = nan;
  }
  r.rss = nan;
  r.cond = nan;
  r.m = m;
  r.p = p;
  r.st = status::insufficient_data;
  if (p == 0 || p > lsq_max_cols || m <= p) return r;
  T scale[lsq_max_cols];
  for (std::size_t j = 0; j < p; ++j) {
    T* col = a + j * m;
    T big = T(0);
    for (std::size_t i = 0; i < m; ++i) big = fabs(col[i]) > big ? fabs(col[i]) : big;
    if (!(big > T(0))) return r;
    T ss = T(0);
    for (std::size_t i = 0; i < m; ++i) {
      const T v = col[i] / big;
      ss += v * v;
    }
    scale[j] = big * sqrt(ss);
    for (std::size_t i = 0; i < m; ++i) col[i] /= scale[j];
  }
  T rdiag[lsq_max_cols];
  for (std::size_t k = 0; k < p; ++k) {
    T* vk = a + k * m;
    T ss = T(0);
    for (std::size_t i = k; i < m; ++i) ss += vk[i] * vk[i];
    const T norm = sqrt(ss);
    if (!(norm > T(0))) return r;
    const T alpha = vk[k] > T(0) ? -norm : norm;
    vk[k] -= alpha;  // v = x - alpha e1; |v|^2 = 2 norm (norm + |x_k|)
    const T tau = T(1) / (norm * (norm + fabs(vk[k] + alpha)));
    for (std::size_t j = k + 1; j < p; ++j) {
      T* aj = a + j * m;
      T s = T(0);
      for (std::size_t i = k; i < m; ++i) s += vk[i] * aj[i];
      s *= tau;
      for (std::size_t i = k; i < m; ++i) aj[i] -= s * vk[i];
    }
    T s = T(0);
    for (std::size_t i = k; i < m; ++i) s += vk[i] * b[i];
    s *= tau;
    for (std::size_t i = k; i < m; ++i) b[i] -= s * vk[i];
    rdiag[k] = alpha;
  }
  // R (upper triangle): R[i][j] = a[j*m + i] for i < j, rdiag on the diagonal.
  auto rr = [&](std::size_t i, std::size_t j) -> T { return i == j ? rdiag[i] : a[j * m + i]; };
  // R^-1, column by column (back substitution on unit vectors).
  T rinv[lsq_max_cols][lsq_max_cols];
  for (std::size_t c = 0; c < p; ++c) {
    for (std::size_t ii = p; ii-- > 0;) {
      T s = (ii == c) ? T(1) : T(0);
      for (std::size_t j = ii + 1; j < p; ++j) s -= rr(ii, j) * rinv[j][c];
      rinv[ii][c] = s / rdiag[ii];
    }
  }
  T norm_r = T(0), norm_ri = T(0);
  for (std::size_t j = 0; j < p; ++j) {
    T cr = T(0), ci = T(0);
    for (std::size_t i = 0; i <= j; ++i) {
      cr += fabs(rr(i, j));
      ci += fabs(rinv[i][j]);
    }
    norm_r = cr > norm_r ? cr : norm_r;
    norm_ri = ci > norm_ri ? ci : norm_ri;
  }
  const T cond = norm_r * norm_ri;
  // Numerically singular (kappa near 1/eps): the coefficients would be noise.
  if (!finite(cond) || cond * scalar_traits<T>::epsilon() > T(1) / T(64)) return r;
  // Coefficients z = R^-1 (Q^T b)[0:p], unscaled.
  for (std::size_t i = 0; i < p; ++i) {
    T s = T(0);
    for (std::size_t j = i; j < p; ++j) s += rinv[i][j] * b[j];
    r.x[i] = s / scale[i];
  }
  T rss = T(0);
  for (std::size_t i = p; i < m; ++i) rss += b[i] * b[i];
  const T s2 = rss / T(static_cast<double>(m - p));
  for (std::size_t i = 0; i < p; ++i) {
    for (std::size_t j = 0; j < p; ++j) {
      T s = T(0);
      for (std::size_t k = (i > j ? i : j); k < p; ++k) s += rinv[i][k] * rinv[j][k];
      r.cov[i][j] = s2 * s / (scale[i] * scale[j]);
    }
    r.se[i] = sqrt(r.cov[i][i]);
  }
  r.rss = rss;
  r.cond = cond;
  r.st = cond > cond_limit ? status::ill_conditioned : status::ok;
  return r;
}

/// Result of a non-negative least-squares solve.
template <class T>
struct [[nodiscard]] nnls_result {
  T x[lsq_max_cols];
  bool active[lsq_max_cols];  // true: x_j > 0 (passive set of Lawson-Hanson), false: clamped at 0
  T rss;
  int iterations;
  status st;
  /// @return true when the status is exactly ok.
  bool ok() const noexcept { return st == pumploss::status::ok; }
  /// @return true when the results are usable (ok or a report such as regime).
  bool usable() const noexcept { return pumploss::is_usable(st); }
};

// Non-negative least squares min ||A x - b|| subject to x >= 0 (Lawson & Hanson, Solving Least
// Squares Problems, 1974, ch. 23, algorithm NNLS), for an m x p column-major A that is NOT
// modified; `work` holds m * (p + 1) values. Columns are scaled to unit norm first (positive
// scaling keeps the constraint). The iteration count is capped at 3p outer and 3p inner steps:
// no_convergence beyond.
template <class T>
inline nnls_result<T> nnls(const T* a, std::size_t m, std::size_t p, const T* b, T* work) {
  using std::fabs;
  using std::sqrt;
  nnls_result<T> r{};
  const T nan = scalar_traits<T>::nan();
  for (std::size_t j = 0; j < lsq_max_cols; ++j) {
    r.x[j] = nan;
    r.active[j] = false;
  }
  r.rss = nan;
  r.iterations = 0;
  r.st = status::insufficient_data;
  if (p == 0 || p > lsq_max_cols || m <= p) return r;
  T scale[lsq_max_cols];
  for (std::size_t j = 0; j < p; ++j) {
    T ss = T(0);
    for (std::size_t i = 0; i < m; ++i) ss += a[j * m + i] * a[j * m + i];
    scale[j] = sqrt(ss);
    if (!(scale[j] > T(0))) return r;
  }
  auto col = [&](std::size_t j, std::size_t i) -> T { return a[j * m + i] / scale[j]; };
  T bnorm = T(0);
  for (std::size_t i = 0; i < m; ++i) bnorm += b[i] * b[i];
  bnorm = sqrt(bnorm);
  const T tol = T(10) * scalar_traits<T>::epsilon() * T(static_cast<double>(m)) * (bnorm > T(0) ? bnorm : T(1));
  const T xtol = T(10) * scalar_traits<T>::epsilon() * (bnorm > T(0) ? bnorm : T(1));
  T x[lsq_max_cols], z[lsq_max_cols], w[lsq_max_cols];
  bool passive[lsq_max_cols];
  for (std::size_t j = 0; j < p; ++j) {
    x[j] = T(0);
    passive[j] = false;
  }
  auto gradient = [&]() {
    for (std::size_t j = 0; j < p; ++j) w[j] = T(0);
    for (std::size_t i = 0; i < m; ++i) {
      T res = b[i];
      for (std::size_t j = 0; j < p; ++j) res -= col(j, i) * x[j];
      for (std::size_t j = 0; j < p; ++j) w[j] += col(j, i) * res;
    }
  };
  // Unconstrained LS on the passive columns; z = 0 elsewhere. Returns false when singular.
  auto solve_passive = [&]() -> bool {
    std::size_t idx[lsq_max_cols], k = 0;
    for (std::size_t j = 0; j < p; ++j)
      if (passive[j]) idx[k++] = j;
    for (std::size_t j = 0; j < p; ++j) z[j] = T(0);
    if (k == 0) return true;
    if (m <= k) return false;
    for (std::size_t c = 0; c < k; ++c)
      for (std::size_t i = 0; i < m; ++i) work[c * m + i] = col(idx[c], i);
    T* rhs = work + k * m;
    for (std::size_t i = 0; i < m; ++i) rhs[i] = b[i];
    const auto s = householder_lsq(work, m, k, rhs, scalar_traits<T>::max());
    if (is_error(s.st)) return false;
    // householder_lsq rescales its own columns; s.x are coefficients of the unit-norm columns.
    for (std::size_t c = 0; c < k; ++c) z[idx[c]] = s.x[c];
    return true;
  };
  const int cap = static_cast<int>(3 * p);
  int outer = 0, inner = 0;
  r.st = status::ok;
  for (;;) {
    gradient();
    std::size_t jmax = p;
    T wmax = tol;
    for (std::size_t j = 0; j < p; ++j)
      if (!passive[j] && w[j] > wmax) {
        wmax = w[j];
        jmax = j;
      }
    if (jmax == p) break;
    if (++outer > cap) {
      r.st = status::no_convergence;
      break;
    }
    passive[jmax] = true;
    if (!solve_passive()) {
      r.st = status::insufficient_data;
      break;
    }
    for (;;) {
      bool feasible = true;
      for (std::size_t j = 0; j < p; ++j)
        if (passive[j] && !(z[j] > T(0))) feasible = false;
      if (feasible) break;
      if (++inner > cap) {
        r.st = status::no_convergence;
        break;
      }
      T alpha = T(1);
      for (std::size_t j = 0; j < p; ++j)
        if (passive[j] && !(z[j] > T(0))) {
          const T t = x[j] / (x[j] - z[j]);
          alpha = t < alpha ? t : alpha;
        }
      for (std::size_t j = 0; j < p; ++j) {
        x[j] += alpha * (z[j] - x[j]);
        if (passive[j] && !(x[j] > xtol)) {
          passive[j] = false;
          x[j] = T(0);
        }
      }
      if (!solve_passive()) {
        r.st = status::insufficient_data;
        break;
      }
    }
    if (r.st != status::ok) break;
    for (std::size_t j = 0; j < p; ++j) x[j] = z[j];
  }
  r.iterations = outer + inner;
  if (is_error(r.st)) return r;
  T rss = T(0);
  for (std::size_t i = 0; i < m; ++i) {
    T res = b[i];
    for (std::size_t j = 0; j < p; ++j) res -= col(j, i) * x[j];
    rss += res * res;
  }
  for (std::size_t j = 0; j < p; ++j) {
    r.x[j] = x[j] / scale[j];
    r.active[j] = passive[j];
  }
  r.rss = rss;
  return r;
}

}  // namespace pumploss::detail

#endif
