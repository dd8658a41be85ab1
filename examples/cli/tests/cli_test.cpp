// Tests of the pumploss command-line program. Outputs are checked against values the test
// computes with the library itself, never against a stored copy of a report.
#include <gtest/gtest.h>

#include <cmath>
#include <cstdio>
#include <cstdlib>
#include <filesystem>
#include <fstream>
#include <random>
#include <sstream>
#include <string>

#include "config.hpp"
#include "csv.hpp"
#include "inputs.hpp"
#include "pumploss/pumploss.hpp"
#include "report.hpp"
#include "svg.hpp"

namespace fs = std::filesystem;
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

std::vector<plcli::column_spec> oil_csv_columns() {
  using plcli::column_kind;
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
  const auto d = plcli::read_csv(out + "/oil_properties.csv", oil_csv_columns());
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
    EXPECT_EQ(d.texts[d.col("viscosity check")][i], expect) << t;
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
  const auto d = plcli::read_csv(out + "/oil_properties.csv", oil_csv_columns());
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

// ------------------------------------------------------------------------------ pending modules

TEST(CliPending, EachPendingCommandReadsTheDemoAndStopsWithCode3) {
  temp_dir tmp;
  const std::string out = tmp / "out";
  struct c {
    std::vector<std::string> args;
    std::string summary;
  };
  const std::vector<c> cases = {
      {{"test-stand", kDemo + "/test_stand.csv", "--setup", kDemo + "/test_stand.toml", "--out", out},
       "30 operating points"},
      {{"drain-line", kDemo + "/drain_line.toml", "--size", "--out", out}, "segments: 2"},
      {{"health", kDemo + "/field_readings.csv", "--pump", kDemo + "/pump_p31.toml", "--out", out},
       "42 field readings"},
      {{"budget", kDemo + "/pump_p31.toml", "--out", out}, "9 pistons"},
  };
  for (const auto& k : cases) {
    const auto r = run(k.args, tmp);
    EXPECT_EQ(r.code, 3) << k.args[0] << ": " << r.err;
    EXPECT_NE(r.out.find(k.summary), std::string::npos) << k.args[0] << ": " << r.out;
    EXPECT_NE(r.err.find("not in this build yet"), std::string::npos) << r.err;
    EXPECT_FALSE(fs::exists(out)) << k.args[0] << " wrote files without results";
  }
}

TEST(CliPending, TestStandGridIsFiveSpeedsBySixPressures) {
  // The demo generator's grid, recovered by the reader (values converted from the header units).
  const auto d = plcli::read_csv(kDemo + "/test_stand.csv", plcli::stand_columns());
  ASSERT_EQ(d.rows(), 30u);
  for (std::size_t i = 0; i < d.rows(); ++i) {
    const double rpm = d.si("speed")[i] * 60.0;
    EXPECT_NEAR(rpm, 500.0 + 250.0 * static_cast<double>(i / 6), 3.0);
    // consistency of the invented data: outlet flow below the geometric flow, drain flow below the loss
    const double q_th = 71e-6 * d.si("speed")[i];
    EXPECT_LT(d.si("outlet flow")[i], q_th);
    EXPECT_LT(d.si("drain flow")[i], q_th - d.si("outlet flow")[i] + 1e-6);
    // torque above the theoretical torque of a pump
    const double dp = d.si("outlet pressure")[i] - d.si("inlet pressure")[i];
    EXPECT_GT(d.si("torque")[i], 71e-6 * dp / (2 * M_PI));
  }
}

TEST(CliPending, PumpFileGeometryGivesItsDisplacement) {
  const auto p = plcli::read_pump(kDemo + "/pump_p31.toml");
  EXPECT_EQ(p.pistons, 9);
  const double vg = 9 * M_PI / 4 * 0.017 * 0.017 * 2 * 0.0568 * std::tan(17 * M_PI / 180);
  EXPECT_LT(rel(p.geometric_displacement_m3_rev(), vg), 1e-12);
  EXPECT_LT(std::fabs(vg / 71e-6 - 1), 0.01);
  EXPECT_NEAR(p.baseline_drain_m3_s, 4.0 / 60000, 1e-12);
  const auto d = plcli::read_drain_line(kDemo + "/drain_line.toml");
  EXPECT_EQ(d.segments.size(), 2u);
  EXPECT_EQ(d.fittings[0].count, 3);
  EXPECT_NEAR(d.fittings[0].inside_diameter_m, 0.013, 1e-12);  // from the segment before it
  EXPECT_NEAR(d.components[0].curve[1].second, 5000.0, 1e-9);
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
  // header is line 3 (two comment lines); drop the drain flow column from the header only
  std::string s = demo_stand();
  const std::string head = line_at(s, 3);
  std::string cut = head;
  cut.erase(cut.find(",drain flow [L/min]"), std::string(",drain flow [L/min]").size());
  expect_rejected(replace_line(s, 3, cut), "3:", "missing column 'drain flow'");
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
  std::string head = line_at(s, 3);
  head.replace(head.find("[N.m]"), 5, "[Nm]");
  expect_rejected(replace_line(s, 3, head), "3:", "unknown unit 'Nm'");
}

TEST(CliMalformed, UnitOfTheWrongQuantity) {
  std::string s = demo_stand();
  std::string head = line_at(s, 3);
  head.replace(head.find("[L/min]"), 7, "[bar]");
  expect_rejected(replace_line(s, 3, head), "3:", "is a unit of pressure");
}

TEST(CliMalformed, EmptyFile) { expect_rejected("", "1:", "empty"); }

TEST(CliMalformed, OnlyAHeader) {
  expect_rejected("# no rows yet\n" + line_at(demo_stand(), 3) + "\n", "2:", "no data rows");
}

TEST(CliMalformed, WrongDelimiter) {
  std::string s = demo_stand();
  for (auto& c : s)
    if (c == ',') c = ';';
  expect_rejected(s, "3:", "separated by ';'");
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

// ------------------------------------------------------------------------------ framework pieces

TEST(CsvReader, ConvertsHeaderUnitsToSi) {
  temp_dir tmp;
  const std::string f = tmp / "a.csv";
  write_file(f, "\xEF\xBB\xBF# comment\nP [psi], Q [gpm],T [degF],note\n100,2,212,\"a, b\"\n\n1e3,0.5,32,x\n");
  using plcli::column_kind;
  const auto d = plcli::read_csv(f, {{"p", column_kind::quantity, dimension::pressure, true},
                                     {"q", column_kind::quantity, dimension::volume_flow, true},
                                     {"t", column_kind::quantity, dimension::temperature, true},
                                     {"note", column_kind::text, dimension::pressure, true}});
  ASSERT_EQ(d.rows(), 2u);
  EXPECT_EQ(d.line[1], 5);
  EXPECT_LT(rel(d.si("p")[0], pumploss::convert(100.0, "psi", "Pa").value), 1e-15);
  EXPECT_LT(rel(d.si("q")[1], pumploss::convert(0.5, "gpm", "m3/s").value), 1e-15);
  EXPECT_NEAR(d.si("t")[0], 373.15, 1e-12);
  EXPECT_EQ(d.texts[3][0], "a, b");
}

TEST(CsvReader, DatesAndCalendar) {
  EXPECT_EQ(plcli::days_from_civil(1970, 1, 1), 0);
  EXPECT_EQ(plcli::civil_from_days(plcli::days_from_civil(2024, 2, 29)), "2024-02-29");
  temp_dir tmp;
  const std::string f = tmp / "d.csv";
  write_file(f, "date,x\n2023-02-29,1\n");
  using plcli::column_kind;
  try {
    plcli::read_csv(f, {{"date", column_kind::date, dimension::pressure, true},
                        {"x", column_kind::number, dimension::pressure, true}});
    FAIL() << "2023-02-29 accepted";
  } catch (const plcli::input_error& e) {
    EXPECT_EQ(e.line(), 2);
    EXPECT_EQ(e.column(), 1);
  }
}

TEST(CsvReader, RefusesInfNanAndUnknownColumns) {
  temp_dir tmp;
  using plcli::column_kind;
  const std::vector<plcli::column_spec> spec = {{"x", column_kind::number, dimension::pressure, true}};
  for (const char* bad : {"x\ninf\n", "x\nnan\n", "x\n0x10\n", "x,y\n1,2\n", "x\n1e999\n"}) {
    write_file(tmp / "b.csv", bad);
    EXPECT_THROW(plcli::read_csv(tmp / "b.csv", spec), plcli::input_error) << bad;
  }
}

TEST(ReportWriter, AlignsColumnsShowsUnitsAndEndsWithCautions) {
  plcli::report r;
  r.title = "T";
  plcli::table t;
  t.name = "x";
  t.cols = {{"pressure", plcli::cell_kind::quantity, dimension::pressure, 4},
            {"efficiency", plcli::cell_kind::percent, dimension::pressure, 3}};
  t.rows = {{25e6, 0.9123}, {2e5, std::nan("")}};
  r.tables.push_back(t);
  plcli::display_units u;
  u.choose("psi");
  const std::string text = plcli::render_text(r, u);
  EXPECT_NE(text.find("pressure [psi]"), std::string::npos) << text;
  EXPECT_NE(text.find("3626"), std::string::npos) << text;
  EXPECT_NE(text.find("91.2"), std::string::npos) << text;
  EXPECT_TRUE(has_cautions(text));
  EXPECT_EQ(text.rfind("take precedence.\n"), text.size() - 17);
  const std::string csv = plcli::render_csv(t, u);
  EXPECT_EQ(csv.substr(0, csv.find('\n')), "pressure [psi],efficiency percent");
  EXPECT_NE(csv.find("\n3625.943443,91.23\n"), std::string::npos) << csv;
  EXPECT_NE(csv.find("# CAUTIONS"), std::string::npos);
}

TEST(SvgWriter, NiceTicksAndEscaping) {
  const auto t = plcli::svg::nice_ticks(0.0, 250.0);
  ASSERT_FALSE(t.empty());
  EXPECT_EQ(t.front(), 0.0);
  EXPECT_EQ(t.back(), 250.0);
  EXPECT_EQ(plcli::svg::xml_escape("a<b & \"c\">"), "a&lt;b &amp; &quot;c&quot;&gt;");
  plcli::svg::plot p;
  EXPECT_THROW(p.render(), std::invalid_argument);  // nothing to draw
  p.y.log = true;
  p.lines.push_back({"s", {1, 2}, {0.0, 1.0}, true, true, false});
  EXPECT_THROW(p.render(), std::invalid_argument);  // zero on a log axis
}
