/// @file health_series.hpp
/// @brief A series of field readings judged in one workflow: plausibility, normalisation,
/// verdict, events, steps, trend and projection, fed row by row in bounded memory.
///
/// The program's `health` subcommand reads a file of readings, feeds every row to one
/// health_series and renders what it returns; a SCADA historian or a spreadsheet macro can do the
/// same. Per reading the series returns its assessment (assess_health()) through a callback, in
/// the order fed; at the end health_series::finish() gives the summary: counts, the latest
/// verdict, the verdict changes, the abrupt steps (health_detect_steps(), per segment between
/// overhauls and meter changes, against a local quadratic trend), the trend after the last step
/// or event (fit_health_trend()) and its projection within the span (health_projection()).
///
/// Events: an overhaul starts a new baseline from the mean normalised drain flow of its first
/// three accepted readings (the rows from the overhaul on wait until those are seen, so the
/// callback may lag a few rows behind the feed) and restarts steps and trend; a meter change
/// restarts steps and trend; an oil change is only annotated.
///
/// Memory: a few numbers per reading in the baseline's operating state (time, date, normalised
/// flow and fraction, segment, row; about 40 bytes), the verdict changes, and the rows waiting
/// for an overhaul's baseline. A million readings take some 40 MB.
///
/// The verdict bands are common practice, no source, unless the caller gives the maker's; the
/// results are engineering estimates. See health.hpp for the cautions (never block a case drain).
#ifndef PUMPLOSS_HEALTH_SERIES_HPP
#define PUMPLOSS_HEALTH_SERIES_HPP

#include <cstddef>
#include <cstdint>
#include <deque>
#include <functional>
#include <vector>

#include "export.hpp"
#include "health.hpp"

