// Tests of the pumploss command-line program, through its command line only: the built binary
// (path from CMake) runs on the demo files and on broken copies of them. Outputs are read back
// with the library's table reader and checked against values the test computes with the
// library itself, never against a stored copy of a report.
#include <gtest/gtest.h>

#include <algorithm>
#include <cmath>
#include <cstdio>
#include <cstdlib>
#include <cstring>
#include <filesystem>
#include <fstream>
#include <map>
#include <random>
#include <sstream>
#include <string>

#include "pumploss/pumploss.hpp"
#include "pumploss/table_reader.hpp"

namespace fs = std::filesystem;
using pumploss::column_kind;
using pumploss::dimension;

namespace {

const std::string kExe = PUMPLOSS_CLI_EXE;
const std::string kDemo = PUMPLOSS_DEMO_DIR;

// A fresh temporary folder, removed at the end of the test.
struct temp_dir {
  fs::path path;
  temp_dir() {
    std::random_device rd;
    path = fs::temp_directory_path() / ("pumploss_cli_test_" + std::to_string(rd()) + std::to_string(rd()));
    fs::create_directories(path);
  }
  ~temp_dir() {
    std::error_code ec;
    fs::remove_all(path, ec);
  }
  std::string operator/(const std::string& name) const { return (path / name).string(); }
};

std::string slurp(const std::string& p) {
  std::ifstream in(p, std::ios::binary);
  std::stringstream ss;
  ss << in.rdbuf();
  return ss.str();
}

void write_file(const std::string& p, const std::string& content) {
  std::ofstream out(p, std::ios::binary);
  out << content;
}

std::string quote(const std::string& s) {
  std::string q = "'";
  for (const char c : s) q += c == '\'' ? std::string("'\\''") : std::string(1, c);
  return q + "'";
}

struct run_result {
  int code;
  std::string out, err;
};

// Run the program with arguments (each quoted for the shell).
run_result run(const std::vector<std::string>& args, const temp_dir& tmp) {
  std::string cmd = quote(kExe);
  for (const auto& a : args) cmd += " " + quote(a);
  const std::string out = tmp / ".stdout", err = tmp / ".stderr";
  cmd += " >" + quote(out) + " 2>" + quote(err);
  const int status = std::system(cmd.c_str());
  const int code = WIFEXITED(status) ? WEXITSTATUS(status) : -1;
  return {code, slurp(out), slurp(err)};
}

double rel(double a, double b) { return std::fabs(a - b) / std::max(std::fabs(b), 1e-300); }

// The demo oil, built by the test from the library: 46 cSt at 40 degC (VG 46 mid-point) and
// 6.9 cSt at 100 degC, density 872 kg/m3 at 15 degC, other properties typical (as oil.toml).
pumploss::oil<double> demo_oil() {
  const auto line = pumploss::d341_fit(313.15, 46e-6, 373.15, 6.9e-6);
  EXPECT_TRUE(line.ok());
  auto oil = pumploss::typical_mineral_oil(line.value);
  oil.rho_ref_kg_m3 = 872.0;
  oil.t_ref_k = 288.15;
  return oil;
}

// A CSV read with the library's reader; a reading error fails the test.
pumploss::table_data read_csv(const std::string& path, const std::vector<pumploss::column_spec>& spec) {
  auto d = pumploss::read_table_file(path, spec);
  EXPECT_EQ(d.error.st, pumploss::status::ok) << path << ":" << d.error.line << ":" << d.error.column << ": "
                                              << d.error.message;
  return d;
}

// The columns of the demo's test-stand and field-reading files (docs/pages/cli.md).
std::vector<pumploss::column_spec> stand_columns() {
  return {{"speed", column_kind::quantity, dimension::rotational_speed, true},
          {"inlet pressure", column_kind::quantity, dimension::pressure, true},
          {"outlet pressure", column_kind::quantity, dimension::pressure, true},
          {"outlet flow", column_kind::quantity, dimension::volume_flow, false},
          {"inlet flow", column_kind::quantity, dimension::volume_flow, false},
          {"torque", column_kind::quantity, dimension::torque, true},
          {"drain flow", column_kind::quantity, dimension::volume_flow, true},
          {"inlet temperature", column_kind::quantity, dimension::temperature, true},
          {"outlet temperature", column_kind::quantity, dimension::temperature, false},
          {"drain temperature", column_kind::quantity, dimension::temperature, false},
          {"case pressure", column_kind::quantity, dimension::pressure, false},
          {"meter temperature", column_kind::quantity, dimension::temperature, false}};
}

std::vector<pumploss::column_spec> field_columns() {
  return {{"date", column_kind::date, dimension::pressure, true},
          {"outlet pressure", column_kind::quantity, dimension::pressure, true},
          {"oil temperature", column_kind::quantity, dimension::temperature, true},
          {"speed", column_kind::quantity, dimension::rotational_speed, true},
          {"drain flow", column_kind::quantity, dimension::volume_flow, true},
          {"drain temperature", column_kind::quantity, dimension::temperature, false},
          {"case pressure", column_kind::quantity, dimension::pressure, false},
          {"operating hours", column_kind::number, dimension::pressure, false},
          {"state", column_kind::text, dimension::pressure, false},
          {"event", column_kind::text, dimension::pressure, false},
          {"note", column_kind::text, dimension::pressure, false}};
}

std::vector<pumploss::column_spec> oil_csv_columns() {
  return {{"temperature", column_kind::quantity, dimension::temperature, true},
          {"kinematic viscosity", column_kind::quantity, dimension::kinematic_viscosity, true},
          {"dynamic viscosity", column_kind::quantity, dimension::dynamic_viscosity, true},
          {"density", column_kind::quantity, dimension::density, true},
          {"viscosity check", column_kind::text, dimension::pressure, false}};
}

bool has_cautions(const std::string& s) {
  return s.find("store energy") != std::string::npos && s.find("injection injury") != std::string::npos &&
         s.find("hot enough to burn") != std::string::npos && s.find("engineering estimates") != std::string::npos &&
         s.find("licensed engineering practice") != std::string::npos;
}

}  // namespace

// ------------------------------------------------------------------------------ units

TEST(CliUnits, ConversionMatchesLibrary) {
  temp_dir tmp;
  const auto r = run({"units", "250", "bar", "psi"}, tmp);
  ASSERT_EQ(r.code, 0) << r.err;
  double v = 0;
  ASSERT_EQ(std::sscanf(r.out.c_str(), "250 bar = %lf psi", &v), 1) << r.out;
  EXPECT_LT(rel(v, pumploss::convert(250.0, "bar", "psi").value), 1e-11);
  const auto t = run({"units", "-40", "degC", "degF"}, tmp);
  ASSERT_EQ(t.code, 0) << t.err;
  EXPECT_NE(t.out.find("= -40 degF"), std::string::npos) << t.out;
}

TEST(CliUnits, RejectsUnknownAndIncompatibleUnits) {
  temp_dir tmp;
  const auto a = run({"units", "1", "bar", "L/min"}, tmp);
  EXPECT_EQ(a.code, 1);
  EXPECT_NE(a.err.find("unit of pressure"), std::string::npos) << a.err;
  const auto b = run({"units", "1", "bars", "psi"}, tmp);
  EXPECT_EQ(b.code, 1);
  EXPECT_NE(b.err.find("unknown unit 'bars'"), std::string::npos) << b.err;
}

TEST(CliUnits, ListsEveryUnit) {
  temp_dir tmp;
  const auto r = run({"units", "--list"}, tmp);
  ASSERT_EQ(r.code, 0);
  for (int i = 0; i < pumploss::unit_count(); ++i)
    EXPECT_NE(r.out.find(pumploss::unit_at(i)->symbol), std::string::npos) << pumploss::unit_at(i)->symbol;
}

// ------------------------------------------------------------------------------ oil

TEST(CliOil, DemoReportMatchesLibrary) {
  temp_dir tmp;
  const std::string out = tmp / "out";
  const auto r = run({"oil", kDemo + "/oil.toml", "--out", out}, tmp);
  ASSERT_EQ(r.code, 0) << r.err;
  EXPECT_TRUE(has_cautions(r.out));
  EXPECT_TRUE(has_cautions(slurp(out + "/oil.txt")));
  ASSERT_TRUE(fs::exists(out + "/oil_viscosity.svg"));
  // The CSV reads back with the program's own reader (units in the header).
  const auto d = read_csv(out + "/oil_properties.csv", oil_csv_columns());
  const auto oil = demo_oil();
  ASSERT_EQ(d.rows(), 15u);  // 0 to 70 degC in 5 K steps
  for (std::size_t i = 0; i < d.rows(); ++i) {
    const double t = d.si("temperature")[i];
    EXPECT_NEAR(t, 273.15 + 5.0 * static_cast<double>(i), 1e-9);
    const double nu = pumploss::oil_kinematic_viscosity(oil, t).value;
    EXPECT_LT(rel(d.si("kinematic viscosity")[i], nu), 1e-9) << t;
    EXPECT_LT(rel(d.si("dynamic viscosity")[i], pumploss::oil_dynamic_viscosity(oil, t, 0.0).value), 1e-9) << t;
    EXPECT_LT(rel(d.si("density")[i], pumploss::oil_density_at(oil, t, 0.0).value), 1e-9) << t;
    // limits of oil.toml: 10 cSt min, 400 cSt running max, 1000 cSt at start
    const std::string expect = nu > 1000e-6 ? "TOO THICK to start"
                               : nu > 400e-6 ? "start only (above running max)"
                               : nu < 10e-6  ? "TOO THIN (below min)"
                                             : "ok";
    EXPECT_EQ(d.texts[d.find("viscosity check")][i], expect) << t;
  }
  // the cold start row really is above the running limit (so the check is exercised)
  EXPECT_GT(pumploss::oil_kinematic_viscosity(oil, 273.15).value, 400e-6);
}

