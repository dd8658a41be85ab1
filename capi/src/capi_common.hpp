// Shared machinery of the C wrappers: floating-point environment guard, output checks,
// NaN-on-error, and the one place where C++ exceptions are caught.
#ifndef PUMPLOSS_CAPI_COMMON_HPP
#define PUMPLOSS_CAPI_COMMON_HPP

#include <cfenv>
#include <cmath>
#include <limits>
#include <new>

#if defined(__SSE2__) || defined(_M_X64) || (defined(_M_IX86_FP) && _M_IX86_FP >= 2)
#include <xmmintrin.h>
#define PUMPLOSS_HAVE_MXCSR 1
#endif

#include "pumploss.h"
#include "pumploss/status.hpp"

namespace pumploss::capi {

inline constexpr double kNaN = std::numeric_limits<double>::quiet_NaN();

/// Masks floating-point traps and clears the flags for the duration of a call, then restores
/// the caller's environment (flags included), so hosts that poll or trap FP exceptions (some
/// spreadsheet and Fortran runtimes) see nothing of our intermediate over/underflows. On SSE
/// targets only MXCSR is saved (a few cycles); elsewhere the whole fenv.
class fp_guard {
 public:
#ifdef PUMPLOSS_HAVE_MXCSR
  fp_guard() noexcept : saved_(_mm_getcsr()) { _mm_setcsr((saved_ | 0x1F80u) & ~0x3Fu); }
  ~fp_guard() { _mm_setcsr(saved_); }

 private:
  unsigned int saved_;
#else
  fp_guard() noexcept { std::feholdexcept(&saved_); }
  ~fp_guard() { std::fesetenv(&saved_); }