namespace pumploss {

/// Events recorded with a reading.
enum class health_event : int {
  none = 0,          ///< no event
  oil_change = 1,    ///< annotated only
  overhaul = 2,      ///< new baseline from the next three accepted readings; steps and trend restart
  meter_change = 3   ///< steps and trend restart
};

/// A short name of an event ("oil change", "overhaul", "meter change", "" for none).
/// @param e the event
/// @return the name (static storage)
PUMPLOSS_CXX_API const char* health_event_name(health_event e) noexcept;

/// One reading of a series.
struct health_series_input {
  health_reading<double> reading{};   ///< the reading (its state included)
  double time = 0;                    ///< trend axis: days or operating hours, not decreasing
  double date = 0;                    ///< calendar day (days since 1970-01-01), for steps and changes
  health_event event = health_event::none;  ///< event recorded at this reading
  std::size_t row = 0;                ///< the caller's row number, handed back in the results
};

/// The result of one reading, as handed to the callback.
struct health_series_row {
  std::size_t row = 0;                 ///< the caller's row number
  health_assessment<double> a{};       ///< the assessment (a.st out_of_validity: refused, a.refused bits)
  double baseline_m3_s = 0;            ///< baseline in force for this reading
  int segment = 0;                     ///< segment (counted up at each overhaul and meter change)
  bool in_baseline_state = false;      ///< scored and in the baseline's operating state (steps and trend use it)
};

/// An abrupt step of the normalised drain flow.
struct health_series_step {
  std::size_t row = 0;         ///< caller's row of the first reading of the new level
  std::size_t signal_row = 0;  ///< caller's row at which the CUSUM signalled
  double date = 0;             ///< date of `row`
  double signal_date = 0;      ///< date of `signal_row`
  double before = 0;           ///< level before, m^3/s
  double after = 0;            ///< level after, m^3/s
};

/// A change of the verdict from one scored reading to the next.
struct health_verdict_change {
  std::size_t row = 0;    ///< caller's row of the reading with the new verdict
  double date = 0;        ///< its date
  health_level from = health_level::sound;  ///< verdict before
  health_level to = health_level::sound;    ///< verdict from this reading on
};

/// What a series gives at its end.
struct [[nodiscard]] health_series_summary {
  std::size_t rows = 0;        ///< readings fed
  std::size_t scored = 0;      ///< readings scored (not refused)
  std::size_t refused = 0;     ///< readings refused
  std::size_t flagged = 0;     ///< scored readings with a flag (speed, pressure, sensors, state)
  std::size_t in_state = 0;    ///< scored readings in the baseline's state (steps and trend)
  std::size_t refused_by[8] = {};  ///< refusals per health_refusal bit (index = bit position)
  health_assessment<double> latest{};  ///< the last scored reading's assessment
  std::size_t latest_row = 0;  ///< its caller's row
  double latest_date = 0;      ///< its date
  double first_date = 0;       ///< date of the first reading fed
  double last_date = 0;        ///< date of the last reading fed
  double baseline_m3_s = 0;    ///< baseline in force at the end
  double noise_sigma = 0;      ///< noise of the normalised drain flow (moving ranges), m^3/s (NaN: not found)
  std::vector<health_series_step> steps;          ///< abrupt steps, in order
  std::size_t gradual = 0;                        ///< gradual level shifts (not steps)
  std::vector<health_verdict_change> changes;     ///< verdict changes, in order
  health_trend<double> trend{};                   ///< trend after the last step or event
  health_projection_result<double> projection{};  ///< its projection to the worn band
  std::size_t trend_count = 0;                    ///< readings of the trend
  std::size_t trend_from_row = 0;                 ///< caller's row of its first reading
  double trend_from_date = 0;                     ///< its date
  double trend_t0 = 0;                            ///< its first time (trend axis)
  double trend_t1 = 0;                            ///< its last time (trend axis)
  status st = status::ok;  ///< insufficient_data: nothing scored or nothing in the baseline's state; misuse: fed after finish
  /// @return true when the status is exactly ok.
  bool ok() const noexcept { return st == status::ok; }
  /// @return true when the results are usable.
  bool usable() const noexcept { return is_usable(st); }
};

/// A series of readings judged row by row (see the file's description).
///
/// @par Source
/// The verdict: assess_health(); steps: tabular CUSUM (E. S. Page, Biometrika 41 (1954)
/// 100-115) with the abruptness test of health_cusum; trend: ordinary least squares
/// (fit_health_trend()); projection no further than the data span (health_projection()).
class health_series {
 public:
  /// Called with every reading's result, in the order fed.
  using sink = std::function<void(const health_series_row&)>;
  /// @param ref the pump description (its baseline is the first baseline)
  /// @param bands bands and limits
  /// @param on_row receives every reading's result (may be empty)
  PUMPLOSS_CXX_API health_series(const health_reference<double>& ref, const health_bands<double>& bands, sink on_row);
  /// Feed one reading. Readings with an error status (a description that cannot be used, a
  /// non-finite value) are handed to the callback with that status and not scored.
  /// @param in the reading
  /// @return status::misuse after finish(), else status::ok
  PUMPLOSS_CXX_API status feed(const health_series_input& in);
  /// Hand out the waiting rows and judge the series.
  /// @return the summary
  PUMPLOSS_CXX_API health_series_summary finish();

 private:
  struct waiting {
    health_series_input in;
    int segment;
  };
  void assess_and_emit(const health_series_input& in, int segment, double baseline);
  void flush_pending();
  health_reference<double> ref_;
  health_bands<double> bands_;
  sink on_row_;
  double mu_ref_;
  double baseline_;
  int segment_ = 0;
  bool finished_ = false;
  // rows after an overhaul waiting for its baseline
  std::deque<waiting> pending_;
  double pending_sum_ = 0;
  int pending_k_ = 0;
  // readings in the baseline's state
  std::vector<double> time_, date_, qn_, frac_;
  std::vector<std::int32_t> seg_;
  std::vector<std::size_t> row_;
  health_series_summary sum_;
  bool has_level_ = false;
};

}  // namespace pumploss

#endif
