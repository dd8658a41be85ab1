/// @file health_monitor.hpp
/// @brief Streaming health monitor for machine controllers: fed one reading at a time, constant
/// memory, no heap allocation, state that survives restarts.
///
/// Created from the pump's short description and the bands (health.hpp). Each reading is
/// checked, normalised and scored as assess_health() does; the monitor adds what a controller
/// needs: the baseline learned from the first readings when none is given, a verdict with
/// hysteresis and a debounce count so that it does not flicker, and online step detection by
/// the tabular CUSUM (health_cusum): a level shift is reported health_cusum::confirm - 1 readings
/// after its signal, abrupt only when it is a jump beyond the local quadratic trend (accelerating
/// wear is not a step). A "sound" verdict is not a clearance to run; never block, cap or valve a
/// case drain line.
#ifndef PUMPLOSS_HEALTH_MONITOR_HPP
#define PUMPLOSS_HEALTH_MONITOR_HPP

#include <cstddef>

#include "health.hpp"

namespace pumploss {

/// Settings of a health_monitor.
template <class T>
struct health_monitor_settings {
  std::size_t learn_count = 12;    ///< accepted readings that set the CUSUM target and noise (and the baseline when none is given), >= 2 (with 8, 1 of 300 series of accelerating wear was called a step)
  std::size_t debounce_count = 3;  ///< consecutive readings a new level must hold before the verdict changes, >= 1
  T hysteresis = detail::constant<T>(0.05L, "0.05");  ///< to step down, the figures must lie below the band edges x (1 - hysteresis), 0..0.5
  T cusum_k = detail::constant<T>(0.5L, "0.5");       ///< CUSUM reference value, in sigma
  T cusum_h = T(5);                                   ///< CUSUM decision interval, in sigma
  T sigma_m3_s = scalar_traits<T>::nan();             ///< noise of the normalised drain flow, m^3/s (NaN: learned)
  T sigma_floor = detail::constant<T>(0.01L, "0.01"); ///< smallest learned noise, relative to the learned level
};

/// Events of one feed (bit flags).
enum health_monitor_event : unsigned {
  monitor_learning = 1u << 0,          ///< still learning the baseline / noise
  monitor_baseline_learned = 1u << 1,  ///< this reading completed the learning
  monitor_refused = 1u << 2,           ///< the reading was refused (see assessment.refused); nothing else changed
  monitor_step_up = 1u << 3,           ///< an abrupt step up was detected (step holds it)
  monitor_step_down = 1u << 4,         ///< an abrupt step down was detected (step holds it)
  monitor_shift = 1u << 5,             ///< a gradual level shift was detected (step holds it)
  monitor_level_changed = 1u << 6,     ///< the confirmed verdict changed with this reading
  monitor_pending = 1u << 7            ///< a different level is pending (debounce running)
};

/// What one feed gives back.
template <class T>
struct health_monitor_output {
  health_level level;                ///< the confirmed verdict (hysteresis and debounce applied)
  health_level raw_level;            ///< the verdict of this reading alone (as assess_health())
  unsigned events;                   ///< health_monitor_event bits
  health_assessment<T> assessment;   ///< the reading's assessment
  health_step<T> step;               ///< the shift, when a step or shift event is set (indices count accepted readings)
  T step_time;                       ///< time of the step's first reading (caller's time unit; NaN without a step)
};

namespace detail {
template <class T>
inline health_level health_level_of(const health_bands<T>& b, T fraction, T growth, bool hot) {
  unsigned dummy = 0u;
  health_level l = level_of_fraction(b, fraction, dummy);
  if (finite(growth)) {
    if (growth > b.growth_large) l = max_level(l, health_level::worn);
    else if (growth > b.growth_moderate) l = max_level(l, health_level::acceptable);
  }
  if (hot) l = max_level(l, health_level::elevated);
  return l;
}
}  // namespace detail

/// Streaming health monitor. A value type of fixed size: no heap, constant memory.
///
/// feed() mutates the monitor (one writer); the const members may be read concurrently.
/// @par Source
/// Normalisation and verdict: assess_health(); steps: tabular CUSUM (Page 1954; Montgomery,
/// Introduction to Statistical Quality Control, 6th ed., 2009, 9.1); noise learned as
/// \f$ \overline{MR}/d_2 \f$ with \f$ d_2 = 1.128 \f$ (Montgomery 6th ed., 6.4, individuals chart).
template <class T>
class health_monitor {
 public:
  /// Number of T values save() writes (the state buffer size; version 2).
  static constexpr std::size_t state_count = 96;
  /// Version of the saved state layout.
  static constexpr int state_version = 2;

