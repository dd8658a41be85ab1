#include "inputs.hpp"

#include <fmt/format.h>

#include "pumploss/drain_check.hpp"
#include "pumploss/line.hpp"

#include <algorithm>
#include <cmath>
#include <tuple>
#include <stdexcept>

namespace plcli {

using D = pumploss::dimension;

namespace {

constexpr double kPi = 3.14159265358979323846;

// Read a required positive quantity.
double positive(section& s, const std::string& key, D dim) {
  const double v = s.quantity(key, dim);
  if (!(v > 0)) throw s.error(key, "must be above zero");
  return v;
}

double non_negative(section& s, const std::string& key, D dim) {
  const double v = s.quantity(key, dim);
  if (!(v >= 0)) throw s.error(key, "must not be negative");
  return v;
}

temperature_range read_range(section& t) {
  temperature_range r;
  r.from_k = t.quantity("from", D::temperature);
  r.to_k = t.quantity("to", D::temperature);
  r.step_k = t.temperature_step("step");
  if (!(r.to_k >= r.from_k)) throw t.error("to", "must not lie below 'from'");
  if ((r.to_k - r.from_k) / r.step_k > 1000) throw t.error("step", "gives more than 1000 temperatures");
  t.finish();
  return r;
}

oil_spec read_oil_table(section& o) {
  std::optional<int> grade;
  if (const auto g = o.integer_opt("grade")) {
    if (!pumploss::iso_vg(static_cast<int>(*g)).usable())
      throw o.error("grade", "is not an ISO 3448 grade (2, 3, 5, 7, 10, 15, 22, 32, 46, 68, 100, 150, 220, 320, "
                             "460, 680, 1000, 1500)");
    grade = static_cast<int>(*g);
  }
  std::vector<std::pair<double, double>> points;
  if (o.has("point") && o.has("points")) throw o.error("points", "give either 'point' or 'points', not both");
  if (o.has("point")) points.push_back(o.quantity_pair("point", D::temperature, D::kinematic_viscosity));
  if (o.has("points")) points = o.pair_list("points", D::temperature, D::kinematic_viscosity);
  oil_spec spec;
  try {
    spec = make_oil(grade, points);
  } catch (const std::invalid_argument& e) {
    throw o.error(o.has("points") ? "points" : (o.has("point") ? "point" : "grade"), e.what());
  }
  spec.file = o.file();
  if (const auto n = o.text_opt("name")) spec.name = *n;
  auto take = [&](const char* key, D dim, double& field, const char* what) {
    if (const auto v = o.quantity_opt(key, dim)) {
      if (!(*v > 0)) throw o.error(key, "must be above zero");
      field = *v;
      for (auto it = spec.assumed.begin(); it != spec.assumed.end(); ++it)
        if (*it == what) {
          spec.assumed.erase(it);
          break;
        }
    }
  };
  take("density", D::density, spec.props.rho_ref_kg_m3, "density");
  if (const auto t = o.quantity_opt("density_temperature", D::temperature)) spec.props.t_ref_k = *t;
  take("bulk_modulus", D::pressure, spec.props.bulk_modulus_pa, "bulk modulus");
  take("specific_heat", D::specific_heat, spec.props.cp_j_kg_k, "specific heat");
  if (const auto a = o.number_opt("expansion_per_K")) {
    if (!(*a >= 0 && *a < 0.01)) throw o.error("expansion_per_K", "must lie between 0 and 0.01 per K");
    spec.props.alpha_per_k = *a;
    spec.assumed.erase(std::remove(spec.assumed.begin(), spec.assumed.end(), "expansion coefficient"),
                       spec.assumed.end());
  }
  if (const auto a = o.number_opt("pressure_viscosity_per_Pa")) {
    if (!(*a >= 0 && *a < 1e-7)) throw o.error("pressure_viscosity_per_Pa", "must lie between 0 and 1e-7 per Pa");
    spec.props.barus_per_pa = *a;
    spec.assumed.erase(
        std::remove(spec.assumed.begin(), spec.assumed.end(), "pressure-viscosity coefficient"),
        spec.assumed.end());
  }
  o.finish();
  return spec;
}

pumploss::instrument_limits read_instrument(section& parent, const char* key, D dim) {
  pumploss::instrument_limits ins;
  auto s = parent.table(key);
  if (const auto p = s.number_opt("reading_percent")) {
    if (!(*p >= 0 && *p < 50)) throw s.error("reading_percent", "must lie between 0 and 50");
    ins.reading_fraction = *p / 100.0;
  }
  if (s.has("absolute")) {
    ins.absolute = dim == D::temperature ? s.temperature_step("absolute") : non_negative(s, "absolute", dim);
  }
  ins.rectangular = s.choice("kind", {"limits", "standard"}, "limits") == "limits";
  if (ins.reading_fraction == 0 && ins.absolute == 0)
    throw s.error_here("give 'reading_percent' and/or 'absolute' for the " + std::string(key) + " instrument");
  s.finish();
  return ins;
}

std::pair<double, double> range_pair(section& s, const std::string& key, D dim) {
  const auto v = s.quantity_list(key, dim);
  if (v.size() != 2 || !(v[1] > v[0]) || !(v[0] >= 0))
    throw s.error(key, "must be [low, high] with 0 <= low < high");
  return {v[0], v[1]};
}

}  // namespace

std::vector<double> temperature_range::values() const {
  std::vector<double> out;
  for (int k = 0;; ++k) {
    const double t = from_k + k * step_k;
    if (t > to_k + 1e-9) break;
    out.push_back(t);
  }
  return out;
}

oil_spec make_oil(std::optional<int> grade, const std::vector<std::pair<double, double>>& points_in) {
  auto points = points_in;
  if (points.size() > 2) throw std::invalid_argument("give at most two viscosity points");
  if (grade && points.size() == 1) {
    const auto g = pumploss::iso_vg(*grade);
    points.insert(points.begin(), {313.15, g.value.mid_m2_s});
  }
  if (points.size() != 2)
    throw std::invalid_argument(
        "the oil needs two viscosity points (ISO VG grade plus one point, e.g. at 100 degC, or two points)");
  const auto line = pumploss::d341_fit(points[0].first, points[0].second, points[1].first, points[1].second);
  if (!line.usable())
    throw std::invalid_argument(std::string("these viscosity points give no ASTM D341 line: ") +
                                pumploss::status_message(static_cast<int>(line.st)) +
                                " (viscosity must fall as temperature rises)");
  oil_spec o;
  o.grade = grade;
  o.t1_k = points[0].first;
  o.nu1_m2_s = points[0].second;
  o.t2_k = points[1].first;
  o.nu2_m2_s = points[1].second;
  o.props = pumploss::typical_mineral_oil(line.value);
  o.assumed = {"density", "expansion coefficient", "bulk modulus", "specific heat", "pressure-viscosity coefficient"};
  o.name = grade ? "ISO VG " + std::to_string(*grade) + " oil" : "oil";
  return o;
}

oil_file read_oil_file(const std::string& path) {
  auto root = load_config(path);
  oil_file f;
  auto o = root.table("oil");
  f.oil = read_oil_table(o);
  if (auto t = root.table_opt("temperatures")) f.temperatures = read_range(*t);
  if (auto l = root.table_opt("limits")) {
    f.min_nu_m2_s = l->quantity_opt("min_viscosity", D::kinematic_viscosity);
    f.max_nu_m2_s = l->quantity_opt("max_viscosity", D::kinematic_viscosity);
    f.max_start_nu_m2_s = l->quantity_opt("max_start_viscosity", D::kinematic_viscosity);
    f.limits_source = l->text_opt("source").value_or("");
    if (f.min_nu_m2_s && f.max_nu_m2_s && !(*f.max_nu_m2_s > *f.min_nu_m2_s))
      throw l->error("max_viscosity", "must lie above min_viscosity");
    l->finish();
  }
  root.finish();
  return f;
}

oil_spec read_oil_ref(section& root) {
  if (root.is_text("oil")) {
    const std::string ref = root.text("oil");
    const std::string path = ref.size() > 0 && ref[0] == '/' ? ref : directory_of(root.file()) + ref;
    return read_oil_file(path).oil;
  }
  auto o = root.table("oil");
  return read_oil_table(o);
}

stand_setup read_stand_setup(const std::string& path) {
  using pumploss::displacement_choice;
  using pumploss::viscosity_temperature;
  auto root = load_config(path);
  stand_setup s;
  auto& r = s.run;
  s.oil = read_oil_ref(root);
  r.fluid = s.oil.props;
  if (auto j = root.table_opt("job")) {  // optional job details, reported as given (issue 16)
    const std::pair<const char*, const char*> keys[] = {
        {"customer", "Customer"},   {"serial", "Serial number"}, {"job_number", "Job number"},
        {"date", "Test date"},      {"operator", "Operator"},    {"stand", "Test stand"},
        {"instruments", "Instruments"}, {"oil", "Oil (as tested)"}};
    for (const auto& k : keys)
      if (const auto v = j->text_opt(k.first)) s.job.emplace_back(k.second, *v);
    j->finish();
  }
  auto m = root.table("machine");
  s.machine_name = m.text("name");
  r.kind = m.choice("kind", {"pump", "motor"}) == "pump" ? pumploss::machine::pump : pumploss::machine::motor;
  r.nominal_displacement_m3_rev = positive(m, "displacement", D::displacement);
  const auto vt = m.choice("viscosity_temperature", {"inlet", "outlet", "drain"}, "drain");
  r.viscosity_at = vt == "inlet" ? viscosity_temperature::inlet
                   : vt == "outlet" ? viscosity_temperature::outlet
                                    : viscosity_temperature::drain;
  const auto de = m.choice("displacement_for_efficiency", {"two-step", "intercept", "slope", "nominal"}, "two-step");
  r.displacement = de == "slope"       ? displacement_choice::slope
                   : de == "intercept" ? displacement_choice::intercept
                   : de == "nominal"   ? displacement_choice::nominal
                                       : displacement_choice::two_step;
  m.finish();
  if (auto fm = root.table_opt("flow_meter")) {
    r.meter_at_port = fm->choice("position", {"port", "return"}) == "port";
    if (!r.meter_at_port) {
      r.meter_pressure_pa = fm->quantity("pressure", D::pressure);
      if (!(r.meter_pressure_pa > -1e5 && r.meter_pressure_pa < 1e8))
        throw fm->error("pressure", "must be a gauge pressure between -1 bar and 1000 bar");
    }
    fm->finish();
  }
  auto ins = root.table("instruments");
  r.speed = read_instrument(ins, "speed", D::rotational_speed);
  r.pressure = read_instrument(ins, "pressure", D::pressure);
  r.flow = read_instrument(ins, "flow", D::volume_flow);
  r.torque = read_instrument(ins, "torque", D::torque);
  ins.finish();
  if (auto f = root.table_opt("fit")) {  // optional (issue 16): Wilson alone by default
    r.fit_schloesser = f->choice("model", {"wilson", "wilson+schloesser"}, "wilson") == "wilson+schloesser";
    f->finish();
  }
  if (auto ol = root.table_opt("outliers")) {  // optional: the outlier test and the user's exclusion list
    if (const auto t = ol->number_opt("threshold")) {
      if (!(*t > 1 && *t <= 1e6)) throw ol->error("threshold", "must lie above 1");
      r.outlier_threshold = *t;
    }
    r.exclude_outliers = ol->choice("rule", {"exclude", "flag"}, "exclude") == "exclude";
    for (const double row : ol->has("exclude_rows") ? ol->number_list("exclude_rows") : std::vector<double>{}) {  // 1-based data rows, as a spreadsheet shows them
      if (!(row >= 1 && row == std::floor(row) && row < 1e12))
        throw ol->error("exclude_rows", "each entry must be a data row number from 1");
      r.exclude_rows.push_back(static_cast<std::size_t>(row) - 1);
    }
    ol->finish();
  }
  for (auto& a : root.tables("acceptance")) {  // optional [[acceptance]] criteria
    pumploss::acceptance_criterion c;
    const std::string what = a.choice("quantity", {"volumetric", "hydromechanical", "overall", "drain_flow"});
    c.what = what == "volumetric"        ? pumploss::acceptance_quantity::eta_v
             : what == "hydromechanical" ? pumploss::acceptance_quantity::eta_hm
             : what == "overall"         ? pumploss::acceptance_quantity::eta_t
                                         : pumploss::acceptance_quantity::drain_flow;
    const bool drain = c.what == pumploss::acceptance_quantity::drain_flow;
    c.speed_rev_s = drain ? a.quantity_opt("speed", D::rotational_speed).value_or(0.0) : a.quantity("speed", D::rotational_speed);
    c.dp_pa = drain ? a.quantity_opt("pressure", D::pressure).value_or(0.0) : a.quantity("pressure", D::pressure);
    if (drain) {
      c.limit = a.quantity("max", D::volume_flow);
    } else {
      const double pct = a.number("min_percent");
      if (!(pct > 0 && pct <= 100)) throw a.error("min_percent", "must lie between 0 and 100 %");
      c.limit = pct / 100;
    }
    if (!(c.limit >= 0 && c.speed_rev_s >= 0 && c.dp_pa >= 0))
      throw a.error("quantity", "the limit, speed and pressure must not be negative");
    c.label = a.text_opt("label").value_or("");
    a.finish();
    r.acceptance.push_back(c);
  }
  // [map] optional (issue 16): every key defaults; the library takes the tested envelope and the
  // tested mean of the viscosity temperature, the contour levels come from the map itself
  if (auto map = root.table_opt("map")) {
    if (map->has("speeds"))
      std::tie(r.map_speed_lo_rev_s, r.map_speed_hi_rev_s) = range_pair(*map, "speeds", D::rotational_speed);
    if (map->has("pressures")) std::tie(r.map_dp_lo_pa, r.map_dp_hi_pa) = range_pair(*map, "pressures", D::pressure);
    if (const auto t = map->quantity_opt("temperature", D::temperature)) {
      if (!(*t > 0)) throw map->error("temperature", "must lie above absolute zero");
      r.map_temperature_k = *t;
    }
    for (const double p : map->has("levels_percent") ? map->number_list("levels_percent") : std::vector<double>{}) {
      if (!(p > 0 && p < 100)) throw map->error("levels_percent", "each level must lie between 0 and 100 %");
      s.map_levels.push_back(p / 100.0);
    }
    map->finish();
  }
  root.finish();
  return s;
}

drain_line_spec read_drain_line(const std::string& path) {
  auto root = load_config(path);
  drain_line_spec d;
  d.oil = read_oil_ref(root);
  auto c = root.table("case");
  d.pump_name = c.text("pump");
  d.max_case_pressure_pa = positive(c, "max_case_pressure", D::pressure);
  d.tank_pressure_pa = c.quantity_opt("tank_pressure", D::pressure).value_or(0.0);
  d.outlet_height_m = c.quantity_opt("outlet_height", D::length).value_or(0.0);
  d.max_peak_case_pressure_pa = c.quantity_opt("max_peak_case_pressure", D::pressure);
  d.max_start_viscosity_m2_s = c.quantity_opt("max_start_viscosity", D::kinematic_viscosity);
  if (d.max_start_viscosity_m2_s && !(*d.max_start_viscosity_m2_s > 0))
    throw c.error("max_start_viscosity", "must be above zero");
  if (d.max_start_viscosity_m2_s) {
    d.start_viscosity_source = "[case] of " + path;
  } else if (root.is_text("oil")) {  // the maker's limit from the oil file's [limits]
    const std::string ref = root.text("oil");
    const auto lim = read_oil_file(ref.size() > 0 && ref[0] == '/' ? ref : directory_of(root.file()) + ref);
    d.max_start_viscosity_m2_s = lim.max_start_nu_m2_s;
    d.start_viscosity_source = lim.limits_source.empty() ? ref : lim.limits_source;
  }
  c.finish();
  auto f = root.table("flow");
  // the drain flow over temperature: constant, laminar (scaled from a reference temperature),
  // a constant part plus a laminar part, or a table of (temperature, flow)
  d.flow_with_temperature = f.choice("with_temperature", {"constant", "laminar", "parts", "table"},
                                     f.has("table") ? "table" : (f.has("laminar_part") ? "parts" : "constant"));
  d.flow_reference_k = f.quantity_opt("reference_temperature", D::temperature);
  if (d.flow_with_temperature == "table") {
    d.flow_table = f.pair_list("table", D::temperature, D::volume_flow);
    if (d.flow_table.empty() || d.flow_table.size() > static_cast<std::size_t>(pumploss::drain_flow_max_points))
      throw f.error("table", "needs 1 to " + std::to_string(pumploss::drain_flow_max_points) + " points");
    for (std::size_t k = 0; k < d.flow_table.size(); ++k) {
      if (!(d.flow_table[k].second >= 0)) throw f.error("table", "drain flows must not be negative");
      if (k > 0 && !(d.flow_table[k].first > d.flow_table[k - 1].first))
        throw f.error("table", "temperatures must rise from point to point");
      d.drain_flow_m3_s = std::max(d.drain_flow_m3_s, d.flow_table[k].second);
    }
  } else if (d.flow_with_temperature == "parts") {
    d.flow_constant_m3_s = f.quantity_opt("constant_part", D::volume_flow).value_or(0.0);
    d.flow_laminar_m3_s = positive(f, "laminar_part", D::volume_flow);
    if (!(d.flow_constant_m3_s >= 0)) throw f.error("constant_part", "must not be negative");
    if (!d.flow_reference_k)
      throw f.error_here("laminar_part needs 'reference_temperature' (where the laminar part was taken)");
    d.drain_flow_m3_s = d.flow_constant_m3_s + d.flow_laminar_m3_s;
  } else {
    d.drain_flow_m3_s = positive(f, "drain_flow", D::volume_flow);
    if (d.flow_with_temperature == "laminar") {
      if (!d.flow_reference_k)
        throw f.error_here("with_temperature = \"laminar\" needs 'reference_temperature' (where drain_flow was taken)");
      d.flow_laminar_m3_s = d.drain_flow_m3_s;
    } else {
      d.flow_constant_m3_s = d.drain_flow_m3_s;
    }
  }
  f.finish();
  if (auto z = root.table_opt("destroke")) {
    d.peak_volume_m3 = positive(*z, "control_volume", D::volume);
    d.peak_time_s = z->number("dump_time_s");  // seconds (the unit tables have no time dimension)
    if (!(d.peak_time_s > 0)) throw z->error("dump_time_s", "must be above zero (seconds)");
    z->finish();
    if (!d.max_peak_case_pressure_pa)
      throw z->error_here("a destroke peak needs the maker's 'max_peak_case_pressure' in [case]");
  }
  auto t = root.table("temperatures");
  d.temperatures = read_range(t);
  // a fitting follows the segment it is nested in ([[segment.fitting]]) or names with 'after';
  // without its own inside_diameter it takes the bore of the element it follows
  auto read_fitting = [](section& s, std::size_t after) {
    line_fitting fit;
    fit.name = s.text("name");
    fit.after_segment = after;
    const int given = (s.has("type") ? 1 : 0) + (s.has("k") ? 1 : 0) + (s.has("two_k") ? 1 : 0);
    if (given != 1)
      throw s.error_here("give a fitting one of 'type' (a named kind, or \"exit\"), 'k' or 'two_k' = [K1, K_inf]");
    if (s.has("type")) {
      std::vector<const char*> kinds;
      for (const auto& fk : pumploss::fitting_table) kinds.push_back(fk.name);
      kinds.push_back("exit");
      const auto text = s.text("type");
      if (std::find(kinds.begin(), kinds.end(), text) == kinds.end()) {
        std::string list;
        for (const char* k : kinds) list += (list.empty() ? "" : ", ") + std::string(k);
        throw s.error("type", "unknown fitting kind '" + text + "'; known: " + list);
      }
      fit.type = text;
      fit.method = s.choice("method", {"darby", "hooper"}, "darby");
    } else if (s.has("k")) {
      fit.k = s.number("k");
      if (!(fit.k >= 0)) throw s.error("k", "must not be negative");
    } else {
      const auto v = s.number_list("two_k");
      if (v.size() != 2 || !(v[0] >= 0) || !(v[1] >= 0)) throw s.error("two_k", "must be [K1, K_inf], both >= 0");
      fit.k1 = v[0];
      fit.k_inf = v[1];
    }
    fit.count = s.integer_opt("count").value_or(1);
    if (fit.count < 1) throw s.error("count", "must be 1 or more");
    fit.inside_diameter_m = s.quantity_opt("inside_diameter", D::length).value_or(0.0);
    if (s.has("inside_diameter") && !(fit.inside_diameter_m > 0)) throw s.error("inside_diameter", "must be above zero");
    return fit;
  };
  for (auto& s : root.tables("segment")) {
    line_segment seg;
    seg.line = 0;
    seg.name = s.text("name");
    seg.kind = s.choice("kind", {"tube", "hose", "pipe"});
    seg.inside_diameter_m = positive(s, "inside_diameter", D::length);
    seg.length_m = positive(s, "length", D::length);
    seg.roughness_m = s.quantity_opt("roughness", D::length).value_or(seg.kind == "hose" ? 5e-6 : 1.5e-6);
    if (!(seg.roughness_m >= 0) || !(seg.roughness_m < seg.inside_diameter_m / 2))
      throw s.error("roughness", "must lie between 0 and half the inside diameter");
    for (auto& fs : s.tables("fitting")) {
      d.fittings.push_back(read_fitting(fs, d.segments.size()));
      fs.finish();
    }
    s.finish();
    d.segments.push_back(seg);
  }
  if (d.segments.empty()) throw root.error_here("the drain line needs at least one [[segment]]");
  for (auto& s : root.tables("fitting")) {
    // a top-level fitting names the segment it follows, unless the line has one segment only
    std::size_t after = d.segments.size() - 1;
    if (const auto name = s.text_opt("after")) {
      const auto it = std::find_if(d.segments.begin(), d.segments.end(),
                                   [&](const line_segment& g) { return g.name == *name; });
      if (it == d.segments.end()) throw s.error("after", "no [[segment]] is named '" + *name + "'");
      after = static_cast<std::size_t>(it - d.segments.begin());
    } else if (d.segments.size() > 1 && !s.has("inside_diameter")) {
      throw s.error_here("say which segment this fitting follows: after = \"<segment name>\", or write it as "
                         "[[segment.fitting]] under that segment (it takes that segment's bore)");
    }
    d.fittings.push_back(read_fitting(s, after));
    s.finish();
  }
  for (auto& s : root.tables("component")) {
    line_component comp;
    comp.name = s.text("name");
    comp.curve = s.pair_list("curve", D::volume_flow, D::pressure);
    if (!comp.curve.empty() && comp.curve.front().first == 0.0) {
      // the curve runs through the origin anyway (pumploss::line_component_points)
      if (comp.curve.front().second != 0.0) throw s.error("curve", "at zero flow the pressure drop must be zero");
      comp.curve.erase(comp.curve.begin());
    }
    if (comp.curve.empty() || comp.curve.size() > static_cast<std::size_t>(pumploss::component_max_points))
      throw s.error("curve", "needs 1 to " + std::to_string(pumploss::component_max_points) +
                                 " points with a flow above zero");
    for (std::size_t k = 1; k < comp.curve.size(); ++k)
      if (!(comp.curve[k].first > comp.curve[k - 1].first) || !(comp.curve[k].second >= comp.curve[k - 1].second))
        throw s.error("curve", "flows must rise and pressure drops must not fall from point to point");
    comp.curve_nu_m2_s = positive(s, "curve_viscosity", D::kinematic_viscosity);
    comp.scaling = s.choice("scaling", {"laminar", "none"}, "laminar");
    s.finish();
    d.components.push_back(comp);
  }
  if (auto z = root.table_opt("sizing")) {
    const auto kinds = z->choice("kinds", {"tube", "hose", "tube+hose"}, "tube+hose");
    d.sizing_kinds = kinds == "tube" ? 1 : (kinds == "hose" ? 2 : 3);
    d.max_velocity_m_s = z->quantity_opt("max_velocity", D::velocity);
    if (d.max_velocity_m_s && !(*d.max_velocity_m_s > 0)) throw z->error("max_velocity", "must be above zero");
    z->finish();
  }
  root.finish();
  return d;
}

double pump_spec::geometric_displacement_m3_rev() const {
  return pumploss::piston_pump_displacement(geometry).value;
}

namespace {
// [geometry] of a pump file (only the budget and diagnosis need it).
void read_pump_geometry(section& root, section& pu, pump_spec& p, long z) {
  auto& q = p.geometry;
  q.pistons = static_cast<int>(z);
  q.stated_displacement_m3_rev = p.max_displacement_m3_rev;
  auto g = root.table("geometry");
  q.piston_diameter_m = positive(g, "piston_diameter", D::length);
  q.bore_clearance_m = positive(g, "bore_clearance", D::length);
  q.engaged_length_min_m = positive(g, "engaged_length_min", D::length);
  q.pitch_radius_m = positive(g, "pitch_radius", D::length);
  const double beta = g.number("max_swash_angle_deg");
  if (!(beta > 0 && beta < 25)) throw g.error("max_swash_angle_deg", "must lie between 0 and 25 degrees");
  q.max_swash_angle_rad = beta * kPi / 180;
  if (const auto e = g.number_opt("piston_eccentricity")) {
    if (!(*e >= 0 && *e <= 1)) throw g.error("piston_eccentricity", "must lie between 0 (centred) and 1");
    q.piston_eccentricity = *e;
  }
  if (const auto h = g.number_opt("high_pressure_share")) {
    if (!(*h > 0 && *h <= 1)) throw g.error("high_pressure_share", "must lie above 0 and at most 1");
    q.high_pressure_share = *h;
  }
  q.pivot_offset_m = g.quantity_opt("pivot_offset", D::length).value_or(0.0);
  q.dead_volume_m3 = g.quantity_opt("dead_volume", D::volume).value_or(0.0);
  if (!(std::fabs(q.pivot_offset_m) < q.pitch_radius_m))
    throw g.error("pivot_offset", "must lie inside the pitch circle (|e| < pitch radius)");
  if (!(q.dead_volume_m3 >= 0)) throw g.error("dead_volume", "must not be negative");
  if (!(2 * q.pitch_radius_m * std::sin(kPi / static_cast<double>(z)) > q.piston_diameter_m + 2 * q.bore_clearance_m))
    throw g.error("piston_diameter", "the bores do not fit side by side on the pitch circle");
  if (auto sl = g.table_opt("slipper")) {
    q.slipper_pocket_radius_m = positive(*sl, "inner_radius", D::length);
    q.slipper_outer_radius_m = positive(*sl, "outer_radius", D::length);
    if (!(q.slipper_outer_radius_m > q.slipper_pocket_radius_m))
      throw sl->error("outer_radius", "must lie above inner_radius");
    q.slipper_gap_m = positive(*sl, "gap", D::length);
    q.slipper_feed_diameter_m = positive(*sl, "feed_orifice_diameter", D::length);
    q.slipper_feed_length_m = positive(*sl, "feed_orifice_length", D::length);
    sl->finish();
  }
  if (auto b = g.table_opt("ball")) {
    q.ball_diameter_m = positive(*b, "diameter", D::length);
    q.ball_clearance_m = positive(*b, "clearance", D::length);
    q.ball_length_m = positive(*b, "length", D::length);
    b->finish();
  }
  if (auto vp = g.table_opt("valve_plate")) {
    const auto inner = vp->quantity_list("inner_land", D::length);
    const auto outer = vp->quantity_list("outer_land", D::length);
    if (inner.size() != 2 || !(inner[1] > inner[0]) || !(inner[0] > 0))
      throw vp->error("inner_land", "must be [inner radius, outer radius] of the land, rising");
    if (outer.size() != 2 || !(outer[1] > outer[0]) || !(outer[0] > inner[1]))
      throw vp->error("outer_land", "must be [inner radius, outer radius], outside the inner land");
    q.valve_inner_land_inner_radius_m = inner[0];
    q.valve_inner_land_outer_radius_m = inner[1];
    q.valve_outer_land_inner_radius_m = outer[0];
    q.valve_outer_land_outer_radius_m = outer[1];
    const double arc = vp->number("arc_deg");
    if (!(arc > 0 && arc < 180)) throw vp->error("arc_deg", "must lie between 0 and 180 degrees");
    q.valve_kidney_arc_rad = arc * kPi / 180;
    q.valve_gap_m = positive(*vp, "gap", D::length);
    q.barrel_spring_force_n = vp->quantity_opt("barrel_spring_force", D::force).value_or(0.0);
    if (!(q.barrel_spring_force_n >= 0)) throw vp->error("barrel_spring_force", "must not be negative");
    vp->finish();
  }
  if (auto cp = g.table_opt("cross_port")) {  // a parallel-plate path between the kidneys: k = w h^3 / (12 l)
    const double h = positive(*cp, "gap", D::length), w = positive(*cp, "width", D::length);
    q.cross_port_conductance_m3 = w * h * h * h / (12 * positive(*cp, "length", D::length));
    cp->finish();
  }
  if (auto ct = g.table_opt("controller")) {
    q.controller_flow_m3_s = non_negative(*ct, "consumption", D::volume_flow);
    q.bleed_orifice_diameter_m = ct->quantity_opt("bleed_orifice_diameter", D::length).value_or(0.0);
    if (!(q.bleed_orifice_diameter_m >= 0)) throw ct->error("bleed_orifice_diameter", "must not be negative");
    if (const auto cd = ct->number_opt("bleed_cd")) {
      if (!(*cd > 0 && *cd <= 1)) throw ct->error("bleed_cd", "must lie above 0 and at most 1");
      q.bleed_cd = *cd;
    }
    q.control_pressure_pa = ct->quantity_opt("control_pressure", D::pressure).value_or(0.0);
    if (!(q.control_pressure_pa >= 0)) throw ct->error("control_pressure", "must not be negative");
    if (const auto cd = ct->quantity_opt("control_piston_diameter", D::length)) {
      // narrow concentric annulus: k = pi d h^3 / (12 l)
      const double h = positive(*ct, "control_piston_clearance", D::length);
      q.control_piston_conductance_m3 = kPi * *cd * h * h * h / (12 * positive(*ct, "control_piston_length", D::length));
    }
    ct->finish();
  }
  g.finish();
  const auto check = pumploss::validate_piston_pump(q);
  if (pumploss::is_error(check.st))
    throw g.error_here(std::string("the geometry is not a possible pump: ") +
                       pumploss::status_message(static_cast<int>(check.st)));
  if (check.st == pumploss::status::implausible)
    throw pu.error("max_displacement", "differs by more than 5 % from the geometry (" +
                                           std::to_string(check.displacement_m3_rev * 1e6).substr(0, 6) +
                                           " cm3/rev)");

  if (!(p.controller_consumption_m3_s >= 0)) p.controller_consumption_m3_s = q.controller_flow_m3_s;
}

// ---- baseline file (issue 16): drain over pressure per speed from a test-stand run
// The baseline file named by [health] baseline_file (relative to the pump file): its set points
// become the baseline readings that health fits the constant and laminar parts to.
void read_baseline_file(section& h, pump_spec& p) {
  const std::string ref = h.text("baseline_file");
  const std::string path = ref.size() > 0 && ref[0] == '/' ? ref : directory_of(h.file()) + ref;
  auto root = load_config(path);
  const auto oil = read_oil_ref(root);
  auto b = root.table("baseline");
  const double v = b.quantity("displacement", D::displacement);
  if (!(std::fabs(v / p.max_displacement_m3_rev - 1) <= 0.05))
    throw b.error("displacement", "differs by more than 5 % from the pump file's max_displacement: another pump?");
  // the viscosity at the reference temperature from both oils: the baseline must be of this oil
  const auto nu_pump = pumploss::d341_viscosity(p.oil.props.viscosity, p.reference_temperature_k);
  const auto nu_base = pumploss::d341_viscosity(oil.props.viscosity, p.reference_temperature_k);
  if (!(std::fabs(nu_base.value / nu_pump.value - 1) <= 0.05))
    throw input_error(path, 0, 0, "the oil of the baseline differs by more than 5 % in viscosity at the reference "
                                  "temperature from the pump file's oil: the baseline was taken with another oil");
  p.fit_pressures_pa = b.quantity_list("outlet_pressures", D::pressure);
  p.fit_case_pa = b.quantity_list("case_pressures", D::pressure);
  p.fit_drain_m3_s = b.quantity_list("drain_flows", D::volume_flow);
  const auto speeds = b.quantity_list("speeds", D::rotational_speed);
  const auto inlet = b.quantity_list("inlet_temperatures", D::temperature);
  const bool has_drain_t = b.has("drain_temperatures");
  const auto drain_t = has_drain_t ? b.quantity_list("drain_temperatures", D::temperature) : std::vector<double>{};
  if (p.clearance_from_drain && !has_drain_t)
    throw b.error_here("clearance_temperature = \"drain\" needs drain_temperatures in the baseline file");
  p.fit_temperatures_k = p.clearance_from_drain ? drain_t : inlet;
  const std::size_t n = p.fit_pressures_pa.size();
  if (n < 2 || p.fit_case_pa.size() != n || p.fit_drain_m3_s.size() != n || speeds.size() != n || inlet.size() != n ||
      (has_drain_t && drain_t.size() != n))
    throw b.error("outlet_pressures", "needs two or more set points, every list of the same length");
  (void)b.text_opt("pump");  // for people: what and where from
  (void)b.text_opt("source");
  b.finish();
  root.finish();
  p.baseline_file = path;
}

// [health] of a pump file: baseline, reference state, bands.
void read_pump_health(section& root, pump_spec& p) {
  auto h = root.table("health");
  // the constant part: [health] constant_drain_flow, else [pump] controller_consumption or the
  // geometry's controller consumption, else zero
  if (const auto c = h.quantity_opt("constant_drain_flow", D::volume_flow)) {
    if (!(*c >= 0)) throw h.error("constant_drain_flow", "must not be negative");
    p.controller_consumption_m3_s = *c;
  }
  if (!(p.controller_consumption_m3_s >= 0)) p.controller_consumption_m3_s = 0.0;
  p.baseline_drain_m3_s = h.quantity_opt("baseline_drain_flow", D::volume_flow).value_or(0.0);
  const bool from_file = h.has("baseline_file");  // written by test-stand (issue 16)
  if (from_file && (h.has("baseline_fit_pressures") || h.has("baseline_drain_flow")))
    throw h.error("baseline_file", "give either baseline_file or baseline_drain_flow / baseline_fit_*, not both");
  if (from_file) {
  } else if (h.has("baseline_fit_pressures")) {
    p.fit_pressures_pa = h.quantity_list("baseline_fit_pressures", D::pressure);
    p.fit_temperatures_k = h.quantity_list("baseline_fit_temperatures", D::temperature);
    p.fit_drain_m3_s = h.quantity_list("baseline_fit_drain_flows", D::volume_flow);
    if (p.fit_pressures_pa.size() < 2 || p.fit_temperatures_k.size() != p.fit_pressures_pa.size() ||
        p.fit_drain_m3_s.size() != p.fit_pressures_pa.size())
      throw h.error("baseline_fit_pressures", "needs two or more readings: pressures, temperatures and drain flows "
                                              "of the same length");
  } else if (!(p.baseline_drain_m3_s > 0)) {
    throw h.error("baseline_drain_flow", "is needed (or baseline_fit_pressures, _temperatures, _drain_flows to fit it)");
  }
  if (h.has("baseline_drain_rise")) p.baseline_rise_k = h.temperature_step("baseline_drain_rise");
  p.baseline_deadhead = h.choice("baseline_state", {"on stroke", "deadhead"}, "on stroke") == "deadhead";
  p.reference_dp_pa = positive(h, "reference_pressure", D::pressure);
  p.reference_temperature_k = h.quantity("reference_temperature", D::temperature);
  p.reference_speed_rev_s = positive(h, "reference_speed", D::rotational_speed);
  for (const double v : h.number_list("drain_fraction_bands_percent")) p.fraction_bands.push_back(v / 100);
  for (const double v : h.number_list("growth_bands_percent")) p.growth_bands.push_back(v / 100);
  if (p.fraction_bands.size() != 3 || !(p.fraction_bands[0] > 0) || !(p.fraction_bands[1] > p.fraction_bands[0]) ||
      !(p.fraction_bands[2] > p.fraction_bands[1]) || !(p.fraction_bands[2] < 1))
    throw h.error("drain_fraction_bands_percent",
                  "needs three rising values between 0 and 100 (upper edges of sound and acceptable, lower edge of "
                  "worn)");
  if (p.growth_bands.size() != 2 || !(p.growth_bands[0] > 0) || !(p.growth_bands[1] > p.growth_bands[0]))
    throw h.error("growth_bands_percent", "needs two rising values above zero (moderate and large growth)");
  if (const auto m = h.number_opt("hot_margin")) {
    if (!(*m > 0)) throw h.error("hot_margin", "must be above zero");
    p.hot_margin = *m;
  }
  if (const auto m = h.number_opt("hot_baseline_factor")) {
    if (!(*m > 0)) throw h.error("hot_baseline_factor", "must be above zero");
    p.hot_baseline_factor = *m;
  }
  p.clearance_from_drain = h.choice("clearance_temperature", {"oil", "drain"}, "oil") == "drain";
  p.bands_source = h.text("bands_source");
  if (from_file) read_baseline_file(h, p);
  h.finish();
}
}  // namespace

pump_spec read_pump(const std::string& path) {
  auto root = load_config(path);
  pump_spec p;
  p.oil = read_oil_ref(root);
  auto pu = root.table("pump");
  p.name = pu.text("name");
  // health needs no geometry: a pump file may stop at [pump] and [health] (pistons then optional)
  p.has_geometry = root.has("geometry");
  const long z = p.has_geometry ? pu.integer("pistons") : pu.integer_opt("pistons").value_or(9);
  if (z < 3 || z > 15) throw pu.error("pistons", "must lie between 3 and 15");
  p.max_displacement_m3_rev = positive(pu, "max_displacement", D::displacement);
  p.rated_speed_rev_s = positive(pu, "rated_speed", D::rotational_speed);
  p.max_pressure_pa = positive(pu, "max_pressure", D::pressure);

  if (const auto c = pu.quantity_opt("controller_consumption", D::volume_flow)) {
    if (!(*c >= 0)) throw pu.error("controller_consumption", "must not be negative");
    p.controller_consumption_m3_s = *c;
  }
  pu.finish();
  if (p.has_geometry) read_pump_geometry(root, pu, p, z);
  read_pump_health(root, p);
  if (!root.has("sweep")) {
    root.finish();
    return p;
  }

  auto sw = root.table("sweep");
  p.sweep_from_pa = positive(sw, "from", D::pressure);
  p.sweep_to_pa = positive(sw, "to", D::pressure);
  p.sweep_step_pa = positive(sw, "step", D::pressure);
  if (!(p.sweep_to_pa > p.sweep_from_pa)) throw sw.error("to", "must lie above 'from'");
  if ((p.sweep_to_pa - p.sweep_from_pa) / p.sweep_step_pa > 1000) throw sw.error("step", "gives more than 1000 points");
  p.sweep_speed_rev_s = positive(sw, "speed", D::rotational_speed);
  p.sweep_case_pa = sw.quantity_opt("case_pressure", D::pressure).value_or(0.0);
  if (!(p.sweep_case_pa < p.sweep_from_pa)) throw sw.error("case_pressure", "must lie below the sweep's first pressure");
  p.sweep_temperature_k = sw.quantity("temperature", D::temperature);
  p.sweep_displacement_fraction = sw.number_opt("displacement_fraction").value_or(1.0);
  if (!(p.sweep_displacement_fraction >= 0 && p.sweep_displacement_fraction <= 1))
    throw sw.error("displacement_fraction", "must lie between 0 and 1");
  p.sweep_inlet_pa = sw.quantity_opt("inlet_pressure", D::pressure).value_or(0.0);
  if (!(p.sweep_inlet_pa < p.sweep_from_pa)) throw sw.error("inlet_pressure", "must lie below the sweep's first pressure");
  p.sweep_film_rise_k = sw.has("film_temperature_rise") ? sw.temperature_step("film_temperature_rise") : 0.0;
  if (!(p.sweep_film_rise_k >= 0 && p.sweep_film_rise_k <= 50))
    throw sw.error("film_temperature_rise", "must lie between 0 and 50 K");
  if (sw.has("gap_tolerances")) {  // standard uncertainties: bore, slipper, ball, valve plate
    const auto t = sw.quantity_list("gap_tolerances", D::length);
    if (t.size() != 4) throw sw.error("gap_tolerances", "needs four lengths: bore, slipper, ball, valve plate");
    for (std::size_t k = 0; k < 4; ++k) {
      if (!(t[k] >= 0)) throw sw.error("gap_tolerances", "must not be negative");
      p.gap_tolerance[k] = t[k];
    }
  }
  sw.finish();
  root.finish();
  return p;
}

std::string baseline_file_text(const stand_setup& setup, const std::string& data_name,
                               const std::vector<pumploss::test_stand_row>& means, const pumploss::test_stand_result& res) {
  const std::size_t n = std::min(res.points.size(), means.size());
  const bool has_dt = n > 0 && !std::isnan(means[0].drain_temperature_k);
  std::string speeds, outs, cases, ins, drs, flows;
  auto add = [](std::string& list, double v, const char* unit) {
    list += fmt::format("{}\"{:.10g} {}\"", list.empty() ? "" : ", ", v, unit);
  };
  std::size_t used = 0;
  for (std::size_t i = 0; i < n; ++i) {
    if (res.points[i].excluded || i >= res.drain.size()) continue;
    ++used;
    const auto& m = means[i];
    add(speeds, res.points[i].speed_rev_s * 60, "rpm");
    add(outs, m.outlet_pressure_pa / 1e5, "bar");
    add(cases, std::isnan(m.case_pressure_pa) ? 0.0 : m.case_pressure_pa / 1e5, "bar");
    add(ins, m.inlet_temperature_k - 273.15, "degC");
    if (has_dt) add(drs, m.drain_temperature_k - 273.15, "degC");
    add(flows, res.drain[i].drain_flow_m3_s * 60000, "L/min");
  }
  const auto& oil = setup.oil;
  std::string s = fmt::format(
      "# pumploss baseline file: case drain flow over pressure per speed of a test-stand run ({} set points of {}).\n"
      "# Read by 'pumploss health' through [health] baseline_file = \"<this file>\" in the pump file.\n"
      "# Engineering estimates: never block, cap or valve a case drain; the pump maker's limits govern.\n\n"
      "[oil]\nname = \"{}\"\npoints = [[\"{:.10g} degC\", \"{:.10g} cSt\"], [\"{:.10g} degC\", \"{:.10g} cSt\"]]\n\n"
      "[baseline]\npump = \"{}\"\nsource = \"{}\"\ndisplacement = \"{:.10g} cm3/rev\"\n"
      "speeds = [{}]\noutlet_pressures = [{}]\ncase_pressures = [{}]\ninlet_temperatures = [{}]\n",
      used, data_name, oil.name, oil.t1_k - 273.15, oil.nu1_m2_s * 1e6, oil.t2_k - 273.15, oil.nu2_m2_s * 1e6,
      setup.machine_name, data_name, setup.run.nominal_displacement_m3_rev * 1e6, speeds, outs, cases, ins);
  if (has_dt) s += "drain_temperatures = [" + drs + "]\n";
  s += "drain_flows = [" + flows + "]\n";
  return s;
}

}  // namespace plcli
