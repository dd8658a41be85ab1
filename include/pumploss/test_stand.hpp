/// @file test_stand.hpp
/// @brief Test-stand data reduction of a pump or motor as one workflow: readings in, per-point
/// efficiencies with their uncertainty, the derived displacement, fitted loss models, an
/// efficiency map and a drain table out, with a status and a list of messages.
///
/// The steps, each a function of the header core:
/// 1. the flow corrected to port conditions where the meter sits in the return line
///    (flow_at_port(): density ratio, ISO 4409:2019 clause 6 asks for the flow at the port);
/// 2. the oil viscosity in the gaps at the chosen temperature (ASTM D341, oil_dynamic_viscosity());
/// 3. the derived displacement by three estimators (ISO 8426-1): the slope of flow over speed at
///    the lowest pressure level, the zero-pressure intercept at the highest speed level, and the
///    two-step method over the whole grid; points belong to a level when their set-points lie
///    within 3 % of the column's span (common practice, no source);
/// 4. volumetric, hydromechanical and overall efficiency of every point with the expanded
///    uncertainty (k = 2) propagated from the stated instrument limits to first order
///    (JCGM 100:2008 GUM; limits as rectangular distributions, GUM 4.3.7), efficiency_gum();
/// 5. a Wilson loss model (and optionally the Schloesser extension) fitted to the points
///    (fit_loss_model()), and its overall-efficiency map over a pressure-speed grid at one
///    temperature (loss_model_map());
/// 6. the drain table: each point's case drain flow as a fraction of the theoretical flow
///    V_i n, the trade's indicator of wear (common practice, no source: a high-quality piston
///    pump drains about 5 % at maximum pressure, a worn one 15 % or more).
///
/// Every array is SI. Nothing throws except std::bad_alloc. The result's `st` is the worst status
/// of the run: an error when the reduction could not be made (the first error message says why;
/// the other results are then incomplete), else ok or a report code (>= 100) with messages.
/// The messages name the row and column of a reading, or the setup field, they refer to, so a
/// program can point its user at the line of the file.
///
/// Results are engineering estimates; the pump maker's data and acceptance rules govern.
#ifndef PUMPLOSS_TEST_STAND_HPP
#define PUMPLOSS_TEST_STAND_HPP

#include <array>
#include <cstddef>
#include <limits>
#include <memory>
#include <string>
#include <vector>

#include "export.hpp"
#include "efficiency.hpp"
#include "fluid.hpp"
#include "loss_model.hpp"
#include "status.hpp"
#include "uncertainty.hpp"