  /// The counts of the settings: learn_count 2 to 100000, debounce_count 1 to 100000.
  /// @param settings the monitor's settings
  /// @return ok or status::domain
  static status check_counts(const health_monitor_settings<T>& settings) noexcept {
    if (settings.learn_count < 2 || settings.learn_count > 100000 || settings.debounce_count < 1 ||
        settings.debounce_count > 100000)
      return status::domain;
    return status::ok;
  }

  /// Set up a monitor.
  /// @param ref the pump description (baseline NaN: learned from the first learn_count readings)
  /// @param bands bands and limits
  /// @param settings the monitor's settings
  /// @return ok, or the error of a bad description, band or setting (the monitor is unchanged)
  status init(const health_reference<T>& ref, const health_bands<T>& bands, const health_monitor_settings<T>& settings) {
    status s = check_counts(settings);  // the counts first, as the C API checks them before a handle's state
    if (is_error(s)) return s;
    s = detail::health_reference_check(ref);
    if (is_error(s)) return s;
    s = detail::health_bands_check(bands);
    if (is_error(s)) return s;
    if (!detail::all_finite(settings.hysteresis, settings.cusum_k, settings.cusum_h, settings.sigma_floor))
      return status::nonfinite;
    if (!(settings.hysteresis >= T(0)) || !(settings.hysteresis <= T(0.5)) || !(settings.cusum_k >= T(0)) ||
        !(settings.cusum_h > T(0)) || !(settings.sigma_floor >= T(0)) ||
        (detail::finite(settings.sigma_m3_s) && !(settings.sigma_m3_s > T(0))) ||
        std::isinf(static_cast<double>(settings.sigma_m3_s)))
      return status::domain;
    const auto mu = oil_dynamic_viscosity(ref.fluid, ref.reference_t_k, T(0));
    if (is_error(mu.st)) return mu.st;
    ref_ = ref;
    bands_ = bands;
    settings_ = settings;
    mu_ref_ = mu.value;
    given_baseline_ = ref.baseline_m3_s;
    clear();
    return status::ok;
  }

  /// Forget all readings (keep the description): as after init().
  void clear() {
    ref_.baseline_m3_s = given_baseline_;
    accepted_ = refused_ = steps_ = 0;
    learn_sum_ = learn_mr_sum_ = learn_prev_ = T(0);
    sigma_ = scalar_traits<T>::nan();
    level_ = pending_ = health_level::sound;
    pending_n_ = 0;
    cusum_.reset(T(0), T(1), settings_.cusum_k, settings_.cusum_h);
    cusum_start_ = 0;
    last_step_time_ = scalar_traits<T>::nan();
    for (T& t : times_) t = scalar_traits<T>::nan();
  }