 private:
  std::fenv_t saved_;
#endif
 public:
  fp_guard(const fp_guard&) = delete;
  fp_guard& operator=(const fp_guard&) = delete;
};

/// Run a wrapper body: checks the output pointers, guards the FP environment, maps C++
/// exceptions to codes, and sets every output to NaN on an error status.
/// `Body` returns pumploss::status.
template <std::size_t N, class Body>
inline int call(double* const (&outs)[N], Body&& body) noexcept {
  bool null_out = false;
  for (double* p : outs) {
    if (p == nullptr) null_out = true; else *p = kNaN;
  }
  if (null_out) return PUMPLOSS_EMISUSE;
  status st;
  {
    fp_guard guard;
    try {
      st = body();
    } catch (const std::bad_alloc&) {
      st = status::no_memory;
    } catch (...) {
      st = status::internal;
    }
  }
  // A usable status never comes with a NaN or infinite output: such a value means an
  // intermediate overflowed or underflowed (e.g. 0 * inf), so report it as not representable.
  if (!is_error(st)) {
    for (double* p : outs) {
      if (!std::isfinite(*p)) st = status::overflow;
    }
  }
  if (is_error(st)) {
    for (double* p : outs) *p = kNaN;
  }
  return static_cast<int>(st);
}

namespace detail {
/// Element i of a batch by the full path: its status, NaN outputs on an error, a usable status
/// with a non-finite output turned into an overflow (as call() does). Returns the code.
template <std::size_t N, class Elem>
inline int batch_element(std::size_t i, double* const (&outs)[N], int* status_out, Elem& elem) {
  status st = elem(i);
  if (!is_error(st)) {
    for (double* p : outs) {
      if (!std::isfinite(p[i])) st = status::overflow;
    }
  }
  if (is_error(st)) {
    for (double* p : outs) p[i] = kNaN;
  }
  const int code = static_cast<int>(st);
  status_out[i] = code;
  return code;
}

/// Null and n checks shared by the batch runners: true when the call must stop with EMISUSE
/// (outputs NaN-filled and statuses EMISUSE where the pointers allow).
template <std::size_t N>
inline bool batch_refused(std::size_t n, double* const (&outs)[N], int* status_out, bool inputs_ok) noexcept {
  bool null_out = status_out == nullptr;
  for (double* p : outs) null_out = null_out || p == nullptr;
  if (!null_out && inputs_ok) return false;
  for (double* p : outs) {
    if (p != nullptr) for (std::size_t i = 0; i < n; ++i) p[i] = kNaN;
  }
  if (status_out != nullptr) for (std::size_t i = 0; i < n; ++i) status_out[i] = PUMPLOSS_EMISUSE;
  return true;
}

/// Summary of a batch: EPARTIAL when any element failed, else the first report code, else OK.
inline void batch_summary(int code, int& summary, bool& failed) noexcept {
  if (code > 0 && code < 100) {
    failed = true;
  } else if (code != PUMPLOSS_OK && summary == PUMPLOSS_OK) {
    summary = code;
  }
}
}  // namespace detail

/// Run a batch body element by element: null arrays give EMISUSE (non-null outputs NaN-filled
/// when n allows), each element's status goes to status_out[i] (NaN outputs on its error; a
/// usable status with a non-finite output becomes EOVERFLOW), and the summary is OK, the first
/// report code seen, or PUMPLOSS_EPARTIAL when any element failed.
/// `Elem(i)` returns the element's status and writes its outputs.
template <std::size_t N, class Elem>
inline int call_batch(std::size_t n, double* const (&outs)[N], int* status_out, bool inputs_ok,
                      Elem&& elem) noexcept {
  if (detail::batch_refused(n, outs, status_out, inputs_ok)) return PUMPLOSS_EMISUSE;
  fp_guard guard;
  int summary = PUMPLOSS_OK;
  bool failed = false;
  try {
    for (std::size_t i = 0; i < n; ++i) detail::batch_summary(detail::batch_element(i, outs, status_out, elem), summary, failed);
  } catch (...) {  // keep the promise: on an error every output is NaN
    for (double* p : outs) for (std::size_t i = 0; i < n; ++i) p[i] = kNaN;
    for (std::size_t i = 0; i < n; ++i) status_out[i] = PUMPLOSS_EINTERNAL;
    return PUMPLOSS_EINTERNAL;
  }
  return failed ? PUMPLOSS_EPARTIAL : summary;
}

/// Elements per block of call_batch_fast(): the block's statuses stay in L1 between the two passes.
inline constexpr std::size_t kBatchBlock = 1024;

/// call_batch() with a fast path. `Fast(i0, i1, flag)` computes the elements [i0, i1) in a
/// branch-free (vectorisable) loop, sets flag[i] to 0 when it can prove that the full path
/// would return PUMPLOSS_OK with exactly these outputs (same expressions, finite), else to any
/// other value, and returns non-zero when any flag is set; it must not throw. Flagged elements are then redone by `Elem(i)` as in
/// call_batch(), so statuses, NaN outputs and the summary are the same as call_batch()'s, bit
/// for bit. Only the cheap proof is per element; the FP guard and the try block are per call.
template <std::size_t N, class Fast, class Elem>
inline int call_batch_fast(std::size_t n, double* const (&outs)[N], int* status_out, bool inputs_ok, Fast&& fast,
                           Elem&& elem) noexcept {
  if (detail::batch_refused(n, outs, status_out, inputs_ok)) return PUMPLOSS_EMISUSE;
  fp_guard guard;
  int summary = PUMPLOSS_OK;
  bool failed = false;
  try {
    for (std::size_t i0 = 0; i0 < n; i0 += kBatchBlock) {
      const std::size_t i1 = n - i0 < kBatchBlock ? n : i0 + kBatchBlock;
      if (fast(i0, i1, status_out) == 0) continue;
      for (std::size_t i = i0; i < i1; ++i) {
        if (status_out[i] != 0) detail::batch_summary(detail::batch_element(i, outs, status_out, elem), summary, failed);
      }
    }
  } catch (...) {
    for (double* p : outs) for (std::size_t i = 0; i < n; ++i) p[i] = kNaN;
    for (std::size_t i = 0; i < n; ++i) status_out[i] = PUMPLOSS_EINTERNAL;
    return PUMPLOSS_EINTERNAL;
  }
  return failed ? PUMPLOSS_EPARTIAL : summary;
}

/// The wrapper of a function with one result<T>: `make()` returns it, its value goes to *out
/// (through call(): null check, FP guard, NaN on an error status).
template <class Make>
inline int call_value(double* out, Make&& make) noexcept {
  return call({out}, [&] {
    const auto r = make();
    *out = r.value;
    return r.st;
  });
}

}  // namespace pumploss::capi

#endif