namespace pumploss {

/// Stated limits of one instrument: per cent of reading plus an absolute part, added as the
/// calibration sheets state them.
struct instrument_limits {
  double reading_fraction = 0;  ///< e.g. 0.005 for 0.5 % of reading
  double absolute = 0;          ///< absolute part in the SI unit of the quantity
  bool rectangular = true;      ///< limits (u = a / sqrt 3, GUM 4.3.7) or a standard uncertainty
};

/// Standard uncertainty of one reading from an instrument's stated limits.
/// @param ins the limits
/// @param reading the reading (SI)
/// @return u, in the unit of the reading
PUMPLOSS_CXX_API double instrument_uncertainty(const instrument_limits& ins, double reading);

/// Which temperature reading sets the viscosity in the gaps.
enum class viscosity_temperature : int { inlet = 0, outlet = 1, drain = 2 };

/// Which displacement the efficiencies use: one of the three estimators or the maker's figure.
enum class displacement_choice : int {
  slope = 0,      ///< displacement_slope() at the lowest pressure level
  intercept = 1,  ///< displacement_intercept() at the highest speed level
  two_step = 2,   ///< displacement_two_step() over the grid (the default)
  nominal = 3     ///< the maker's nominal displacement (no uncertainty propagated)
};

/// Steady-state criterion of a reading: the permissible variation of each indicated value about
/// its set point's median, as a fraction of that median (temperature in K). The defaults are
/// class B of the table "permissible variations of mean indicated values" of ISO 4409 (speed and
/// torque 1 %, flow and pressure 1.5 %, temperature 2 K; from memory, not verified against the
/// 2019 text). A row outside any limit is a settling row: dropped before the set point's average.
struct steady_state_limits {
  double speed_fraction = 0.01;      ///< speed
  double pressure_fraction = 0.015;  ///< pressure difference (the outlet gauge pressure of a pump)
  double flow_fraction = 0.015;      ///< flow at the port
  double torque_fraction = 0.01;     ///< torque
  double temperature_k = 2.0;        ///< the temperature that sets the viscosity, K
};

/// The quantity an acceptance criterion limits.
enum class acceptance_quantity : int {
  eta_v = 0,      ///< minimum volumetric efficiency at a stated point
  eta_hm = 1,     ///< minimum hydromechanical efficiency at a stated point
  eta_t = 2,      ///< minimum overall efficiency at a stated point
  drain_flow = 3  ///< maximum case drain flow (m^3/s) at a stated point, or at every set point (speed 0)
};

/// One acceptance criterion (the customer's or the maker's figure). The criterion is judged at the
/// tested set point that matches (speed, dp) within the grouping tolerances; a point not tested is
/// reported as such (never interpolated).
struct acceptance_criterion {
  acceptance_quantity what = acceptance_quantity::eta_t;  ///< the quantity
  double speed_rev_s = 0;  ///< speed of the stated point, rev/s (drain flow: 0 = every set point)
  double dp_pa = 0;        ///< pressure difference of the stated point, Pa
  double limit = 0;        ///< minimum efficiency (fraction) or maximum drain flow (m^3/s)
  std::string label;       ///< the customer's name for it (e.g. "maker's curve 1500 rpm 250 bar"), may be empty
};

/// How the test was made: machine, oil, flow meter, instruments, fit and map.
struct test_stand_setup {
  machine kind = machine::pump;             ///< pump (flow at the outlet) or motor (flow at the inlet)
  double nominal_displacement_m3_rev = 0;   ///< the maker's figure, m^3/rev (> 0)
  oil<double> fluid{};                      ///< the oil (D341 line, density, expansion, bulk modulus)
  viscosity_temperature viscosity_at = viscosity_temperature::drain;  ///< which temperature sets the viscosity
  displacement_choice displacement = displacement_choice::two_step;    ///< which displacement the efficiencies use
  bool meter_at_port = true;                ///< the flow is read at the port (no correction)
  double meter_pressure_pa = 0;             ///< gauge pressure at a meter in the return line, Pa
  instrument_limits speed;                  ///< speed meter's stated limits (absolute part in rev/s)
  instrument_limits pressure;               ///< pressure transducers' stated limits (absolute part in Pa)
  instrument_limits flow;                   ///< flow meter's stated limits (absolute part in m^3/s)
  instrument_limits torque;                 ///< torque meter's stated limits (absolute part in N m)
  bool fit_schloesser = false;              ///< also fit the Schloesser extension
  // ---- the map (issue 16): every field optional. Speeds and pressures both 0 (the default): the
  // tested envelope, the lowest to the highest set point; a temperature of 0: the mean over the set
  // points of the temperature that sets the viscosity (viscosity_at), so the map is not
  // extrapolated in viscosity. A stated temperature is read as that same temperature.
  double map_speed_lo_rev_s = 0;            ///< lowest map speed, rev/s (0 and 0: the tested range)
  double map_speed_hi_rev_s = 0;            ///< highest map speed, rev/s
  double map_dp_lo_pa = 0;                  ///< lowest map pressure difference, Pa (0 and 0: the tested range)
  double map_dp_hi_pa = 0;                  ///< highest map pressure difference, Pa
  double map_temperature_k = 0;             ///< the viscosity_at temperature of the map, K (0: the tested mean)
  std::size_t map_speeds = 29;              ///< grid columns (2 or more)
  std::size_t map_pressures = 27;           ///< grid rows (2 or more)
  // ---- logged data: set points, steady state, outliers (defaults are common practice, no source)
  double group_speed_fraction = 0.03;       ///< a row joins a set point when its speed lies within this fraction of the set point's mean speed
  double group_dp_fraction = 0.05;          ///< ... and its pressure difference within this fraction of the mean
  double group_dp_abs_pa = 5e5;             ///< ... or within this absolute band (5 bar), whichever is wider
  bool drop_unsteady = true;                ///< drop settling rows by the steady-state criterion
  steady_state_limits steady{};             ///< the steady-state criterion (ISO 4409 class B, from memory)
  unsigned flow_terms = 3u;                 ///< loss_flow_term bits offered to the flow fit (constant, compression; chosen by BIC)
  double outlier_threshold = 3.0;           ///< |externally studentized residual| above which a set point is an outlier
  bool exclude_outliers = true;             ///< exclude flagged set points from the fit, one at a time, worst first
  std::vector<std::size_t> exclude_rows;    ///< rows (0-based) whose set points are excluded from the fit by the user
  std::vector<acceptance_criterion> acceptance;  ///< acceptance criteria (may be empty)
};

/// The readings, one element per operating point (SI). Optional columns are empty when not measured.
struct test_stand_readings {
  std::vector<double> speed_rev_s;           ///< shaft speed, rev/s
  std::vector<double> inlet_pressure_pa;     ///< gauge, Pa
  std::vector<double> outlet_pressure_pa;    ///< gauge, Pa
  std::vector<double> flow_m3_s;             ///< pump outlet or motor inlet flow as the meter read it, m^3/s
  std::vector<double> torque_n_m;            ///< shaft torque, N m
  std::vector<double> drain_flow_m3_s;       ///< case drain flow, m^3/s
  std::vector<double> inlet_temperature_k;   ///< K
  std::vector<double> outlet_temperature_k;  ///< K (optional)
  std::vector<double> drain_temperature_k;   ///< K (optional)
  std::vector<double> meter_temperature_k;   ///< K at the flow meter (needed for a return-line meter)
  std::vector<double> case_pressure_pa;      ///< gauge, Pa (optional; not used yet)
};

/// One message of a reduction: an error that stopped it, or a report on the results.
struct test_stand_message {
  static constexpr std::size_t no_row = static_cast<std::size_t>(-1);  ///< `row` of a message on no single row
  status st = status::ok;     ///< the error or report code
  std::size_t row = no_row;   ///< index of the reading it concerns, or no_row
  std::string column;         ///< the reading it concerns ("speed", "outlet flow", ...), or empty
  std::string setting;        ///< the setup field it concerns ("viscosity_at", "map_temperature_k", ...), or empty
  std::string text;           ///< the sentence
  bool follows_value = false; ///< the sentence follows the reading's value ("is not a speed above zero ...")
};

/// One set point after reduction (its steady readings averaged).
struct test_stand_point {
  double speed_rev_s = 0;                   ///< speed, rev/s
  double dp_pa = 0;                         ///< pressure difference across the machine, Pa
  double flow_m3_s = 0;                     ///< flow at the port (corrected where the meter is elsewhere)
  double torque_n_m = 0;                    ///< torque, N m
  double mu_pa_s = 0;                       ///< viscosity in the gaps, Pa s
  efficiency_uncertainty<double> eta{};     ///< efficiencies with their GUM uncertainties (U = k u, k = 2)
  double flow_residual_m3_s = std::numeric_limits<double>::quiet_NaN();   ///< residual of the first fitted model's flow (NaN when fit_st is an error)
  double torque_residual_n_m = std::numeric_limits<double>::quiet_NaN();  ///< residual of the first fitted model's torque (NaN when fit_st is an error)
  status fit_st = status::insufficient_data;              ///< the first model's prediction at this point: ok, a report
                                            ///< (extrapolated: outside the fitted range, e.g. an excluded point), or the
                                            ///< error that left the residuals NaN (insufficient_data: no model fitted)
  std::size_t speed_level = 0;              ///< speed set-point level (0 the lowest)
  std::size_t pressure_level = 0;           ///< pressure set-point level (0 the lowest)
  status st = status::ok;                   ///< the point's efficiency status (ok, implausible)
  std::size_t first_row = 0;                ///< first reading (0-based) of the set point
  std::size_t rows = 1;                     ///< readings averaged into the set point
  std::size_t rows_unsteady = 0;            ///< readings dropped by the steady-state criterion
  double ua_speed_rev_s = 0;                ///< type A standard uncertainty s/sqrt(n) of the mean speed (GUM 4.2; 0 for one reading)
  double ua_dp_pa = 0;                      ///< type A of the mean pressure difference
  double ua_flow_m3_s = 0;                  ///< type A of the mean flow
  double ua_torque_n_m = 0;                 ///< type A of the mean torque
  double t_flow = 0;                        ///< externally studentized residual of the flow fit (NaN when not defined)
  double t_torque = 0;                      ///< externally studentized residual of the torque fit
  unsigned outlier = 0;                     ///< outlier bits: 1 flow, 2 torque (|t| above the threshold)
  bool excluded = false;                    ///< left out of the displacement estimators and the fits
  bool excluded_by_list = false;            ///< excluded because setup.exclude_rows names one of its rows
};

/// The verdict on one acceptance criterion.
struct acceptance_verdict {
  acceptance_criterion criterion;  ///< the criterion judged
  bool tested = false;             ///< a set point matched the stated point
  bool pass = false;               ///< the criterion is met (margin >= 0); false when not tested
  double value = 0;                ///< the measured value (efficiency or drain flow, SI); NaN when not tested
  double U = 0;                    ///< its expanded uncertainty (k = 2; 0 for the drain flow)
  double margin = 0;               ///< value - limit for a minimum, limit - value for a maximum (NaN when not tested)
  std::size_t point = 0;           ///< the set point judged (for every set point: the worst)
};

/// One row of the drain table.
struct test_stand_drain {
  double drain_flow_m3_s = 0;  ///< case drain flow as read
  double fraction = 0;         ///< drain flow / (V_i n): share of the theoretical flow
  double loss_share = 0;       ///< drain flow / (V_i n - Q_port) for a pump, / (Q_port - V_i n) for a motor: share of the volumetric loss (NaN when the loss is not positive)
};

/// The overall-efficiency map of one fitted model.
struct test_stand_map {
  loss_model_kind model = loss_model_kind::wilson;  ///< the model mapped
  std::vector<double> eta_t;   ///< row-major [pressure index][speed index]
  std::vector<status> st;      ///< per grid point (ok, extrapolated, or an error)
};

/// Everything a reduction gives.
struct test_stand_result {
  status st = status::ok;                        ///< worst status of the run (error: the reduction stopped)
  std::vector<test_stand_message> messages;      ///< errors, reports and notes (status ok: e.g. the map's temperature), in the order they arose
  std::size_t speed_levels = 0;                  ///< speed set-point levels found
  std::size_t pressure_levels = 0;               ///< pressure set-point levels found
  std::array<displacement_result<double>, 3> estimators{};  ///< slope, intercept, two-step
  double displacement_m3_rev = 0;                ///< V_i used for the efficiencies
  double u_displacement_m3_rev = 0;              ///< its standard uncertainty (0 for the nominal figure)
  displacement_choice displacement_used = displacement_choice::two_step;  ///< where displacement_m3_rev came from
  bool flow_corrected = false;                    ///< the flow was corrected to port conditions
  std::vector<test_stand_point> points;          ///< per set point (readings grouped and averaged)
  std::vector<test_stand_drain> drain;           ///< per set point
  double fit_density_kg_m3 = 0;                  ///< density the Schloesser terms used (oil at the middle point)
  std::vector<loss_model<double>> models;        ///< Wilson, then Schloesser when asked for
  std::vector<double> map_speed_rev_s;           ///< map grid speeds
  std::vector<double> map_dp_pa;                 ///< map grid pressure differences
  double map_temperature_k = 0;                  ///< the map's temperature (setup's, or the tested mean), K
  double map_mu_pa_s = 0;                        ///< viscosity of the map temperature
  bool map_temperature_tested = true;            ///< the map temperature lies within the tested range (below)
  double tested_speed_lo_rev_s = 0;              ///< test envelope: lowest included set-point speed, rev/s
  double tested_speed_hi_rev_s = 0;              ///< ... highest
  double tested_dp_lo_pa = 0;                    ///< ... lowest pressure difference, Pa
  double tested_dp_hi_pa = 0;                    ///< ... highest
  double tested_temperature_lo_k = 0;            ///< lowest set-point mean of the viscosity temperature, K
  double tested_temperature_hi_k = 0;            ///< ... highest
  std::vector<test_stand_map> maps;              ///< one per model
  std::size_t map_extrapolated = 0;              ///< grid points outside the tested range (worst over the models)
  std::vector<std::size_t> row_point;            ///< set point of every reading (test_stand_message::no_row: dropped as settling)
  std::size_t rows_unsteady = 0;                 ///< readings dropped by the steady-state criterion
  std::size_t outliers = 0;                      ///< set points flagged as outliers (then st is outlier: their reports come first)
  std::size_t excluded = 0;                      ///< set points excluded from the fit (rule or list)
  std::vector<acceptance_verdict> acceptance;    ///< one verdict per criterion
  bool accepted = true;                          ///< every criterion tested and passed
};

/// Reduce a test-stand data set.
///
/// Logged data: the rows are grouped into set points (speed within setup.group_speed_fraction of
/// the set point's running mean, pressure difference within the wider of group_dp_fraction and
/// group_dp_abs_pa); in each set point the rows outside the steady-state limits about the median
/// are dropped as settling (setup.steady, ISO 4409 class B from memory); the rest are averaged.
/// A set point's standard uncertainty of each input combines the instrument's type B (GUM 4.3.7)
/// with the scatter's type A, s/sqrt(n) (GUM 4.2.3), in quadrature.
///
/// Outliers: after each fit, the externally studentized residual
/// \f$ t_i = e_i / (s_{(i)}\sqrt{1-h_{ii}}) \f$ of the flow and torque regressions,
/// \f$ s_{(i)}^2 = ((m-p)s^2 - e_i^2/(1-h_{ii}))/(m-p-1) \f$ (Belsley, Kuh and Welsch,
/// Regression Diagnostics, Wiley 1980, 2.1); a set point with |t| above setup.outlier_threshold
/// is flagged and, with exclude_outliers, excluded (the worst one, then the fit repeated, at most
/// a fifth of the set points); setup.exclude_rows excludes set points by the user's list.
/// Excluded points stay in the tables, flagged.
///
/// Incomplete grid: the two-step estimator uses the largest complete sub-grid (dropping the
/// short speed or pressure level) and a report names the level that was short.
///
/// Acceptance: each criterion is judged at the set point matching its stated point; margin and
/// verdict per criterion, `accepted` when all are tested and pass.
/// @param setup how the test was made
/// @param readings the readings (every column of one length; required: speed, pressures, flow,
///        torque, drain flow, inlet temperature, and the temperature setup.viscosity_at names;
///        a return-line meter also needs the meter temperature and the port's temperature)
/// @return the results; st is an error (domain, insufficient_data, misuse, nonfinite, or the
///         failing step's code) when the reduction could not be made, with the reason first in
///         messages; else ok or a report: regime (a flow correction across more than 150 K, or a
///         grid smaller than 5 x 5 for the two-step estimator), ill_conditioned (a fit),
///         extrapolated (map points outside the tests, or a map temperature outside the tested
///         range of the viscosity temperature), implausible (an efficiency above 1), outlier (set
///         points flagged by the outlier test; each has its own message).
/// @par Source
/// ISO 4409:2019 (test method), ISO 8426-1 (derived displacement), JCGM 100:2008 (uncertainty),
/// Wilson and Schloesser loss models as in docs/pages/theory_efficiency.md.
PUMPLOSS_CXX_API test_stand_result reduce_test_stand(const test_stand_setup& setup, const test_stand_readings& readings);

// ---- streaming front end (issue 20): test data fed row by row in bounded memory
/// One reading of a test (SI), the row of test_stand_readings; a column the data lack stays NaN.
struct test_stand_row {
  double speed_rev_s = std::numeric_limits<double>::quiet_NaN();           ///< shaft speed, rev/s
  double inlet_pressure_pa = std::numeric_limits<double>::quiet_NaN();     ///< gauge, Pa
  double outlet_pressure_pa = std::numeric_limits<double>::quiet_NaN();    ///< gauge, Pa
  double flow_m3_s = std::numeric_limits<double>::quiet_NaN();             ///< pump outlet or motor inlet flow as read, m^3/s
  double torque_n_m = std::numeric_limits<double>::quiet_NaN();            ///< shaft torque, N m
  double drain_flow_m3_s = std::numeric_limits<double>::quiet_NaN();       ///< case drain flow, m^3/s
  double inlet_temperature_k = std::numeric_limits<double>::quiet_NaN();   ///< K
  double outlet_temperature_k = std::numeric_limits<double>::quiet_NaN();  ///< K (optional)
  double drain_temperature_k = std::numeric_limits<double>::quiet_NaN();   ///< K (optional)
  double meter_temperature_k = std::numeric_limits<double>::quiet_NaN();   ///< K at the flow meter (optional)
  double case_pressure_pa = std::numeric_limits<double>::quiet_NaN();      ///< gauge, Pa (optional)
};

/// reduce_test_stand() with the readings fed one row at a time: the same checks, grouping,
/// steady-state filter and reduction, and the same result, in memory that does not grow with the
/// row count (for a logger's file of a million rows).
///
/// How: a set point of logged data is a consecutive run of rows. The rows of the run being
/// logged are held (memory bounded by the longest run: about 150 bytes a row); when a row opens
/// another set point the run is judged by the steady-state criterion about its medians and folded
/// into its set point's sums (running sums of every column in row order, the scatter's sum of
/// squares), then released. The grouping rule is reduce_test_stand()'s: the running means of every
/// set point are kept, the previous row's set point is tried first, then every earlier one.
/// Readings are checked as they come; the first failing check of the whole table is reported in
/// reduce_test_stand()'s order (column by column), with the same message.
///
/// Results equal reduce_test_stand()'s bit for bit when every set point is one consecutive run of
/// rows (logged data). A set point logged again after others (rows that return to an earlier set
/// point) is merged by the same grouping rule; its later rows are judged against the medians of
/// its earlier rows (reduce_test_stand() takes the medians of all its rows), its means are the
/// same sums in the same order, and its scatter is merged by the pairwise formula of T. F. Chan,
/// G. H. Golub and R. J. LeVeque, "Algorithms for computing the sample variance", The American
/// Statistician 37 (1983) 242-247: equal within rounding unless a row lies at a steady-state limit.
/// Besides the open run, the stream holds per set point about 350 bytes, and the viscosity
/// temperature of the later half of the rows (8 bytes a row: reduce_test_stand() takes the
/// oil density of the Schloesser terms at reading n / 2, and n is known only at the end).
/// Nothing throws except std::bad_alloc.
class test_stand_stream {
 public:
  // Column bits of the constructor: which columns of test_stand_row the data have.
  static constexpr unsigned speed = 1u << 0;  ///< column bit: speed
  static constexpr unsigned inlet_pressure = 1u << 1;  ///< column bit: inlet pressure
  static constexpr unsigned outlet_pressure = 1u << 2;  ///< column bit: outlet pressure
  static constexpr unsigned flow = 1u << 3;  ///< column bit: flow
  static constexpr unsigned torque = 1u << 4;  ///< column bit: torque
  static constexpr unsigned drain_flow = 1u << 5;  ///< column bit: case drain flow
  static constexpr unsigned inlet_temperature = 1u << 6;  ///< column bit: inlet temperature
  static constexpr unsigned outlet_temperature = 1u << 7;  ///< column bit: outlet temperature
  static constexpr unsigned drain_temperature = 1u << 8;  ///< column bit: drain temperature
  static constexpr unsigned meter_temperature = 1u << 9;  ///< column bit: flow meter temperature
  static constexpr unsigned case_pressure = 1u << 10;  ///< column bit: case pressure
  /// The columns reduce_test_stand() requires.
  static constexpr unsigned required = speed | inlet_pressure | outlet_pressure | flow | torque | drain_flow | inlet_temperature;
  /// Start a reduction.
  /// @param setup how the test was made (copied)
  /// @param columns the column bits of the columns the data have (a missing one is reported by finish())
  /// @param keep_row_point fill the result's row_point (8 bytes a row; false: left empty)
  PUMPLOSS_CXX_API test_stand_stream(const test_stand_setup& setup, unsigned columns, bool keep_row_point = false);
  PUMPLOSS_CXX_API ~test_stand_stream();
  test_stand_stream(const test_stand_stream&) = delete;
  test_stand_stream& operator=(const test_stand_stream&) = delete;
  /// Feed the next reading (row index = the number fed before it); ignored after finish().
  /// @param row the reading (SI; the columns not in `columns` are not read)
  PUMPLOSS_CXX_API void add(const test_stand_row& row);
  /// Reduce what was fed, as reduce_test_stand() on the whole table; call once.
  /// @return the results (row_point empty unless asked for)
  PUMPLOSS_CXX_API test_stand_result finish();
  /// @return the readings fed so far
  PUMPLOSS_CXX_API std::size_t rows() const noexcept;
  /// @return the most rows held at once (the longest run of one set point, for a memory check)
  PUMPLOSS_CXX_API std::size_t max_held_rows() const noexcept;
  /// The mean of every column over each set point's steady rows (after finish(); NaN for a
  /// column the data lack), one element per result point.
  /// @return the means
  PUMPLOSS_CXX_API const std::vector<test_stand_row>& point_means() const noexcept;
  /// describe() of a message of finish(), with the value of the reading it names.
  /// @param m a message of finish()
  /// @return the sentence
  PUMPLOSS_CXX_API std::string describe(const test_stand_message& m) const;

