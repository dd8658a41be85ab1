// A series of field readings judged in one workflow (health_series.hpp).
#include "pumploss/health_series.hpp"

#include <cmath>
#include <limits>
#include <utility>

namespace pumploss {

const char* health_event_name(health_event e) noexcept {
  switch (e) {
    case health_event::none: return "";
    case health_event::oil_change: return "oil change";
    case health_event::overhaul: return "overhaul";
    case health_event::meter_change: return "meter change";
  }
  return "";
}

namespace {
constexpr unsigned flag_bits = reason_low_pressure_reading | reason_speed_off_rated | reason_drain_colder |
                               reason_state_differs;
}

health_series::health_series(const health_reference<double>& ref, const health_bands<double>& bands, sink on_row)
    : ref_(ref), bands_(bands), on_row_(std::move(on_row)), mu_ref_(std::numeric_limits<double>::quiet_NaN()),
      baseline_(ref.baseline_m3_s) {
  const auto m = oil_dynamic_viscosity(ref_.fluid, ref_.reference_t_k, 0.0);
  if (is_usable(m.st)) mu_ref_ = m.value;  // else assess_health reports the description's error per reading
  sum_.baseline_m3_s = baseline_;
}

void health_series::assess_and_emit(const health_series_input& in, int segment, double baseline) {
  auto ri = ref_;
  ri.baseline_m3_s = baseline;
  health_series_row out;
  out.row = in.row;
  out.a = assess_health(ri, bands_, in.reading, mu_ref_);
  out.baseline_m3_s = baseline;
  out.segment = segment;
  auto& s = sum_;
  if (is_error(out.a.st)) {
    ++s.refused;
    for (unsigned b = 0; b < 8; ++b)
      if (out.a.refused & (1u << b)) ++s.refused_by[b];
  } else {
    ++s.scored;
    if (out.a.reasons & flag_bits) ++s.flagged;
    if (has_level_ && out.a.level != s.latest.level) s.changes.push_back({in.row, in.date, s.latest.level, out.a.level});
    has_level_ = true;
    s.latest = out.a;
    s.latest_row = in.row;
    s.latest_date = in.date;
    if (in.reading.state == ref_.baseline_state) {
      out.in_baseline_state = true;
      ++s.in_state;
      time_.push_back(in.time);
      date_.push_back(in.date);
      qn_.push_back(out.a.drain_at_reference_m3_s);
      frac_.push_back(out.a.fraction_at_reference);
      seg_.push_back(segment);
      row_.push_back(in.row);
    }
  }
  if (on_row_) on_row_(out);
}

void health_series::flush_pending() {
  if (pending_k_ > 0) baseline_ = pending_sum_ / pending_k_;
  while (!pending_.empty()) {
    assess_and_emit(pending_.front().in, pending_.front().segment, baseline_);
    pending_.pop_front();
  }
  pending_sum_ = 0;
  pending_k_ = 0;
}

status health_series::feed(const health_series_input& in) {
  if (finished_) return status::misuse;
  if (sum_.rows == 0) sum_.first_date = in.date;
  ++sum_.rows;
  sum_.last_date = in.date;
  if (in.event == health_event::overhaul || in.event == health_event::meter_change) ++segment_;
  if (in.event == health_event::overhaul) {
    flush_pending();  // an earlier overhaul still waiting: its baseline from what it has
    pending_.push_back({in, segment_});
  } else if (!pending_.empty()) {
    pending_.push_back({in, segment_});
  } else {
    assess_and_emit(in, segment_, baseline_);
    return status::ok;
  }
  // an overhaul's new baseline: the mean of its first three accepted readings
  const auto a = assess_health(ref_, bands_, in.reading, mu_ref_);
  if (!is_error(a.st)) {
    pending_sum_ += a.drain_at_reference_m3_s;
    if (++pending_k_ == 3) flush_pending();
  }
  return status::ok;
}

health_series_summary health_series::finish() {
  if (finished_) {
    health_series_summary bad;
    bad.st = status::misuse;
    return bad;
  }
  flush_pending();
  finished_ = true;
  auto s = std::move(sum_);
  s.baseline_m3_s = baseline_;
  const double nan = std::numeric_limits<double>::quiet_NaN();
  s.noise_sigma = nan;
  s.trend = {nan, nan, nan, status::insufficient_data, nan};
  s.projection = {projection_kind::unavailable, nan};
  if (s.scored == 0 || qn_.empty()) {
    s.st = status::insufficient_data;
    return s;
  }
  // steps: tabular CUSUM per segment, noise from the moving ranges of all readings in the state
  const std::size_t m = qn_.size();
  std::vector<double> work(m);
  const auto sig = health_noise_sigma(qn_.data(), m, work.data());
  std::size_t trend_from = 0;
  for (std::size_t k = 1; k < m; ++k)
    if (seg_[k] != seg_[k - 1]) trend_from = k;
  if (is_usable(sig.st) && sig.value > 0) {
    s.noise_sigma = sig.value;
    std::vector<health_step<double>> steps(64);
    for (std::size_t b0 = 0; b0 < m;) {
      std::size_t b1 = b0;
      while (b1 < m && seg_[b1] == seg_[b0]) ++b1;
      std::size_t found = 0;
      status st = status::ok;
      for (int pass = 0; pass < 2; ++pass) {
        st = health_detect_steps(qn_.data() + b0, b1 - b0, nan, sig.value, 0.5, 5.0, steps.data(), steps.size(),
                                 work.data(), found);
        if (found <= steps.size()) break;
        steps.resize(found);
      }
      if (is_usable(st))
        for (std::size_t k = 0; k < found && k < steps.size(); ++k) {
          if (!steps[k].abrupt) {
            ++s.gradual;
            continue;
          }
          const std::size_t at = b0 + steps[k].index, sg = b0 + steps[k].signal_index;
          s.steps.push_back({row_[at], row_[sg], date_[at], date_[sg], steps[k].before, steps[k].after});
          if (at > trend_from) trend_from = at;
        }
      b0 = b1;
    }
  }
  s.trend_count = m - trend_from;
  s.trend_from_row = row_[trend_from];
  s.trend_from_date = date_[trend_from];
  s.trend_t0 = time_[trend_from];
  s.trend_t1 = time_.back();
  s.trend = fit_health_trend(time_.data() + trend_from, frac_.data() + trend_from, s.trend_count, bands_.worn_min);
  s.projection = health_projection(s.trend, s.latest.level);
  s.st = status::ok;
  std::vector<double>().swap(work);
  return s;
}

}  // namespace pumploss