TEST(CliOil, CommandLineOilInOtherUnits) {
  temp_dir tmp;
  const std::string out = tmp / "out";
  const auto r = run({"oil", "--grade", "46", "--point", "100 degC", "6.9 cSt", "--at", "32 degF", "--at", "122 degF",
                      "--unit", "degF", "--unit", "cP", "--unit", "g/cm3", "--out", out},
                     tmp);
  ASSERT_EQ(r.code, 0) << r.err;
  const std::string csv = slurp(out + "/oil_properties.csv");
  EXPECT_NE(csv.find("temperature [degF],kinematic viscosity [cSt],dynamic viscosity [cP],density [g/cm3]"),
            std::string::npos)
      << csv;
  const auto d = read_csv(out + "/oil_properties.csv", oil_csv_columns());
  ASSERT_EQ(d.rows(), 2u);
  const auto line = pumploss::d341_fit(313.15, 46e-6, 373.15, 6.9e-6).value;
  const auto oil = pumploss::typical_mineral_oil(line);  // no density given: typical 870 kg/m3
  const double t[2] = {273.15, 323.15};
  for (std::size_t i = 0; i < 2; ++i) {
    EXPECT_NEAR(d.si("temperature")[i], t[i], 1e-9);
    EXPECT_LT(rel(d.si("kinematic viscosity")[i], pumploss::oil_kinematic_viscosity(oil, t[i]).value), 1e-9);
    EXPECT_LT(rel(d.si("dynamic viscosity")[i], pumploss::oil_dynamic_viscosity(oil, t[i], 0.0).value), 1e-9);
  }
  EXPECT_NE(r.out.find("Typical values used for"), std::string::npos);
}

TEST(CliOil, BadCommandLineIsAUsageError) {
  temp_dir tmp;
  EXPECT_EQ(run({"oil", "--grade", "47", "--point", "100 degC", "6.9 cSt"}, tmp).code, 1);
  EXPECT_EQ(run({"oil", "--grade", "46"}, tmp).code, 1);  // one point is not enough
  const auto r = run({"oil", "--grade", "46", "--point", "100 degC", "6.9 bar"}, tmp);
  EXPECT_EQ(r.code, 1);
  EXPECT_NE(r.err.find("unit of pressure"), std::string::npos) << r.err;
  EXPECT_EQ(run({"oil", "--grade", "46", "--point", "100 degC", "6.9 cSt", "--unit", "furlong"}, tmp).code, 1);
}

// ------------------------------------------------------------------------------ reading outputs

namespace {

// A report CSV of the program: header names to columns of texts ('#' lines are the cautions).
struct out_csv {
  std::vector<std::string> head;
  std::vector<std::vector<std::string>> rows;
  std::size_t col(const std::string& name) const {
    for (std::size_t j = 0; j < head.size(); ++j)
      if (head[j] == name) return j;
    ADD_FAILURE() << "no column '" << name << "'";
    return 0;
  }
  double num(std::size_t row, const std::string& name) const { return std::stod(rows.at(row).at(col(name))); }
  const std::string& text(std::size_t row, const std::string& name) const { return rows.at(row).at(col(name)); }
};

std::vector<std::string> split_csv_line(const std::string& line) {
  std::vector<std::string> out(1);
  bool quoted = false;
  for (std::size_t i = 0; i < line.size(); ++i) {
    const char c = line[i];
    if (quoted) {
      if (c == '"' && i + 1 < line.size() && line[i + 1] == '"') {
        out.back() += '"';
        ++i;
      } else if (c == '"') {
        quoted = false;
      } else {
        out.back() += c;
      }
    } else if (c == '"') {
      quoted = true;
    } else if (c == ',') {
      out.emplace_back();
    } else {
      out.back() += c;
    }
  }
  return out;
}

out_csv read_out(const std::string& path) {
  out_csv t;
  std::stringstream in(slurp(path));
  std::string line;
  bool cautions = false;
  while (std::getline(in, line)) {
    if (!line.empty() && line[0] == '#') {
      cautions = true;
      continue;
    }
    if (t.head.empty()) t.head = split_csv_line(line);
    else t.rows.push_back(split_csv_line(line));
  }
  EXPECT_TRUE(cautions) << path << " has no cautions at its foot";
  return t;
}

std::string fmt_r2(double v) {
  char b[64];
  std::snprintf(b, sizeof b, "R^2 flow %.5f", v);
  return b;
}

double instrument_u(double pct, double abs_si, double x) {  // rectangular limits, as the demo setup
  return pumploss::standard_uncertainty(abs_si, pumploss::uncertainty_basis::absolute,
                                        pumploss::uncertainty_distribution::rectangular, x)
             .value +
         pumploss::standard_uncertainty(pct, pumploss::uncertainty_basis::percent_of_reading,
                                        pumploss::uncertainty_distribution::rectangular, x)
             .value;
}

}  // namespace

// ------------------------------------------------------------------------------ the demo, checked by the library

TEST(CliDemo, TestStandGridIsFiveSpeedsBySixPressures) {
  // The demo generator's grid, recovered by the reader (values converted from the header units).
  const auto d = read_csv(kDemo + "/test_stand.csv", stand_columns());
  ASSERT_EQ(d.rows(), 30u);
  for (std::size_t i = 0; i < d.rows(); ++i) {
    const double rpm = d.si("speed")[i] * 60.0;
    EXPECT_NEAR(rpm, 500.0 + 250.0 * static_cast<double>(i / 6), 3.0);
    // consistency of the invented data: the outlet flow at the port (the meter reads it in the return
    // line) below the geometric flow, the drain flow below the loss
    const auto oil = demo_oil();
    const double q_port = pumploss::flow_at_port(d.si("outlet flow")[i], 0.5e5, d.si("meter temperature")[i],
                                                 d.si("outlet pressure")[i], d.si("outlet temperature")[i],
                                                 oil.rho_ref_kg_m3, oil.t_ref_k, oil.alpha_per_k, oil.bulk_modulus_pa)
                              .value;
    const double q_th = 71e-6 * d.si("speed")[i];
    EXPECT_LT(q_port, q_th);
    EXPECT_LT(q_port, d.si("outlet flow")[i]);  // compressed at the port
    EXPECT_LT(d.si("drain flow")[i], q_th - q_port + 1e-6);
    // torque above the theoretical torque of a pump
    const double dp = d.si("outlet pressure")[i] - d.si("inlet pressure")[i];
    EXPECT_GT(d.si("torque")[i], 71e-6 * dp / (2 * M_PI));
  }
}

TEST(CliDemo, PumpFileGeometryGivesItsDisplacement) {
  // The budget report states the displacement the pump file's geometry implies (9 pistons of
  // 20 mm on a 40 mm pitch radius at 17.5 degrees) next to the stated 71 cm3/rev.
  temp_dir tmp;
  const auto r = run({"budget", kDemo + "/pump_p31.toml"}, tmp);
  ASSERT_EQ(r.code, 0) << r.err;
  const double vg = 9 * M_PI / 4 * 0.020 * 0.020 * 2 * 0.040 * std::tan(17.5 * M_PI / 180);
  EXPECT_LT(std::fabs(vg / 71e-6 - 1), 0.01);
  char want[128];
  std::snprintf(want, sizeof want, "(9 pistons, 71.00 cm3/rev stated, %.2f cm3/rev from the geometry)", vg * 1e6);
  EXPECT_NE(r.out.find(want), std::string::npos) << want << "\n" << r.out;
}