 private:
  struct impl;
  std::unique_ptr<impl> p_;
};

/// A message as one sentence for a log or a C caller: "reading 8, speed: -8.333 is not a speed
/// above zero (and below 60000 rpm)", "setting viscosity_at: ...", or the text alone.
/// @param m a message of reduce_test_stand()
/// @param readings the readings it came from (for the value of a reading; SI)
/// @return the sentence
PUMPLOSS_CXX_API std::string describe(const test_stand_message& m, const test_stand_readings& readings);

/// The name of a displacement choice ("slope", "intercept", "two-step", "nominal").
/// @param c the choice
/// @return a static string
PUMPLOSS_CXX_API const char* displacement_choice_name(displacement_choice c) noexcept;

/// The name of a viscosity temperature ("inlet", "outlet", "drain").
/// @param t the choice
/// @return a static string
PUMPLOSS_CXX_API const char* viscosity_temperature_name(viscosity_temperature t) noexcept;

/// The name of an acceptance quantity ("eta_v", "eta_hm", "eta_t", "drain_flow").
/// @param q the quantity
/// @return a static string
PUMPLOSS_CXX_API const char* acceptance_quantity_name(acceptance_quantity q) noexcept;

/// The name of a loss model ("Wilson", "Schloesser").
/// @param k the model
/// @return a static string
PUMPLOSS_CXX_API const char* loss_model_name(loss_model_kind k) noexcept;

}  // namespace pumploss

#endif