  /// Feed one reading (mutates the monitor). No allocation.
  /// @param time the reading's time in the caller's unit (days, operating hours), for step dates
  /// @param r the reading
  /// @return the verdict and events; assessment.st is an error for a bad reading (the state is
  ///         then unchanged except the refused count)
  health_monitor_output<T> feed(T time, const health_reading<T>& r) {
    health_monitor_output<T> out{level_, level_, 0u, {}, {}, scalar_traits<T>::nan()};
    out.assessment = assess_health(ref_, bands_, r, mu_ref_);
    if (is_error(out.assessment.st)) {
      ++refused_;
      out.events = monitor_refused | (learning() ? monitor_learning : 0u);
      return out;
    }
    const T q = out.assessment.drain_at_reference_m3_s;
    times_[accepted_ % health_cusum<T>::history] = time;
    out.raw_level = out.assessment.level;
    // the verdict: hysteresis on the way down, debounce both ways
    if (accepted_ == 0) {
      level_ = out.raw_level;
    } else {
      health_level cand = out.raw_level;
      if (static_cast<int>(cand) < static_cast<int>(level_)) {
        health_bands<T> shrunk = bands_;
        const T f = T(1) - settings_.hysteresis;
        shrunk.sound_max *= f;
        shrunk.acceptable_max *= f;
        shrunk.worn_min *= f;
        shrunk.growth_moderate *= f;
        shrunk.growth_large *= f;
        cand = detail::health_level_of(shrunk, out.assessment.fraction_at_reference, out.assessment.growth,
                                       (out.assessment.reasons & reason_drain_hot) != 0u);
        if (static_cast<int>(cand) > static_cast<int>(level_)) cand = level_;
      }
      if (cand == level_) {
        pending_n_ = 0;
      } else {
        if (pending_n_ > 0 && cand == pending_) ++pending_n_;
        else {
          pending_ = cand;
          pending_n_ = 1;
        }
        if (pending_n_ >= settings_.debounce_count) {
          level_ = cand;
          pending_n_ = 0;
          out.events |= monitor_level_changed;
        } else {
          out.events |= monitor_pending;
        }
      }
    }
    ++accepted_;
    // learning, then online steps
    if (accepted_ <= settings_.learn_count) {
      learn_sum_ += q;
      if (accepted_ > 1) learn_mr_sum_ += (q > learn_prev_ ? q - learn_prev_ : learn_prev_ - q);
      learn_prev_ = q;
      if (accepted_ == settings_.learn_count) {
        const T n = T(static_cast<double>(accepted_));
        const T mean = learn_sum_ / n;
        T s = settings_.sigma_m3_s;
        if (!detail::finite(s)) {
          s = learn_mr_sum_ / (n - T(1)) / detail::constant<T>(1.128L, "1.128");
          if (s < settings_.sigma_floor * mean) s = settings_.sigma_floor * mean;
        }
        sigma_ = s;
        if (!detail::finite(given_baseline_)) ref_.baseline_m3_s = mean;
        cusum_.reset(mean, s, settings_.cusum_k, settings_.cusum_h);
        cusum_start_ = accepted_;
        out.events |= monitor_baseline_learned;
      } else {
        out.events |= monitor_learning;
      }
    } else {
      health_step<T> st{};
      if (cusum_.update(q, st)) {
        st.index += cusum_start_;
        st.signal_index += cusum_start_;
        out.step = st;
        out.step_time = times_[st.index % health_cusum<T>::history];
        if (accepted_ - st.index > health_cusum<T>::history) out.step_time = scalar_traits<T>::nan();
        out.events |= st.abrupt ? (st.direction > 0 ? monitor_step_up : monitor_step_down) : monitor_shift;
        if (st.abrupt) {
          ++steps_;
          last_step_time_ = out.step_time;
        }
      }
    }
    out.level = level_;
    return out;
  }

  /// The confirmed verdict.
  /// @return the level
  health_level level() const noexcept { return level_; }
  /// Whether the monitor is still learning.
  /// @return true until learn_count readings were accepted
  bool learning() const noexcept { return accepted_ < settings_.learn_count; }
  /// The baseline in use (given or learned), m^3/s; NaN while learning without a given one.
  /// @return the baseline
  T baseline_m3_s() const noexcept { return ref_.baseline_m3_s; }
  /// The noise sigma of the normalised drain, m^3/s; NaN while learning.
  /// @return sigma
  T sigma_m3_s() const noexcept { return sigma_; }
  /// The CUSUM's current level (target), m^3/s.
  /// @return the level
  T level_m3_s() const noexcept { return cusum_.target; }
  /// Readings accepted so far.
  /// @return the count
  std::size_t accepted() const noexcept { return accepted_; }
  /// Readings refused so far.
  /// @return the count
  std::size_t refused() const noexcept { return refused_; }
  /// Abrupt steps found so far.
  /// @return the count
  std::size_t steps() const noexcept { return steps_; }
  /// Time of the last abrupt step (NaN: none).
  /// @return the time
  T last_step_time() const noexcept { return last_step_time_; }