TEST(CliTestStand, DemoMatchesLibrary) {
  temp_dir tmp;
  const std::string out = tmp / "out";
  const auto r = run({"test-stand", kDemo + "/test_stand.csv", "--setup", kDemo + "/test_stand.toml", "--out", out}, tmp);
  ASSERT_EQ(r.code, 0) << r.err;
  EXPECT_TRUE(has_cautions(slurp(out + "/test_stand.txt")));
  // the demo has one reading per set point: 30 set points, nothing dropped as settling (issue 16)
  EXPECT_NE(r.out.find("30 from 30 readings"), std::string::npos) << r.out;
  EXPECT_NE(r.out.find("0 settling readings dropped"), std::string::npos);
  EXPECT_NE(r.out.find("Outliers:"), std::string::npos);

  // the test's own pipeline: flow at the port, two-step displacement, GUM, Wilson fit
  const auto d = read_csv(kDemo + "/test_stand.csv", stand_columns());
  const auto oil = demo_oil();
  const std::size_t n = d.rows();
  std::vector<double> q(n), dp(n), mu(n);
  for (std::size_t i = 0; i < n; ++i) {
    dp[i] = d.si("outlet pressure")[i] - d.si("inlet pressure")[i];
    const auto qp = pumploss::flow_at_port(d.si("outlet flow")[i], 0.5e5, d.si("meter temperature")[i],
                                           d.si("outlet pressure")[i], d.si("outlet temperature")[i], oil.rho_ref_kg_m3,
                                           oil.t_ref_k, oil.alpha_per_k, oil.bulk_modulus_pa);
    ASSERT_TRUE(qp.ok());
    q[i] = qp.value;
    mu[i] = pumploss::oil_dynamic_viscosity(oil, d.si("drain temperature")[i], 0.0).value;
  }
  std::vector<double> gs, gp, gq;  // level-major: 6 pressure levels x 5 speeds (the file is speed-major)
  for (std::size_t j = 0; j < 6; ++j)
    for (std::size_t k = 0; k < 5; ++k) {
      gs.push_back(d.si("speed")[k * 6 + j]);
      gp.push_back(dp[k * 6 + j]);
      gq.push_back(q[k * 6 + j]);
    }
  const auto v = pumploss::displacement_two_step(gs.data(), gp.data(), gq.data(), 6, 5);
  ASSERT_TRUE(v.st == pumploss::status::ok);
  const auto disp = read_out(out + "/test_stand_displacement.csv");
  ASSERT_EQ(disp.rows.size(), 3u);
  EXPECT_EQ(disp.text(2, "estimator"), pumploss::displacement_estimator_name(pumploss::displacement_estimator::two_step));
  EXPECT_LT(rel(disp.num(2, "V_i [cm3/rev]") * 1e-6, v.v_m3_rev), 1e-9);
  EXPECT_EQ(disp.text(0, "estimator"),
            pumploss::displacement_estimator_name(pumploss::displacement_estimator::slope_low_pressure));

  const auto pts = read_out(out + "/test_stand_points.csv");
  ASSERT_EQ(pts.rows.size(), n);
  for (std::size_t i = 0; i < n; ++i) {
    const double n_i = d.si("speed")[i], t_i = d.si("torque")[i];
    const double u_dp = pumploss::pressure_difference_uncertainty(instrument_u(0, 0.25e5, d.si("inlet pressure")[i]),
                                                                  instrument_u(0, 0.25e5, d.si("outlet pressure")[i]), 0.0)
                            .value;
    const pumploss::efficiency_inputs<double> x{v.v_m3_rev, n_i, dp[i], q[i], t_i, v.u_v_m3_rev,
                                                instrument_u(0.1, 0.5 / 60, n_i), u_dp,
                                                instrument_u(0.3, 0, d.si("outlet flow")[i]),
                                                instrument_u(0.2, 0.1, t_i), 0.0};
    const auto g = pumploss::efficiency_gum(pumploss::machine::pump, x);
    EXPECT_LT(rel(pts.num(i, "overall eff percent") / 100, g.eta_t.value), 1e-8) << i;
    EXPECT_LT(rel(pts.num(i, "U overall percent") / 100, g.eta_t.U), 1e-8) << i;
    EXPECT_LT(rel(pts.num(i, "volumetric eff percent") / 100, g.eta_v.value), 1e-8) << i;
    EXPECT_LT(rel(pts.num(i, "U hm percent") / 100, g.eta_hm.U), 1e-8) << i;
    EXPECT_LT(rel(pts.num(i, "flow at port [L/min]") / 60000, q[i]), 1e-9) << i;
  }

  // the drain table: drain flow over the theoretical flow of the displacement used
  const auto drain = read_out(out + "/test_stand_drain.csv");
  ASSERT_EQ(drain.rows.size(), n);
  for (std::size_t i = 0; i < n; ++i)
    EXPECT_LT(rel(drain.num(i, "drain fraction percent") / 100, d.si("drain flow")[i] / (v.v_m3_rev * d.si("speed")[i])),
              1e-8)
        << i;

  const double rho = pumploss::oil_density_at(oil, d.si("drain temperature")[n / 2], 0.0).value;
  std::vector<double> work(pumploss::loss_fit_workspace(n));
  // the reduction offers the constant and compression flow columns (chosen by BIC) and carries the
  // displacement's uncertainty into the coefficients (issue 16; changed on purpose)
  pumploss::loss_fit_options<double> opt;
  opt.flow_terms = 3u;
  opt.u_displacement_m3_rev = v.u_v_m3_rev;
  const auto m = pumploss::fit_loss_model<double>(pumploss::machine::pump, pumploss::loss_model_kind::wilson, v.v_m3_rev, rho,
                                          dp.data(), d.si("speed").data(), mu.data(), q.data(), d.si("torque").data(), n,
                                          work.data(), nullptr, nullptr, opt);
  ASSERT_EQ(m.st, pumploss::status::ok);
  const auto lm = read_out(out + "/test_stand_loss_model.csv");
  EXPECT_LT(rel(std::stod(lm.text(0, "Wilson")), m.c_s), 1e-4);
  EXPECT_LT(rel(std::stod(lm.text(3, "Wilson")), m.c_f), 1e-4);
  EXPECT_LT(rel(std::stod(lm.text(4, "Wilson")), m.t_c_n_m), 1e-4);
  EXPECT_NE(r.out.find(fmt_r2(m.r2_flow)), std::string::npos) << r.out;

  // the map: a point of the grid predicted by the Schloesser model at 50 degC
  const auto map = read_out(out + "/test_stand_map.csv");
  ASSERT_EQ(map.rows.size(), 29u * 27u);
  const auto ms = pumploss::fit_loss_model<double>(pumploss::machine::pump, pumploss::loss_model_kind::schloesser, v.v_m3_rev,
                                           rho, dp.data(), d.si("speed").data(), mu.data(), q.data(),
                                           d.si("torque").data(), n, work.data(), nullptr, nullptr, opt);
  const std::size_t k = 10 * 29 + 12;  // pressure 10 of 27, speed 12 of 29
  const double pk = map.num(k, "pressure difference [bar]") * 1e5, sk = map.num(k, "speed [rpm]") / 60;
  const auto pr = pumploss::loss_model_predict(ms, pk, sk, pumploss::oil_dynamic_viscosity(oil, 323.15, 0.0).value);
  EXPECT_LT(rel(map.num(k, "overall eff Schloesser percent") / 100, pr.eta_t), 1e-8);
}

TEST(CliDrainLine, DemoMatchesLibrary) {
  temp_dir tmp;
  const std::string out = tmp / "out";
  const auto r = run({"drain-line", kDemo + "/drain_line.toml", "--size", "--out", out}, tmp);
  ASSERT_EQ(r.code, 0) << r.err;
  // the line of drain_line.toml, built here from the library: the bends, bulkhead and exit follow
  // the steel tube and take its bore
  pumploss::line<double> l;
  l.height_m = 0.6;
  l.elements.push_back(pumploss::line_pipe(0.0127, 1.8, 5e-6));
  l.elements.push_back(pumploss::line_pipe(0.013, 4.5, 0.0015e-3));
  for (int k = 0; k < 3; ++k)
    l.elements.push_back(pumploss::line_fitting_named(0.0, pumploss::fitting_type::bend_90_r2).value);
  l.elements.push_back(pumploss::line_fitting_k(0.0, 0.5));
  l.elements.push_back(pumploss::line_exit(0.0));
  const double qc[2] = {10.0 / 60000, 20.0 / 60000}, pc[2] = {0.05e5, 0.12e5};
  l.elements.push_back(pumploss::line_component_points(2, qc, pc, 32e-6, 1.0).value);
  const auto oil = demo_oil();
  const auto f = pumploss::with_destroke_peak(pumploss::drain_flow_parts(0.5 / 60000, 7.5 / 60000, 323.15), 25e-6, 0.25);
  const pumploss::drain_limits<double> lim{0.0, 1e5, 2e5};
  pumploss::drain_point<double> pts[8];
  const auto sum = pumploss::drain_check(l, oil, f, lim, 273.15, 343.15, 8, pts);
  const auto t = read_out(out + "/drain_line_check.csv");
  ASSERT_EQ(t.rows.size(), 8u);
  for (std::size_t i = 0; i < 8; ++i) {
    EXPECT_LT(rel(t.num(i, "case pressure [bar]") * 1e5, pts[i].case_pressure_pa), 1e-8) << i;
    EXPECT_LT(rel(t.num(i, "peak case pressure [bar]") * 1e5, pts[i].case_pressure_peak_pa), 1e-8) << i;
    EXPECT_LT(rel(t.num(i, "drain flow [L/min]") / 60000, pts[i].q_m3_s), 1e-8) << i;
    EXPECT_EQ(t.text(i, "verdict"), pts[i].pass ? "pass" : "FAIL") << i;
    EXPECT_EQ(t.text(i, "peak verdict"), pts[i].pass_peak ? "pass" : "FAIL") << i;
  }
  // the verdict names the failing range, not the whole span
  EXPECT_NE(r.out.find(sum.pass && sum.pass_peak ? "PASS" : (sum.pass ? "FAIL on destroke at" : "FAIL at")),
            std::string::npos)
      << r.out;
  EXPECT_EQ(r.out.find("FAIL from 0.00 degC to 70.0 degC"), std::string::npos) << r.out;
  const auto z = pumploss::size_drain_line(l, oil, f, lim, 273.15, 343.15, 8, 1.5, 3);
  ASSERT_GE(z.bore_index, 0);
  const auto at = r.out.find("Smallest standard bore:");
  ASSERT_NE(at, std::string::npos) << r.out;
  EXPECT_EQ(r.out.find(std::string(pumploss::standard_bores[z.bore_index].name) + " (", at),
            r.out.find_first_not_of(' ', at + std::string("Smallest standard bore:").size()))
      << r.out;
  // the lowest start temperature: where the destroke peak stops failing (library figure)
  const auto st = pumploss::drain_start_temperature(l, oil, f, lim, 273.15, 343.15, 8, 1000e-6);
  char start_text[32];
  std::snprintf(start_text, sizeof start_text, "%.1f degC (", st.t_start_k - 273.15);
  const auto at_start = r.out.find("Lowest start temperature:");
  ASSERT_NE(at_start, std::string::npos) << r.out;
  EXPECT_EQ(r.out.find(start_text, at_start),
            r.out.find_first_not_of(' ', at_start + std::string("Lowest start temperature:").size()))
      << r.out;
  EXPECT_NE(r.out.find("never block, cap or valve a case drain"), std::string::npos) << r.out;
  EXPECT_NE(r.out.find("constant K is a turbulent value"), std::string::npos) << r.out;  // the bulkhead
  EXPECT_TRUE(has_cautions(r.out));
}

