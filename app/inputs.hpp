// The input files of every subcommand, read into SI structures. Each reader checks the whole
// file (unknown keys and columns are errors) and throws input_error naming file, line, column.
// These structures are the seam where the calculation modules plug in.
#ifndef PUMPLOSS_CLI_INPUTS_HPP
#define PUMPLOSS_CLI_INPUTS_HPP

#include <optional>
#include <limits>
#include <string>
#include <vector>

#include "columns.hpp"
#include "config.hpp"
#include "csv.hpp"
#include "pumploss/fluid.hpp"
#include "pumploss/piston_pump.hpp"
#include "pumploss/test_stand.hpp"

namespace plcli {

/// A temperature range "from, to, step" (K).
struct temperature_range {
  double from_k = 273.15, to_k = 373.15, step_k = 10.0;
  std::vector<double> values() const;
};

/// An oil: its D341 line and the other properties, and what was assumed.
struct oil_spec {
  std::string file;                     ///< where it was read
  std::string name;
  std::optional<int> grade;             ///< ISO 3448 grade when given
  double t1_k = 0, nu1_m2_s = 0, t2_k = 0, nu2_m2_s = 0;  ///< the two D341 points
  pumploss::oil<double> props{};        ///< D341 line and density, expansion, ...
  std::vector<std::string> assumed;     ///< properties taken from typical_mineral_oil()
};

/// Build an oil from grade and/or points (shared by the oil file and the command line).
/// `points` holds (T [K], nu [m^2/s]); `grade` alone is not enough (ISO 3448 fixes 40 degC only).
/// Throws std::invalid_argument with a sentence.
oil_spec make_oil(std::optional<int> grade, const std::vector<std::pair<double, double>>& points);

/// The oil file: [oil], optional [temperatures] and [limits] (the pump maker's viscosity range).
struct oil_file {
  oil_spec oil;
  std::optional<temperature_range> temperatures;
  std::optional<double> min_nu_m2_s, max_nu_m2_s, max_start_nu_m2_s;  ///< viscosity limits
  std::string limits_source;  ///< text: whose limits
};
oil_file read_oil_file(const std::string& path);

/// The oil of a configuration file: `oil = "oil.toml"` (relative to the file) or an [oil] table.
oil_spec read_oil_ref(section& root);

/// Test-stand setup (test_stand.toml): what the library's reduction takes, plus what the
/// report shows (names, contour levels).
struct stand_setup {
  oil_spec oil;
  std::string machine_name;
  pumploss::test_stand_setup run;          ///< machine, oil, meter, instruments, fit, map grid
  std::vector<double> map_levels;          ///< overall efficiency contour levels (fractions)
  std::vector<std::pair<std::string, std::string>> job;  ///< optional [job] details (label, text) in report order
};
stand_setup read_stand_setup(const std::string& path);

/// Case drain line (drain_line.toml).
struct line_segment {
  std::string name, kind;
  double inside_diameter_m = 0, length_m = 0, roughness_m = 0;
  int line = 0;  ///< where it is in the file
};
struct line_fitting {
  std::string name;
  std::string type;                     ///< a named kind (pumploss::fitting_table), "exit", or "" (k / two_k)
  std::string method = "darby";         ///< for a named kind: "darby" (3-K) or "hooper" (2-K)
  double k = 0;                         ///< constant K (when no kind and no 2-K data)
  std::optional<double> k1, k_inf;      ///< Hooper 2-K
  long count = 1;
  std::size_t after_segment = 0;        ///< index of the segment it follows (it sits after it in the line)
  double inside_diameter_m = 0;         ///< its own bore, or 0: the bore of the element it follows
  int line = 0;
};
struct line_component {
  std::string name;
  std::vector<std::pair<double, double>> curve;  ///< (q m^3/s, dp Pa) at curve_nu_m2_s
  double curve_nu_m2_s = 0;
  std::string scaling;                  ///< "laminar" (dp ~ nu) or "none"
  int line = 0;
};
struct drain_line_spec {
  oil_spec oil;
  std::string pump_name;
  double max_case_pressure_pa = 0;      ///< gauge
  double tank_pressure_pa = 0;          ///< gauge
  double outlet_height_m = 0;           ///< discharge above the case port
  double drain_flow_m3_s = 0;           ///< largest continuous drain flow given (for the facts line)
  std::string flow_with_temperature;    ///< "constant", "laminar", "parts" or "table"
  std::optional<double> flow_reference_k;
  double flow_constant_m3_s = 0;        ///< constant part (controller consumption)
  double flow_laminar_m3_s = 0;         ///< laminar part at flow_reference_k
  std::vector<std::pair<double, double>> flow_table;  ///< (T K, q m^3/s) when "table"
  double peak_volume_m3 = 0;            ///< destroke: control volume dumped into the case
  double peak_time_s = 0;               ///< over this time
  std::optional<double> max_peak_case_pressure_pa;   ///< the maker's peak limit (needed with a peak)
  std::optional<double> max_start_viscosity_m2_s;    ///< the maker's largest start viscosity
  std::string start_viscosity_source;                ///< where that limit came from
  temperature_range temperatures;
  std::vector<line_segment> segments;
  std::vector<line_fitting> fittings;
  std::vector<line_component> components;
  int sizing_kinds = 3;                 ///< standard bores to try: 1 tubes, 2 hoses, 3 both
  std::optional<double> max_velocity_m_s;
};
drain_line_spec read_drain_line(const std::string& path);

/// Pump description (pump file): rated data, geometry, health settings, sweep.
struct pump_spec {
  oil_spec oil;
  std::string name;
  double max_displacement_m3_rev = 0, rated_speed_rev_s = 0, max_pressure_pa = 0;
  pumploss::piston_pump<double> geometry;  ///< validated by pumploss::validate_piston_pump
  // health
  double baseline_drain_m3_s = 0, reference_dp_pa = 0, reference_temperature_k = 0, reference_speed_rev_s = 0;
  std::vector<double> fraction_bands;   ///< drain / (V_max n) edges, ascending (3 values)
  std::vector<double> growth_bands;     ///< growth over baseline: moderate, large (2 values)
  double hot_margin = 1.0;              ///< drain rise flagged above this times the throttling rise
  // health, version 2 (no geometry needed)
  bool has_geometry = false;            ///< [geometry] given (the budget needs it, health does not)
  double controller_consumption_m3_s = -1;  ///< constant drain part (negative until read)
  std::vector<double> fit_pressures_pa, fit_temperatures_k, fit_drain_m3_s;  ///< baseline readings to fit
  std::vector<double> fit_case_pa;        ///< case pressures of the baseline readings (empty: 0)
  std::string baseline_file;              ///< the baseline file read (test-stand's), or empty
  double baseline_rise_k = std::numeric_limits<double>::quiet_NaN();  ///< drain minus inlet at the reference state
  bool baseline_deadhead = false;       ///< the baseline was read at deadhead
  double hot_baseline_factor = 1.5;     ///< drain rise flagged above this times the baseline rise
  bool clearance_from_drain = false;    ///< viscosity at the drain temperature (else the oil temperature)
  std::string bands_source;
  // sweep
  double sweep_from_pa = 0, sweep_to_pa = 0, sweep_step_pa = 0, sweep_speed_rev_s = 0, sweep_case_pa = 0,
         sweep_temperature_k = 0, sweep_displacement_fraction = 1;
  double sweep_inlet_pa = 0;                ///< inlet pressure (compression and cross-port losses)
  double sweep_film_rise_k = 0;             ///< film temperature rise of the heated bound of the band
  double gap_tolerance[pumploss::pump_gap_count] = {0, 0, 0, 0};  ///< standard uncertainty of each gap, m
  /// Maximum displacement implied by the geometry (pumploss::piston_pump_displacement).
  double geometric_displacement_m3_rev() const;
};
pump_spec read_pump(const std::string& path);

// ---- baseline file (issue 16)
/// The baseline file of a test-stand run (TOML of our own format, read by health through
/// [health] baseline_file): per set point not excluded its speed, mean outlet and case pressure,
/// mean inlet and drain temperature and the drain flow, with the oil and the nominal displacement.
/// @param setup the test-stand setup
/// @param data_name the data file's name (for the file's comment)
/// @param means per set point, the mean of every column over its steady rows
///        (pumploss::test_stand_stream::point_means(); NaN for a column the data lack)
/// @param res the reduction
std::string baseline_file_text(const stand_setup& setup, const std::string& data_name,
                               const std::vector<pumploss::test_stand_row>& means, const pumploss::test_stand_result& res);

}  // namespace plcli

#endif