  /// Save the dynamic state to a caller buffer of state_count values (version 1 layout; to be
  /// restored into a monitor made from the same description, bands and settings).
  /// @param buf the buffer
  /// @param capacity its length, >= state_count
  /// @return ok; buffer_too_small; misuse for a null buffer
  status save(T* buf, std::size_t capacity) const {
    if (buf == nullptr) return status::misuse;
    if (capacity < state_count) return status::buffer_too_small;
    std::size_t i = 0;
    auto put = [&](T v) { buf[i++] = v; };
    auto putn = [&](std::size_t v) { put(T(static_cast<double>(v))); };
    put(T(magic));
    put(T(state_version));
    put(fingerprint());
    putn(accepted_);
    putn(refused_);
    putn(steps_);
    put(learn_sum_);
    put(learn_mr_sum_);
    put(learn_prev_);
    put(sigma_);
    put(ref_.baseline_m3_s);
    put(T(static_cast<int>(level_)));
    put(T(static_cast<int>(pending_)));
    putn(pending_n_);
    put(cusum_.target);
    put(cusum_.sigma);
    put(cusum_.c_hi);
    put(cusum_.c_lo);
    putn(cusum_.n_hi);
    putn(cusum_.n_lo);
    putn(cusum_.count);
    putn(cusum_start_);
    put(last_step_time_);
    putn(cusum_.regime);
    put(T(cusum_.held_dir));
    for (std::size_t j = 0; j < health_cusum<T>::history; ++j) put(cusum_.hist[j]);
    for (std::size_t j = 0; j < health_cusum<T>::history; ++j) put(times_[j]);
    putn(cusum_.examined);
    putn(cusum_.held_start);
    putn(cusum_.held_signal);
    put(cusum_.held_after);
    while (i < state_count) put(T(0));
    return status::ok;
  }

  /// Restore a state written by save(). The monitor is unchanged on an error.
  /// @param buf the saved values
  /// @param count their number, >= state_count
  /// @return ok; out_of_validity for another version, another description or a damaged buffer;
  ///         buffer_too_small; misuse
  status restore(const T* buf, std::size_t count) {
    if (buf == nullptr) return status::misuse;
    if (count < state_count) return status::buffer_too_small;
    if (!(buf[0] == T(magic)) || !(buf[1] == T(state_version)) || !(buf[2] == fingerprint()))
      return status::out_of_validity;
    auto idx = [&](std::size_t j, std::size_t& v) {
      const T x = buf[j];
      if (!detail::finite(x) || x < T(0) || x > T(1e15) || !(x == T(static_cast<double>(static_cast<std::size_t>(static_cast<double>(x))))))
        return false;
      v = static_cast<std::size_t>(static_cast<double>(x));
      return true;
    };
    auto lvl = [&](std::size_t j, health_level& l) {
      const T x = buf[j];
      for (int k = 0; k <= 3; ++k)
        if (x == T(k)) {
          l = static_cast<health_level>(k);
          return true;
        }
      return false;
    };
    health_monitor m = *this;
    if (!idx(3, m.accepted_) || !idx(4, m.refused_) || !idx(5, m.steps_) || !lvl(11, m.level_) ||
        !lvl(12, m.pending_) || !idx(13, m.pending_n_) || !idx(18, m.cusum_.n_hi) || !idx(19, m.cusum_.n_lo) ||
        !idx(20, m.cusum_.count) || !idx(21, m.cusum_start_))
      return status::out_of_validity;
    m.learn_sum_ = buf[6];
    m.learn_mr_sum_ = buf[7];
    m.learn_prev_ = buf[8];
    m.sigma_ = buf[9];
    m.ref_.baseline_m3_s = buf[10];
    m.cusum_.target = buf[14];
    m.cusum_.sigma = buf[15];
    m.cusum_.c_hi = buf[16];
    m.cusum_.c_lo = buf[17];
    m.last_step_time_ = buf[22];
    if (!idx(23, m.cusum_.regime) || !(buf[24] == T(-1) || buf[24] == T(0) || buf[24] == T(1)))
      return status::out_of_validity;
    m.cusum_.held_dir = buf[24] > T(0) ? 1 : (buf[24] < T(0) ? -1 : 0);
    std::size_t i = 25;
    for (std::size_t j = 0; j < health_cusum<T>::history; ++j) m.cusum_.hist[j] = buf[i++];
    for (std::size_t j = 0; j < health_cusum<T>::history; ++j) m.times_[j] = buf[i++];
    if (!idx(i, m.cusum_.examined) || !idx(i + 1, m.cusum_.held_start) || !idx(i + 2, m.cusum_.held_signal))
      return status::out_of_validity;
    m.cusum_.held_after = buf[i + 3];
    if (!detail::all_finite(m.learn_sum_, m.learn_mr_sum_, m.learn_prev_, m.cusum_.target, m.cusum_.sigma,
                            m.cusum_.c_hi, m.cusum_.c_lo, m.cusum_.held_after))
      return status::out_of_validity;
    // values the monitor itself never holds (found by tests/fuzz/fuzz_health_monitor): a noise
    // or baseline other than "not learned yet" (NaN) while learning and finite, >= 0 after; a
    // given baseline replaced; negative noise or cumulative sums; an infinite time or history
    const bool learning_now = m.accepted_ < settings_.learn_count;
    auto is_nan = [](const T& x) { return !(x == x); };
    auto is_inf = [&](const T& x) { return !detail::finite(x) && !is_nan(x); };
    auto learned = [&](const T& x) { return learning_now ? is_nan(x) : (detail::finite(x) && x >= T(0)); };
    const bool baseline_ok = detail::finite(given_baseline_) ? m.ref_.baseline_m3_s == given_baseline_
                                                             : learned(m.ref_.baseline_m3_s);
    if (!learned(m.sigma_) || !baseline_ok || m.cusum_.sigma < T(0) || m.cusum_.c_hi < T(0) || m.cusum_.c_lo < T(0) ||
        is_inf(m.last_step_time_))
      return status::out_of_validity;
    for (std::size_t j = 0; j < health_cusum<T>::history; ++j)
      if (!detail::finite(m.cusum_.hist[j]) || is_inf(m.times_[j])) return status::out_of_validity;
    // counts that cannot belong together mean a damaged buffer
    if (m.cusum_.n_hi > m.cusum_.count || m.cusum_.n_lo > m.cusum_.count || m.cusum_.count > m.accepted_ ||
        m.cusum_start_ > m.accepted_ || m.pending_n_ >= settings_.debounce_count || m.steps_ > m.accepted_ ||
        m.cusum_.regime > m.cusum_.count || m.cusum_.examined > m.cusum_.count || m.cusum_.held_start > m.cusum_.count ||
        m.cusum_.held_signal > m.cusum_.count)
      return status::out_of_validity;
    *this = m;
    return status::ok;
  }

