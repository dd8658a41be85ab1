/// @file workflows.hpp
/// @brief Small workflows behind the program's reports, callable by an embedder: an oil's
/// property table over temperature checked against the pump maker's viscosity limits, the
/// leakage budget of a described piston pump over a pressure sweep, and the case drain line
/// check (over temperature, element shares, start temperature, sizing) in one call.
///
/// Each takes SI inputs and returns a struct with a status (the first error stops it and says
/// where) and the rows a report shows. Nothing throws except std::bad_alloc. Results are
/// engineering estimates; the pump maker's data and limits govern.
#ifndef PUMPLOSS_WORKFLOWS_HPP
#define PUMPLOSS_WORKFLOWS_HPP

#include <cstddef>
#include <limits>
#include <vector>

#include "drain_check.hpp"
#include "export.hpp"
#include "fluid.hpp"
#include "piston_pump.hpp"
#include "status.hpp"

namespace pumploss {

/// The pump maker's viscosity limits (NaN: not given).
struct viscosity_limits {
  double min_m2_s = std::numeric_limits<double>::quiet_NaN();        ///< lowest running viscosity
  double max_m2_s = std::numeric_limits<double>::quiet_NaN();        ///< highest running viscosity
  double max_start_m2_s = std::numeric_limits<double>::quiet_NaN();  ///< highest viscosity at a start
};

/// An oil's viscosity against the maker's limits.
enum class viscosity_verdict : int {
  not_checked = 0,         ///< no limits given
  ok = 1,                  ///< within the running range
  start_only = 2,          ///< above the running maximum, below the start maximum
  too_thick_to_start = 3,  ///< above the start maximum
  too_thin = 4             ///< below the running minimum
};

/// One row of an oil table.
struct oil_property_row {
  double t_k = 0;           ///< temperature, K
  double nu_m2_s = 0;       ///< kinematic viscosity (ASTM D341), m^2/s
  double mu_pa_s = 0;       ///< dynamic viscosity at zero gauge pressure, Pa s
  double rho_kg_m3 = 0;     ///< density at zero gauge pressure, kg/m^3
  status st = status::ok;   ///< worst status of the three (regime outside the stated ranges)
  viscosity_verdict verdict = viscosity_verdict::not_checked;  ///< against the maker's limits
};

/// An oil's properties over temperature.
struct [[nodiscard]] oil_property_table {
  status st = status::ok;                      ///< ok, regime (some row outside a stated range), or the first error
  std::size_t failed_row = static_cast<std::size_t>(-1);  ///< the temperature that failed (on an error)
  std::vector<oil_property_row> rows;          ///< one per temperature (up to the failed one)
  double nu40_m2_s = 0;                        ///< viscosity at 40 degC (for the grade check)
  bool inside_grade = false;                   ///< nu40 inside the ISO 3448 band of the grade given
  /// @return true when the status is exactly ok.
  bool ok() const noexcept { return st == status::ok; }
  /// @return true when the results are usable (ok or a report such as regime).
  bool usable() const noexcept { return is_usable(st); }
};

/// Tabulate an oil over temperatures and check each against the maker's limits.
/// @param o the oil
/// @param t_k temperatures, K
/// @param limits the maker's viscosity limits (NaN where not given)
/// @param iso_grade an ISO 3448 grade to check the 40 degC viscosity against (0: none)
/// @return the table; an error status (the failing step's) with failed_row on a temperature
///         where the properties are not defined
/// @par Source
/// ASTM D341-20 (viscosity), ISO 3448:1992 (grades); density as in fluid.hpp.
PUMPLOSS_CXX_API oil_property_table tabulate_oil(const oil<double>& o, const std::vector<double>& t_k, const viscosity_limits& limits,
                                int iso_grade = 0);

/// A pressure sweep of a piston pump at one speed, temperature and displacement.
struct pump_sweep {
  double from_pa = 0;                          ///< first outlet pressure (gauge), Pa
  double to_pa = 0;                            ///< last outlet pressure (inclusive), Pa
  double step_pa = 0;                          ///< pressure step, Pa
  double case_pa = 0;                          ///< case pressure (gauge), Pa
  double speed_rev_s = 0;                      ///< rev/s
  double displacement_fraction = 1;            ///< 0..1
  double temperature_k = 0;                    ///< oil temperature, K
  double inlet_pa = 0;                         ///< inlet gauge pressure of every point, Pa (compression, cross-port)
  double film_temperature_rise_k = 0;          ///< film above bulk temperature of every point, K (film-viscosity total)
  bool with_reference = false;                 ///< also evaluate `reference`
  pump_operating_point<double> reference{};    ///< e.g. the health reference state (its own inlet_pa and film rise)
  /// standard uncertainty of each pump_gap, m (>= 0; all 0: no share uncertainty at the reference)
  double u_gap_m[pump_gap_count] = {0, 0, 0, 0};
};

/// One pressure of a sweep.
struct pump_sweep_point {
  double outlet_pa = 0;                     ///< outlet pressure, Pa
  leakage_budget<double> budget{};          ///< flow of every path, shares, total (isoviscous and film viscosity)
  budget_sensitivity<double> sensitivity{}; ///< elasticities and derivatives to each gap
  pump_flow_loss<double> flow_loss{};       ///< the test stand's flow loss: drain and what never reaches the case
};

/// What the sweep evaluates at its reference operating point (with_reference).
struct pump_sweep_reference {
  leakage_budget<double> budget{};           ///< the budget: isoviscous and film-viscosity totals (the viscosity band)
  pump_flow_loss<double> flow_loss{};        ///< the flow loss split
  leakage_budget<double> deadhead{};         ///< the budget compensating at zero stroke (controller_mode::deadhead)
  pump_balance<double> balance_full{};       ///< force balance at full stroke and the reference pressure difference
  pump_balance<double> balance_zero{};       ///< the same at zero stroke
  bool with_uncertainty = false;             ///< a gap uncertainty was given
  budget_uncertainty<double> uncertainty{};  ///< shares with their uncertainty from u_gap_m (when with_uncertainty)
};

/// A sweep's results.
struct [[nodiscard]] pump_sweep_result {
  status st = status::ok;                   ///< ok, a report of some point (worst), or the first error
  std::size_t failed_point = static_cast<std::size_t>(-1);  ///< the pressure that failed (on an error)
  std::vector<pump_sweep_point> points;     ///< one per pressure
  double max_gap_reynolds = 0;              ///< largest gap Reynolds number of the sweep
  leakage_budget<double> reference{};       ///< the budget at the reference (when asked for; = at_reference.budget)
  pump_sweep_reference at_reference{};      ///< everything at the reference (when asked for; each part has its status)
  /// @return true when the status is exactly ok.
  bool ok() const noexcept { return st == status::ok; }
  /// @return true when the points are usable (ok or a report such as regime).
  bool usable() const noexcept { return is_usable(st); }
};

/// The leakage budget and its gap sensitivities over a pressure sweep (at most 1001 pressures).
/// @param p the pump (validate_piston_pump() it first)
/// @param o the oil
/// @param s the sweep
/// Every point also gets piston_pump_flow_loss(); with `with_reference` the reference gets its
/// budget, flow loss, deadhead budget, balance at full and zero stroke (pressure difference
/// outlet - case) and, when a gap uncertainty is given, piston_pump_budget_uncertainty().
/// @return the results; status::domain for a sweep that is not step > 0, to > from > case
///         pressure and at most 1000 steps; the reference's parts carry their own statuses
///         (the sweep's status is the points')
/// @par Source
/// piston_pump_budget(), piston_pump_sensitivity(), piston_pump_flow_loss(), piston_pump_balance(),
/// piston_pump_budget_uncertainty() (docs/pages/theory_pump.md).
PUMPLOSS_CXX_API pump_sweep_result sweep_piston_pump(const piston_pump<double>& p, const oil<double>& o, const pump_sweep& s);

/// A case drain line to check: the line, the oil, the drain flow and the limits, the temperature
/// grid, and what else to work out.
struct drain_line_case {
  line<double> drain_line;               ///< from the case port to the tank (pipes, fittings, components, height)
  oil<double> fluid;                     ///< the oil
  drain_flow<double> flow;               ///< drain flow over temperature, with an optional destroke peak
  drain_limits<double> limits{};         ///< tank pressure, allowed continuous and peak case pressures, Pa
  double t_cold_k = 0;                   ///< coldest (start) temperature, K
  double t_max_k = 0;                    ///< hottest temperature, K, >= t_cold_k
  int n_temps = 0;                       ///< temperatures checked, 1 to 1000 (start and sizing use at least 2)
  double max_start_viscosity_m2_s = 0;   ///< the maker's largest start viscosity, m^2/s (0: none)
  bool size = false;                     ///< also size the line from standard_bores
  double max_velocity_m_s = recommended_velocity(line_service::drain).max_m_s;  ///< sizing: largest velocity, m/s
  int sizing_kinds = 3;                  ///< sizing: 1 tubes, 2 hoses, 3 both
};

/// The drop of one element in the element table of a drain line check.
struct drain_element_drop {
  double dp_pa = 0;          ///< pressure drop, Pa
  double share = 0;          ///< dp over the line's total drop (0 when the total is not positive)
  status st = status::ok;    ///< the element's status (regime: a method outside its range)
  bool constant_k_laminar = false;  ///< a constant-K fitting used below its turbulent range (status regime)
};

/// Everything a drain line report shows.
struct [[nodiscard]] drain_line_result {
  status st = status::ok;                      ///< the check's status (worst report), or its error
  drain_summary<double> summary{};             ///< verdict, margins and failing ranges
  std::vector<drain_point<double>> points;     ///< one per temperature
  double q_min_m3_s = 0;                       ///< smallest continuous drain flow of the points, m^3/s
  double q_max_m3_s = 0;                       ///< largest continuous drain flow of the points, m^3/s
  std::vector<double> pipe_velocity_m_s;       ///< mean velocity in each pipe (line order) at q_max, m/s
  drain_start<double> start{};                 ///< lowest start temperature (its own status)
  double element_t_k = 0;                      ///< temperature of the element table (t_cold), K
  double element_q_m3_s = 0;                   ///< flow of the element table (continuous + peak at t_cold), m^3/s
  std::vector<drain_element_drop> elements;    ///< one per line element, line order
  double dp_static_pa = 0;                     ///< static part rho g dz of the element table, Pa
  double dp_total_pa = 0;                      ///< total drop of the element table, Pa
  status elements_st = status::ok;             ///< status of the element table
  bool sized = false;                          ///< sizing was asked for
  drain_sizing<double> sizing{};               ///< the sizing (its own status; out_of_validity: no bore passes)
  std::vector<drain_point<double>> sized_points;  ///< the check with the chosen bore (when one passes)
  /// every fixed element (static height first, then each component) taken alone, when no bore
  /// can pass (sizing.fixed_exceeds); those with `exceeds` each alone exceed a limit
  std::vector<drain_fixed_element<double>> fixed_alone;
  /// @return true when the status is exactly ok.
  bool ok() const noexcept { return st == status::ok; }
  /// @return true when the results are usable (ok or a report such as regime).
  bool usable() const noexcept { return is_usable(st); }
};

/// The case drain line check behind `pumploss drain-line`, in one call: drain_check() over the
/// temperature grid, the drop of each element at the coldest temperature and the continuous
/// plus peak flow there, the mean velocity of each pipe at the largest continuous flow,
/// drain_start_temperature(), and on request size_drain_line() with the check at the chosen bore,
/// or, when no bore can pass, drain_fixed_alone() for every fixed element.
/// @param c the line, oil, flow, limits, grid and options (SI)
/// @return the tables; st is the check's status: on an error (status::domain for n_temps
///         outside 1 to 1000, a line without elements, a temperature range upside down;
///         status::nonfinite for a NaN temperature or limit, also a destroke peak without a
///         finite peak limit; oil, flow and line errors) only st is set. The start and the
///         sizing carry their own statuses (the sizing status::out_of_validity when no bore
///         passes; then fixed_alone says which fixed elements alone exceed a limit).
/// @par Validity
/// As drain_check(), drain_start_temperature() and size_drain_line(). Engineering estimate: the
/// maker's case pressure limits and instructions govern; never block, cap or valve a case drain.
/// @par Source
/// drain_check(), line_pressure_drop(), drain_start_temperature() (ASTM D341-20 inverse),
/// size_drain_line(), drain_fixed_alone(); @ref theory_friction.
PUMPLOSS_CXX_API drain_line_result check_drain_line(const drain_line_case& c);

}  // namespace pumploss

#endif