TEST(CliDrainLine, NoBoreCanPassNamesEachFixedElement) {
  // the demo line with a return filter and a cooler in the drain (invented), each alone above
  // the 1 bar limit when cold: the report names both, and the larger as the one to resize first
  temp_dir tmp;
  write_file(tmp / "oil.toml", slurp(kDemo + "/oil.toml"));
  std::string text = slurp(kDemo + "/drain_line.toml");
  const auto at = text.find("[sizing]");
  ASSERT_NE(at, std::string::npos);
  text.insert(at,
              "[[component]]\nname = \"return filter\"\ncurve = [[\"0 L/min\", \"0 bar\"], [\"10 L/min\", \"0.8 bar\"]]\n"
              "curve_viscosity = \"46 cSt\"\nscaling = \"laminar\"\n\n"
              "[[component]]\nname = \"drain cooler\"\ncurve = [[\"0 L/min\", \"0 bar\"], [\"10 L/min\", \"0.7 bar\"]]\n"
              "curve_viscosity = \"46 cSt\"\nscaling = \"laminar\"\n\n");
  write_file(tmp / "drain_line.toml", text);
  const std::string out = tmp / "out";
  const auto r = run({"drain-line", tmp / "drain_line.toml", "--size", "--out", out}, tmp);
  ASSERT_EQ(r.code, 0) << r.err;
  const auto line = r.out.find("Smallest standard bore:");
  ASSERT_NE(line, std::string::npos) << r.out;
  const std::string fact = r.out.substr(line, r.out.find("\n", line) - line);
  EXPECT_NE(fact.find("none can pass"), std::string::npos) << fact;
  EXPECT_NE(fact.find("each alone above the limit (2 of them): return filter [component]"), std::string::npos) << fact;
  EXPECT_NE(fact.find("drain cooler [component]"), std::string::npos) << fact;
  EXPECT_EQ(fact.find("tank-lid diffuser [component] ("), std::string::npos) << fact;  // below the limit alone
  EXPECT_NE(fact.find("the largest of them is return filter"), std::string::npos) << fact;
  EXPECT_TRUE(has_cautions(r.out));
}

TEST(CliHealth, DemoMatchesLibrary) {
  temp_dir tmp;
  const std::string out = tmp / "out";
  const auto r = run({"health", kDemo + "/field_readings.csv", "--pump", kDemo + "/pump_p31.toml", "--out", out}, tmp);
  ASSERT_EQ(r.code, 0) << r.err;
  pumploss::health_reference<double> ref{};
  ref.max_displacement_m3_rev = 71e-6;
  ref.reference_dp_pa = 250e5;
  ref.reference_t_k = 323.15;
  ref.fluid = demo_oil();
  ref.reference_speed_rev_s = 25.0;
  ref.rated_speed_rev_s = 25.0;
  ref.constant_m3_s = 0.3 / 60000;
  ref.baseline_m3_s = 3.1 / 60000;
  ref.baseline_rise_k = 4.0;
  pumploss::health_bands<double> bands;
  bands.sound_max = 0.06;
  bands.acceptable_max = 0.10;
  bands.worn_min = 0.15;
  bands.growth_moderate = 0.25;
  bands.growth_large = 0.50;
  const auto d = read_csv(kDemo + "/field_readings.csv", field_columns());
  const auto t = read_out(out + "/health_readings.csv");
  const auto why = read_out(out + "/health_reasons.csv");
  const auto legend = read_out(out + "/health_reason_codes.csv");
  std::map<std::string, std::string> code_of;  // sentence -> code
  for (std::size_t i = 0; i < legend.rows.size(); ++i) code_of[legend.text(i, "meaning")] = legend.text(i, "code");
  ASSERT_EQ(t.rows.size(), d.rows());
  std::size_t refused = 0;
  for (std::size_t i = 0; i < d.rows(); ++i) {
    pumploss::health_reading<double> rd{d.si("drain flow")[i], d.si("outlet pressure")[i], 0.0,
                                        d.si("drain temperature")[i], d.si("speed")[i]};
    rd.drain_t_k = d.si("drain temperature")[i];
    rd.inlet_t_k = d.si("oil temperature")[i];
    if (d.texts[d.find("state")][i] == "deadhead") rd.state = pumploss::operating_state::deadhead;
    const auto a = pumploss::assess_health(ref, bands, rd);
    if (a.st == pumploss::status::out_of_validity) {
      ++refused;
      EXPECT_EQ(t.text(i, "verdict"), "refused") << i;
      EXPECT_EQ(why.text(i, "reason codes"), "refused") << i;
      continue;
    }
    EXPECT_LT(rel(t.num(i, "normalised drain flow [L/min]") / 60000, a.drain_at_reference_m3_s), 1e-8) << i;
    EXPECT_EQ(t.text(i, "verdict"), pumploss::health_level_name(a.level)) << i;
    for (unsigned bit = 1; bit <= a.reasons; bit <<= 1)
      if (a.reasons & bit) {  // the row's codes hold the code of every reason (legend: its sentence)
        const auto c = code_of.find(pumploss::health_reason_text(bit));
        ASSERT_NE(c, code_of.end()) << bit;
        const std::string codes = " " + why.text(i, "reason codes") + " ";
        EXPECT_NE(codes.find(" " + c->second + " "), std::string::npos) << i << ": " << codes;
      }
  }
  // the demo's truth (generate.py): a zero reading in month 33, a step in month 30
  EXPECT_EQ(refused, 1u);
  const auto rx = read_out(out + "/health_refused.csv");
  ASSERT_EQ(rx.rows.size(), 1u);
  EXPECT_NE(rx.text(0, "where").find("field_readings.csv:36:"), std::string::npos) << rx.text(0, "where");
  const auto steps = read_out(out + "/health_steps.csv");
  ASSERT_EQ(steps.rows.size(), 1u);
  EXPECT_EQ(steps.text(0, "date"), d.texts[d.find("date")][30]);
  EXPECT_NE(r.out.find("Latest verdict:   worn"), std::string::npos) << r.out;
  EXPECT_NE(r.out.find("the latest verdict is worn: no projection"), std::string::npos) << r.out;
  EXPECT_NE(r.out.find("blows the shaft seal"), std::string::npos);
  EXPECT_NE(slurp(out + "/health.svg").find("blows the shaft seal"), std::string::npos);
  // health needs no geometry: the short description gives the same verdicts
  const std::string out2 = tmp / "out2";
  const auto r2 =
      run({"health", kDemo + "/field_readings.csv", "--pump", kDemo + "/pump_p31_health.toml", "--out", out2}, tmp);
  ASSERT_EQ(r2.code, 0) << r2.err;
  const auto t2 = read_out(out2 + "/health_readings.csv");
  for (std::size_t i = 0; i < d.rows(); ++i) EXPECT_EQ(t2.text(i, "verdict"), t.text(i, "verdict")) << i;
}

TEST(CliHealth, TemperaturesInDegFUnderADegCHeaderAreRefused) {
  temp_dir tmp;
  std::string csv = "date,outlet pressure [bar],oil temperature [degC],speed [rpm],drain flow [L/min]\n";
  const char* temps[] = {"104", "110", "115", "122", "118", "112"};  // 40-50 degC written in degF
  for (int i = 0; i < 6; ++i) csv += "2025-0" + std::to_string(i + 1) + "-10,230," + temps[i] + ",1490,4.5\n";
  const std::string file = tmp / "f.csv", out = tmp / "out";
  write_file(file, csv);
  const auto r = run({"health", file, "--pump", kDemo + "/pump_p31_health.toml", "--out", out}, tmp);
  EXPECT_EQ(r.code, 2) << r.out;
  EXPECT_NE(r.err.find(file + ":2:"), std::string::npos) << r.err;
  EXPECT_NE(r.err.find("look like degF"), std::string::npos) << r.err;
  EXPECT_FALSE(fs::exists(out));
}