 private:
  static constexpr double magic = 1347176525.0;  // "PLHM"
  T fingerprint() const {
    // a checksum of the description, bands and settings a state belongs to (not of the learned parts)
    T f = ref_.max_displacement_m3_rev * T(1e6) + ref_.reference_dp_pa * T(1e-7) + ref_.reference_t_k * T(1e-2) +
          ref_.reference_speed_rev_s * T(1e-1) + ref_.constant_m3_s * T(6e4) + ref_.orifice_share +
          bands_.sound_max + bands_.acceptable_max * T(2) + bands_.worn_min * T(3) +
          T(static_cast<double>(settings_.learn_count)) + T(static_cast<double>(settings_.debounce_count)) * T(1e-3) +
          settings_.hysteresis;
    if (detail::finite(given_baseline_)) f += given_baseline_ * T(6e4);
    return f;
  }
  health_reference<T> ref_{};
  health_bands<T> bands_{};
  health_monitor_settings<T> settings_{};
  T mu_ref_ = T(0);
  T given_baseline_ = scalar_traits<T>::nan();
  std::size_t accepted_ = 0, refused_ = 0, steps_ = 0;
  T learn_sum_ = T(0), learn_mr_sum_ = T(0), learn_prev_ = T(0);
  T sigma_ = scalar_traits<T>::nan();
  health_level level_ = health_level::sound, pending_ = health_level::sound;
  std::size_t pending_n_ = 0;
  health_cusum<T> cusum_{};
  std::size_t cusum_start_ = 0;
  T last_step_time_ = scalar_traits<T>::nan();
  T times_[health_cusum<T>::history] = {};
};

}  // namespace pumploss

#endif