TEST(CliBudget, DemoMatchesLibrary) {
  temp_dir tmp;
  const std::string out = tmp / "out";
  const auto r = run({"budget", kDemo + "/pump_p31.toml", "--out", out}, tmp);
  ASSERT_EQ(r.code, 0) << r.err;
  // pump_p31.toml, written out here
  pumploss::piston_pump<double> p;
  p.pistons = 9;
  p.piston_diameter_m = 0.020;
  p.bore_clearance_m = 22e-6;
  p.piston_eccentricity = 0.7;
  p.engaged_length_min_m = 0.024;
  p.pitch_radius_m = 0.040;
  p.max_swash_angle_rad = 17.5 * M_PI / 180;
  p.dead_volume_m3 = 2.5e-6;
  p.slipper_pocket_radius_m = 0.009;
  p.slipper_outer_radius_m = 0.0125;
  p.slipper_gap_m = 12e-6;
  p.slipper_feed_diameter_m = 0.5e-3;
  p.slipper_feed_length_m = 48e-3;
  p.ball_diameter_m = 0.013;
  p.ball_clearance_m = 5e-6;
  p.ball_length_m = 0.003;
  p.valve_inner_land_inner_radius_m = 0.027;
  p.valve_inner_land_outer_radius_m = 0.031;
  p.valve_outer_land_inner_radius_m = 0.041;
  p.valve_outer_land_outer_radius_m = 0.045;
  p.valve_kidney_arc_rad = 150 * M_PI / 180;
  p.valve_gap_m = 18e-6;
  p.cross_port_conductance_m3 = 0.016 * std::pow(18e-6, 3) / (12 * 0.006);
  p.controller_flow_m3_s = 0.3 / 60000;
  p.control_pressure_pa = 25e5;
  p.control_piston_conductance_m3 = M_PI * 0.016 * std::pow(10e-6, 3) / (12 * 0.020);
  p.bleed_orifice_diameter_m = 0.5e-3;
  p.bleed_cd = 0.7;
  p.stated_displacement_m3_rev = 71e-6;
  const auto oil = demo_oil();
  // the demo geometry is balanced: both ratios inside their design windows at full and zero stroke
  for (double x : {0.0, 1.0}) {
    const auto k = pumploss::piston_pump_kinematics(p, x);
    const auto bal = pumploss::piston_pump_balance(p, k.tan_beta, 250e5);
    EXPECT_EQ(bal.warnings, 0u) << x;
  }
  // the program read the same geometry: its flows below equal the library's for this description
  const auto fl = read_out(out + "/budget_flow_loss.csv");
  const auto t = read_out(out + "/budget_flows.csv");
  const auto z = read_out(out + "/budget_sensitivity.csv");
  ASSERT_EQ(t.rows.size(), 13u);  // 20 to 260 bar in steps of 20
  for (std::size_t i = 0; i < 13; ++i) {
    pumploss::pump_operating_point<double> op{(20.0 + 20.0 * static_cast<double>(i)) * 1e5, 0.5e5, 25.0, 1.0,
                                              323.15};
    op.inlet_pa = 0.3e5;
    op.film_temperature_rise_k = 7.0;
    const auto b = pumploss::piston_pump_budget(p, oil, op);
    ASSERT_EQ(b.st, pumploss::status::ok);
    EXPECT_LT(rel(t.num(i, "total film viscosity [L/min]") / 60000, b.total_film_m3_s), 1e-8) << i;
    const auto f = pumploss::piston_pump_flow_loss(p, oil, op);
    EXPECT_LT(rel(fl.num(i, "flow loss [L/min]") / 60000, f.total_m3_s), 1e-8) << i;
    EXPECT_LT(rel(fl.num(i, "case drain [L/min]") / 60000, b.total_m3_s), 1e-8) << i;
    EXPECT_LT(rel(t.num(i, "total [L/min]") / 60000, b.total_m3_s), 1e-8) << i;
    EXPECT_LT(rel(t.num(i, "slipper [L/min]") / 60000, b.flow_m3_s[1]), 1e-8) << i;
    EXPECT_LT(rel(t.num(i, "piston-bore [L/min]") / 60000, b.flow_m3_s[0]), 1e-8) << i;
    const auto s = pumploss::piston_pump_sensitivity(p, oil, op);
    EXPECT_LT(rel(z.num(i, "elasticity valve plate gap"), s.elasticity[3]), 1e-8) << i;
  }
  // pressure, 8 paths (no user paths), total, total with the film viscosity, fraction, status
  EXPECT_EQ(t.head.size(), 13u);
}

// ------------------------------------------------------------------------------ malformed inputs

namespace {
// The demo test-stand CSV with one change, as (file, line of the fault).
std::string demo_stand() { return slurp(kDemo + "/test_stand.csv"); }

std::string replace_line(const std::string& text, int line_no, const std::string& new_line) {
  std::stringstream in(text);
  std::string out, line;
  int n = 0;
  while (std::getline(in, line)) out += (++n == line_no ? new_line : line) + "\n";
  return out;
}

std::string line_at(const std::string& text, int line_no) {
  std::stringstream in(text);
  std::string line;
  for (int n = 0; n < line_no; ++n) std::getline(in, line);
  return line;
}

// Run test-stand on a broken copy; expect exit 2, "file:line:" in the message and no output.
void expect_rejected(const std::string& content, const std::string& where, const std::string& what) {
  temp_dir tmp;
  const std::string csv = tmp / "stand.csv", out = tmp / "out";
  write_file(csv, content);
  const auto r = run({"test-stand", csv, "--setup", kDemo + "/test_stand.toml", "--out", out}, tmp);
  EXPECT_EQ(r.code, 2) << r.err;
  EXPECT_NE(r.err.find(csv + ":" + where), std::string::npos) << r.err;
  EXPECT_NE(r.err.find(what), std::string::npos) << r.err;
  EXPECT_FALSE(fs::exists(out));
  EXPECT_EQ(r.out, "");
}
}  // namespace

TEST(CliMalformed, MissingColumn) {
  // header is line 4 (three comment lines); drop the drain flow column from the header only
  std::string s = demo_stand();
  const std::string head = line_at(s, 4);
  std::string cut = head;
  cut.erase(cut.find(",drain flow [L/min]"), std::string(",drain flow [L/min]").size());
  expect_rejected(replace_line(s, 4, cut), "4:", "missing column 'drain flow'");
}

TEST(CliMalformed, BadNumber) {
  std::string s = demo_stand();
  std::string row = line_at(s, 9);
  const auto c1 = row.find(',');
  const auto c2 = row.find(',', c1 + 1);
  row = row.substr(0, c2 + 1) + "2OO.1" + row.substr(row.find(',', c2 + 1));
  expect_rejected(replace_line(s, 9, row), "9:" + std::to_string(c2 + 2) + ":", "'2OO.1' is not a number");
}

TEST(CliMalformed, UnknownUnit) {
  std::string s = demo_stand();
  std::string head = line_at(s, 4);
  head.replace(head.find("[N.m]"), 5, "[Nmm]");
  expect_rejected(replace_line(s, 4, head), "4:", "unknown unit 'Nmm'");
}

TEST(CliMalformed, UnitOfTheWrongQuantity) {
  std::string s = demo_stand();
  std::string head = line_at(s, 4);
  head.replace(head.find("[L/min]"), 7, "[bar]");
  expect_rejected(replace_line(s, 4, head), "4:", "is a unit of pressure");
}

TEST(CliMalformed, EmptyFile) { expect_rejected("", "1:", "empty"); }

TEST(CliMalformed, OnlyAHeader) {
  expect_rejected("# no rows yet\n" + line_at(demo_stand(), 4) + "\n", "2:", "no data rows");
}

TEST(CliMalformed, WrongDelimiter) {
  std::string s = demo_stand();
  for (auto& c : s)
    if (c == ',') c = '\t';
  expect_rejected(s, "4:", "separated by 'TAB'");
}

TEST(CliMalformed, DecimalComma) {
  std::string s = demo_stand();
  std::string row = line_at(s, 12);
  row.replace(row.find('.'), 1, ",");
  expect_rejected(replace_line(s, 12, row), "12:", "decimal comma");
}

TEST(CliMalformed, ImpossibleValueNamesItsField) {
  std::string s = demo_stand();
  std::string row = line_at(s, 5);
  row = "-" + row;  // negative speed
  expect_rejected(replace_line(s, 5, row), "5:1:", "column 'speed'");
}

TEST(CliMalformed, ConfigurationErrorsNameLineAndColumn) {
  temp_dir tmp;
  const std::string oil = slurp(kDemo + "/oil.toml");
  struct c {
    std::string from, to, where, what;
  };
  const std::vector<c> cases = {
      {"step = \"5 K\"", "step = \"5 K\"\nsetp = \"5 K\"", ":17:1:", "unknown key 'setp'"},
      {"step = \"5 K\"", "", ":13:1:", "missing key 'step' in [temperatures]"},
      {"density = \"872 kg/m3\"", "density = 872", ":8:11:", "needs a unit"},
      {"\"6.9 cSt\"", "\"6.9 cSx\"", ":7:22:", "unknown unit 'cSx'"},
      {"grade = 46 ", "grade = 45 ", ":6:9:", "not an ISO 3448 grade"},
      {"[limits]", "[limits", ":18:", "expected ']'"},
  };
  for (const auto& k : cases) {
    std::string text = oil;
    const auto pos = text.find(k.from);
    ASSERT_NE(pos, std::string::npos) << k.from;
    text.replace(pos, k.from.size(), k.to);
    const std::string file = tmp / "oil.toml", out = tmp / "out";
    write_file(file, text);
    const auto r = run({"oil", file, "--out", out}, tmp);
    EXPECT_EQ(r.code, 2) << k.to << ": " << r.err;
    EXPECT_NE(r.err.find(file + k.where), std::string::npos) << k.to << ": " << r.err;
    EXPECT_NE(r.err.find(k.what), std::string::npos) << r.err;
    EXPECT_FALSE(fs::exists(out));
  }
}

TEST(CliMalformed, EveryCommandNamesTheLineAndWritesNothing) {
  // broken copies of each demo input: (command, file to break, from, to, where, what)
  struct c {
    std::string command, file, from, to, where, what;
  };
  const std::vector<c> cases = {
      {"health", "field_readings.csv", "2022-03-15,1600,204,39.8", "2022-03-15,1600,2O4,39.8", ":5:17:", "'2O4' is not a number"},
      {"health", "field_readings.csv", "drain flow [L/min]", "drain flow [L/mn]", ":2:", "unknown unit 'L/mn'"},
      {"health", "field_readings.csv", "2022-03-15,", "2022-13-15,", ":5:1:", "date"},
      {"health", "field_readings.csv", "on stroke,meter change,", "on stroke,overhual,", ":27:", "unknown event"},
      {"health", "field_readings.csv", ",speed [rpm],", ",", ":2:", "missing column 'speed'"},
      {"budget", "pump_p31.toml", "gap = \"12 um\"", "gap = \"12\"", ":", "needs a unit"},
      {"budget", "pump_p31.toml", "clearance = \"5 um\"", "clearance = \"5 um\"\nclearence = \"5 um\"", ":", "unknown key 'clearence'"},
      {"budget", "pump_p31.toml", "pistons = 9", "pistons = 99", ":12:11:", "between 3 and 15"},
      {"drain-line", "drain_line.toml", "length = \"4.5 m\"", "length = \"4.5 furlong\"", ":", "unknown unit 'furlong'"},
      {"drain-line", "drain_line.toml", "k = 0.5", "k = -0.5", ":", "must not be negative"},
      {"drain-line", "drain_line.toml", "length = \"4.5 m\"", "length = \"0 m\"", ":", "must be above zero"},
      {"drain-line", "drain_line.toml", "length = \"4.5 m\"", "length = \"-4.5 m\"", ":", "must be above zero"},
      {"drain-line", "drain_line.toml",
       "[[segment.fitting]]                 # fittings follow the segment they are written under", "[[fitting]]", ":",
       "say which segment this fitting follows"},
      {"drain-line", "drain_line.toml", "type = \"bend_90_r2\"", "type = \"bend_90_r3\"", ":", "unknown fitting kind"},
      {"drain-line", "drain_line.toml", "max_peak_case_pressure = \"2.0 bar\"", "", ":",
       "needs the maker's 'max_peak_case_pressure'"},
      {"drain-line", "drain_line.toml", "reference_temperature = \"50 degC\"", "", ":",
       "needs 'reference_temperature'"},
      {"test-stand", "test_stand.toml", "reading_percent = 0.3", "reading_percent = 0,3", ":", "expected"},
  };
  for (const auto& k : cases) {
    temp_dir tmp;
    for (const char* f : {"oil.toml", "pump_p31.toml", "pump_p31_health.toml", "drain_line.toml", "field_readings.csv",
                          "test_stand.csv", "test_stand.toml"})
      write_file(tmp / f, slurp(kDemo + "/" + f));
    std::string text = slurp(kDemo + "/" + k.file);
    const auto pos = text.find(k.from);
    ASSERT_NE(pos, std::string::npos) << k.from;
    text.replace(pos, k.from.size(), k.to);
    const std::string file = tmp / k.file, out = tmp / "out";
    write_file(file, text);
    std::vector<std::string> args;
    if (k.command == "health") args = {"health", tmp / "field_readings.csv", "--pump", tmp / "pump_p31.toml"};
    if (k.command == "budget") args = {"budget", tmp / "pump_p31.toml"};
    if (k.command == "drain-line") args = {"drain-line", tmp / "drain_line.toml", "--size"};
    if (k.command == "test-stand") args = {"test-stand", tmp / "test_stand.csv", "--setup", tmp / "test_stand.toml"};
    args.push_back("--out");
    args.push_back(out);
    const auto r = run(args, tmp);
    EXPECT_EQ(r.code, 2) << k.to << ": " << r.err;
    const auto at = r.err.find(file + k.where);
    EXPECT_NE(at, std::string::npos) << k.to << ": " << r.err;
    // a line number follows the file name
    if (at != std::string::npos) {
      EXPECT_TRUE(std::isdigit(static_cast<unsigned char>(r.err[at + file.size() + 1]))) << r.err;
    }
    EXPECT_NE(r.err.find(k.what), std::string::npos) << r.err;
    EXPECT_FALSE(fs::exists(out)) << k.to;
    EXPECT_EQ(r.out, "") << k.to;
  }
}

TEST(CliMalformed, SetupAndDataThatDoNotFitNameTheSetup) {
  // the setup takes the viscosity at the drain temperature; the data lack that column: the
  // library's refusal names the setting, the program the setup file
  temp_dir tmp;
  std::stringstream in(demo_stand());
  std::string line, csv;
  while (std::getline(in, line)) {
    if (!line.empty() && line[0] != '#') {
      std::size_t at = 0;
      for (int k = 0; k < 8; ++k) at = line.find(',', at) + 1;
      line.erase(at - 1, line.find(',', at) - at + 1);  // the 9th field: drain temperature
    }
    csv += line + "\n";
  }
  ASSERT_EQ(csv.find("drain temperature"), std::string::npos);
  const std::string file = tmp / "stand.csv", out = tmp / "out";
  write_file(file, csv);
  const auto r = run({"test-stand", file, "--setup", kDemo + "/test_stand.toml", "--out", out}, tmp);
  EXPECT_EQ(r.code, 2) << r.err;
  EXPECT_NE(r.err.find(kDemo + "/test_stand.toml: "), std::string::npos) << r.err;
  EXPECT_NE(r.err.find("'drain temperature'"), std::string::npos) << r.err;
  EXPECT_FALSE(fs::exists(out));
}

TEST(CliMalformed, EmptyFieldReadings) {
  temp_dir tmp;
  const std::string file = tmp / "empty.csv", out = tmp / "out";
  write_file(file, "");
  const auto r = run({"health", file, "--pump", kDemo + "/pump_p31.toml", "--out", out}, tmp);
  EXPECT_EQ(r.code, 2);
  EXPECT_NE(r.err.find(file + ":1:"), std::string::npos) << r.err;
  EXPECT_FALSE(fs::exists(out));
}

// ------------------------------------------------------------------------------ help and cautions

TEST(CliHelp, EveryHelpCarriesTheCautions) {
  temp_dir tmp;
  for (const char* sub : {"", "units", "oil", "test-stand", "drain-line", "health", "budget"}) {
    std::vector<std::string> args;
    if (*sub) args.push_back(sub);
    args.push_back("--help");
    const auto r = run(args, tmp);
    EXPECT_EQ(r.code, 0) << sub;
    EXPECT_TRUE(has_cautions(r.out)) << sub << ":\n" << r.out;
  }
  EXPECT_EQ(run({}, tmp).code, 1);  // no subcommand
  EXPECT_EQ(run({"pump-it"}, tmp).code, 1);
}

// ------------------------------------------------------------------------------ report format

TEST(CliReport, UnitsInHeadingsFullPrecisionCsvAndCautionsAtTheFoot) {
  temp_dir tmp;
  const std::string out = tmp / "out";
  const auto r = run({"budget", kDemo + "/pump_p31.toml", "--unit", "psi", "--out", out}, tmp);
  ASSERT_EQ(r.code, 0) << r.err;
  const std::string text = slurp(out + "/budget.txt");
  EXPECT_NE(text.find("outlet pressure [psi]"), std::string::npos) << text;
  EXPECT_TRUE(has_cautions(text));
  EXPECT_EQ(text.rfind("take precedence.\n"), text.size() - 17);
  const auto t = read_out(out + "/budget_flows.csv");
  ASSERT_FALSE(t.rows.empty());
  // 20 bar in psi to the CSV's ten significant digits
  EXPECT_LT(rel(t.num(0, "outlet pressure [psi]"), pumploss::convert(20.0, "bar", "psi").value), 1e-9);
  EXPECT_NE(t.head.back().find("status"), std::string::npos);
}

// ------------------------------------------------------------------------------ files as people export them

namespace {

// The forms a spreadsheet or logger exports the demo files in.
struct export_form {
  const char* name;
  bool european;    // ';' between fields, ',' as the decimal mark
  bool bom_crlf;    // UTF-8 byte order mark, CRLF line ends
  bool signs;       // degree sign, l/min, RPM in the header
  bool cp1252;      // the degree sign as the Windows-1252 byte (a file that is not UTF-8)
  bool parentheses; // "name (unit)" instead of "name [unit]"
};

const export_form kForms[] = {
    {"european", true, false, false, false, false},       {"bom-crlf", false, true, false, false, false},
    {"degree-signs", false, false, true, false, false},    {"windows-1252", false, false, true, true, false},
    {"parentheses", false, false, false, false, true},     {"all-at-once", true, true, true, false, true},
};

void replace_all(std::string& s, const std::string& from, const std::string& to) {
  for (auto at = s.find(from); at != std::string::npos; at = s.find(from, at + to.size())) s.replace(at, from.size(), to);
}

// Rewrite a plain demo file (',' and '.', units in brackets) in an exported form.
std::string exported(const std::string& plain, const export_form& f) {
  std::stringstream in(plain);
  std::string out, line;
  bool header = true;
  while (std::getline(in, line)) {
    if (!line.empty() && line[0] != '#') {
      if (header) {
        if (f.signs) {
          replace_all(line, "[degC]", f.cp1252 ? "[\xB0" "C]" : "[\xC2\xB0" "C]");
          replace_all(line, "[L/min]", "[l/min]");
          replace_all(line, "[rpm]", "[RPM]");
        }
        if (f.parentheses) {
          replace_all(line, "[", "(");
          replace_all(line, "]", ")");
        }
      }
      if (f.european) {  // fields split at commas outside quotes; numbers get the decimal comma
        std::vector<std::string> fields(1);
        bool quoted = false;
        for (const char c : line) {
          if (c == '"') quoted = !quoted;
          if (c == ',' && !quoted) fields.emplace_back();
          else fields.back() += c;
        }
        line.clear();
        for (std::size_t i = 0; i < fields.size(); ++i) {
          std::string x = fields[i];
          if (!header && pumploss::parse_number(x)) replace_all(x, ".", ",");
          if (x.find(';') != std::string::npos && x.front() != '"') x = "\"" + x + "\"";
          line += (i ? ";" : "") + x;
        }
      }
      header = false;
    }
    out += line + (f.bom_crlf ? "\r\n" : "\n");
  }
  return (f.bom_crlf ? "\xEF\xBB\xBF" : "") + out;
}

// Same SI values, bit for bit, and the same texts of the non-numeric columns.
void expect_same_table(const pumploss::table_data& a, const pumploss::table_data& b, const std::string& what) {
  ASSERT_EQ(b.error.st, pumploss::status::ok) << what << ":" << b.error.line << ":" << b.error.column << ": "
                                              << b.error.message;
  ASSERT_EQ(a.rows(), b.rows()) << what;
  ASSERT_GT(a.rows(), 10u);
  for (std::size_t k = 0; k < a.spec.size(); ++k) {
    ASSERT_EQ(a.present[k], b.present[k]) << what << " " << a.spec[k].name;
    for (std::size_t i = 0; i < a.values[k].size(); ++i) {
      EXPECT_EQ(std::memcmp(&a.values[k][i], &b.values[k][i], sizeof(double)), 0)
          << what << " " << a.spec[k].name << " row " << i;
      if (a.spec[k].kind == column_kind::text || a.spec[k].kind == column_kind::date) {
        EXPECT_EQ(a.texts[k][i], b.texts[k][i]) << what << " " << a.spec[k].name << " row " << i;
      }
    }
  }
}

// Every CSV file of a report folder, by name.
std::map<std::string, std::string> csv_outputs(const std::string& dir) {
  std::map<std::string, std::string> m;
  for (const auto& e : fs::directory_iterator(dir))
    if (e.path().extension() == ".csv") m[e.path().filename().string()] = slurp(e.path().string());
  return m;
}

}  // namespace

TEST(CliExports, DemoFilesInEveryExportedFormGiveTheSameNumbers) {
  temp_dir tmp;
  const struct {
    const char* command;
    const char* file;
    const char* setup_option;
    const char* setup;
    std::vector<pumploss::column_spec> spec;
  } inputs[] = {{"test-stand", "test_stand.csv", "--setup", "test_stand.toml", stand_columns()},
                {"health", "field_readings.csv", "--pump", "pump_p31_health.toml", field_columns()}};
  for (const auto& in : inputs) {
    const std::string plain_text = slurp(kDemo + "/" + in.file);
    const auto plain = read_csv(kDemo + "/" + in.file, in.spec);
    const std::string plain_out = tmp / (std::string(in.command) + "_plain");
    const auto r0 = run({in.command, kDemo + "/" + in.file, in.setup_option, kDemo + "/" + in.setup, "--out", plain_out}, tmp);
    ASSERT_EQ(r0.code, 0) << r0.err;
    EXPECT_EQ(r0.out.find("--csv-format"), std::string::npos);  // a plain file needs no note
    const auto want = csv_outputs(plain_out);
    ASSERT_FALSE(want.empty());
    for (const auto& f : kForms) {
      const std::string what = std::string(in.command) + " " + f.name;
      const std::string file = tmp / (std::string(f.name) + "_" + in.file);
      write_file(file, exported(plain_text, f));
      // through the library: the same doubles
      expect_same_table(plain, pumploss::read_table_file(file, in.spec), what);
      // through the program: the same reduced / normalised results, byte for byte
      const std::string out = tmp / (std::string(in.command) + "_" + f.name);
      const auto r = run({in.command, file, in.setup_option, kDemo + "/" + in.setup, "--out", out}, tmp);
      ASSERT_EQ(r.code, 0) << what << ": " << r.err;
      const auto got = csv_outputs(out);
      EXPECT_EQ(got.size(), want.size()) << what;
      for (const auto& [name, text] : want) {
        ASSERT_TRUE(got.count(name)) << what << " " << name;
        std::string g = got.at(name);  // the refused readings name their file: the plain one's name
        replace_all(g, file, kDemo + "/" + in.file);
        EXPECT_EQ(g, text) << what << " " << name;
      }
      // the note says what was detected
      if (f.european) {
        EXPECT_NE(r.out.find("read as separated by ';' with ',' as the decimal mark"), std::string::npos) << r.out;
      }
      if (f.cp1252) {
        EXPECT_NE(r.out.find("Windows-1252"), std::string::npos) << r.out;
      }
      // the European form with the format given, and refused when the format given contradicts it
      if (f.european && !f.bom_crlf) {
        const auto g = run({in.command, file, in.setup_option, kDemo + "/" + in.setup, "--csv-format", "semicolon-comma"}, tmp);
        EXPECT_EQ(g.code, 0) << g.err;
        EXPECT_EQ(g.out.find("detected"), std::string::npos);
        const auto c = run({in.command, file, in.setup_option, kDemo + "/" + in.setup, "--csv-format", "comma"}, tmp);
        EXPECT_EQ(c.code, 2);
        EXPECT_NE(c.err.find(file + ":"), std::string::npos) << c.err;
        EXPECT_NE(c.err.find("separated by ';'"), std::string::npos) << c.err;
      }
    }
  }
}

TEST(CliExports, AmbiguousNumbersAreRefusedWithThePlaceAndTheFix) {
  temp_dir tmp;
  // a European export whose first pressure carries a thousands separator: "1.234,5"
  std::string s = exported(demo_stand(), kForms[0]);
  std::string row = line_at(s, 5);
  const auto semi = row.find(';');
  row = row.substr(0, semi + 1) + "1.234,5" + row.substr(row.find(';', semi + 1));
  const std::string csv = tmp / "stand.csv";
  write_file(csv, replace_line(s, 5, row));
  const auto r = run({"test-stand", csv, "--setup", kDemo + "/test_stand.toml"}, tmp);
  EXPECT_EQ(r.code, 2);
  EXPECT_NE(r.err.find(csv + ":5:" + std::to_string(semi + 2) + ":"), std::string::npos) << r.err;
  EXPECT_NE(r.err.find("without thousands grouping"), std::string::npos) << r.err;
  EXPECT_EQ(run({"test-stand", csv, "--setup", kDemo + "/test_stand.toml", "--csv-format", "semicolons"}, tmp).code, 1);
}

// Issue 16: [fit] is optional; [outliers] and [[acceptance]] criteria in the setup give a verdict
// per criterion with its margin (pass, fail, not tested) and an overall one.
TEST(CliTestStand, AcceptanceCriteriaAndOptionalFit) {
  temp_dir tmp;
  std::string setup = slurp(kDemo + "/test_stand.toml");
  const auto fit = setup.find("[fit]");
  ASSERT_NE(fit, std::string::npos);
  setup.erase(fit, setup.find("[map]") - fit);  // no [fit]: Wilson alone (and none of the demo's [[acceptance]])
  const auto job_at = setup.find("[job]");         // the demo's [job], replaced below
  ASSERT_NE(job_at, std::string::npos);
  setup.erase(job_at, setup.find("[machine]") - job_at);
  const auto oil = setup.find("oil = \"oil.toml\"");
  ASSERT_NE(oil, std::string::npos);
  setup.replace(oil, std::string("oil = \"oil.toml\"").size(), "oil = \"" + kDemo + "/oil.toml\"");
  setup += "\n[job]\ncustomer = \"Acme Mill\"\nserial = \"SN 4711\"\njob_number = \"J-2026-118\"\n"
           "date = \"2026-12-03\"\noperator = \"R. Meyer\"\nstand = \"Stand 2\"\ninstruments = \"cal. 2026-06\"\n"
           "oil = \"VG 46 batch 7\"\n";
  setup += "\n[outliers]\nthreshold = 3.5\nrule = \"exclude\"\n"
           "\n[[acceptance]]\nlabel = \"overall 1500 rpm 250 bar\"\nquantity = \"overall\"\nspeed = \"1500 rpm\"\n"
           "pressure = \"250 bar\"\nmin_percent = 50\n"
           "\n[[acceptance]]\nlabel = \"volumetric 1500 rpm 250 bar\"\nquantity = \"volumetric\"\nspeed = \"1500 rpm\"\n"
           "pressure = \"250 bar\"\nmin_percent = 99.9\n"
           "\n[[acceptance]]\nlabel = \"drain\"\nquantity = \"drain_flow\"\nmax = \"100 L/min\"\n"
           "\n[[acceptance]]\nlabel = \"not run\"\nquantity = \"overall\"\nspeed = \"3000 rpm\"\npressure = \"250 bar\"\n"
           "min_percent = 50\n";
  const std::string toml = tmp / "setup.toml", out = tmp / "out";
  write_file(toml, setup);
  const auto r = run({"test-stand", kDemo + "/test_stand.csv", "--setup", toml, "--out", out}, tmp);
  ASSERT_EQ(r.code, 0) << r.err << r.out;
  EXPECT_EQ(r.out.find("Schloesser fit"), std::string::npos);  // Wilson alone without [fit]
  EXPECT_NE(r.out.find("NOT accepted"), std::string::npos) << r.out;
  for (const char* job : {"Acme Mill", "SN 4711", "J-2026-118", "2026-12-03", "R. Meyer", "Stand 2", "cal. 2026-06",
                          "VG 46 batch 7"})
    EXPECT_NE(r.out.find(job), std::string::npos) << job;
  EXPECT_NE(r.out.find("externally studentized residual above 3.5"), std::string::npos);
  const auto acc = read_out(out + "/test_stand_acceptance.csv");
  ASSERT_EQ(acc.rows.size(), 4u);
  EXPECT_EQ(acc.text(0, "verdict"), "pass");
  EXPECT_EQ(acc.text(1, "verdict"), "FAIL");
  EXPECT_EQ(acc.text(2, "verdict"), "pass");
  EXPECT_EQ(acc.text(3, "verdict"), "NOT TESTED");
  // a bad criterion is refused with the file's line
  write_file(toml, setup + "\n[[acceptance]]\nquantity = \"overall\"\nspeed = \"1500 rpm\"\npressure = \"250 bar\"\n"
                           "min_percent = 150\n");
  const auto bad = run({"test-stand", kDemo + "/test_stand.csv", "--setup", toml, "--out", out}, tmp);
  EXPECT_NE(bad.code, 0);
  EXPECT_NE(bad.err.find("min_percent"), std::string::npos) << bad.err;
}

// ---- issue 20 (health at scale) and issue 16 (the baseline file)

namespace {
// The number after `label` in the report ("Baseline:         3.08 L/min ...").
double fact_number(const std::string& out, const std::string& label) {
  const auto at = out.find(label);
  if (at == std::string::npos) return std::nan("");
  return std::stod(out.substr(out.find_first_not_of(' ', at + label.size())));
}
}  // namespace

TEST(CliHealth, BaselineFileFromTestStand) {
  temp_dir tmp;
  const std::string out = tmp / "stand";
  const auto r = run({"test-stand", kDemo + "/test_stand.csv", "--setup", kDemo + "/test_stand.toml", "--out", out}, tmp);
  ASSERT_EQ(r.code, 0) << r.err;
  const std::string base = slurp(out + "/test_stand_baseline.toml");
  ASSERT_NE(base.find("[baseline]"), std::string::npos) << base;
  EXPECT_NE(base.find("never block"), std::string::npos);
  // the pump file of the demo with the baseline taken from the test-stand's file
  std::string pump = slurp(kDemo + "/pump_p31_health.toml");
  const auto b0 = pump.find("baseline_drain_flow");
  ASSERT_NE(b0, std::string::npos);
  pump.replace(b0, pump.find('\n', b0) - b0, "baseline_file = \"stand/test_stand_baseline.toml\"");
  write_file(tmp / "pump.toml", pump);
  write_file(tmp / "oil.toml", slurp(kDemo + "/oil.toml"));
  const auto h = run({"health", kDemo + "/field_readings.csv", "--pump", tmp / "pump.toml"}, tmp);
  ASSERT_EQ(h.code, 0) << h.err;
  EXPECT_NE(h.out.find("baseline readings of"), std::string::npos) << h.out;
  // the demo's truth (examples/demo/generate.py, baseline()): 3.082 L/min at 250 bar and 50 degC
  // of a new pump, 0.3 L/min of it the compensator's constant part; the test stand's readings
  // carry 1 % noise and its oil runs near 45 degC (self-calculated tolerance: 3 % and 0.15 L/min)
  EXPECT_NEAR(fact_number(h.out, "Baseline:"), 3.082, 0.03 * 3.082) << h.out;
  EXPECT_NEAR(fact_number(h.out, "Constant part:"), 0.3, 0.15) << h.out;
  // refused: the baseline of another oil
  std::string other_oil = slurp(kDemo + "/oil.toml");
  other_oil.replace(other_oil.find("grade = 46"), 10, "grade = 68");
  write_file(tmp / "oil.toml", other_oil);
  const auto bad = run({"health", kDemo + "/field_readings.csv", "--pump", tmp / "pump.toml"}, tmp);
  EXPECT_EQ(bad.code, 2);
  EXPECT_NE(bad.err.find("another oil"), std::string::npos) << bad.err;
}

TEST(CliHealth, ManyReadingsAreSummarised) {
  temp_dir tmp;
  // 5000 invented readings, a reading every 3 hours of running (the demo pump at 50 degC)
  std::string csv =
      "date,operating hours,outlet pressure [bar],oil temperature [degC],speed [rpm],drain flow [L/min],drain temperature [degC]\n";
  const long d0 = pumploss::days_from_civil(2023, 1, 1);
  for (int i = 0; i < 5000; ++i) {
    const double hours = 100 + 3.0 * i;
    const double q = 3.1 * (1 + 2e-5 * hours) * (1 + 0.01 * std::sin(1.7 * i));
    char line[96];
    std::snprintf(line, sizeof line, ",%.1f,250,50,1500,%.4f,54\n", hours, i == 777 ? 0.0 : q);
    csv += pumploss::civil_from_days(d0 + static_cast<long>(hours / 24)) + line;
  }
  const std::string file = tmp / "many.csv", out = tmp / "out";
  write_file(file, csv);
  const auto r = run({"health", file, "--pump", kDemo + "/pump_p31_health.toml", "--out", out}, tmp);
  ASSERT_EQ(r.code, 0) << r.err;
  // the text: head and tail, never every row; the CSV: every row
  EXPECT_LT(std::count(r.out.begin(), r.out.end(), '\n'), 200) << r.out.substr(0, 4000);
  EXPECT_NE(r.out.find("rows  (all in health_readings.csv)"), std::string::npos) << r.out.substr(0, 6000);
  EXPECT_NE(r.out.find("5000 readings"), std::string::npos);
  EXPECT_NE(r.out.find("4999 scored, 1 refused"), std::string::npos) << r.out.substr(0, 3000);
  const auto t = read_out(out + "/health_readings.csv");
  ASSERT_EQ(t.rows.size(), 5000u);
  EXPECT_EQ(t.text(777, "verdict"), "refused");
  EXPECT_EQ(read_out(out + "/health_refused.csv").rows.size(), 1u);
  // the plot aggregates: a median and a band per period, said in the legend; cautions kept
  const std::string svg = slurp(out + "/health.svg");
  EXPECT_NE(svg.find("median per"), std::string::npos);
  EXPECT_NE(svg.find("blows the shaft seal"), std::string::npos);
  EXPECT_LT(svg.size(), 200000u);
  // no scratch file left beside the output folder
  for (const auto& e : fs::directory_iterator(tmp.path)) EXPECT_EQ(e.path().filename().string().find(".partial"), std::string::npos);
}
