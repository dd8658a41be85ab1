// Tests of the flow-test and rotary-budget subcommands on the demo file (examples/demo/
// flow_test_g12.toml): the outputs against the library's own evaluation of the same inputs, a
// malformed file, and the cautions in the help.
#include <gtest/gtest.h>

#include <cmath>
#include <cstdlib>
#include <filesystem>
#include <fstream>
#include <random>
#include <sstream>
#include <string>
#include <vector>

#include "pumploss/flow_test.hpp"
#include "pumploss/gear_pump.hpp"

namespace fs = std::filesystem;

namespace {

const std::string kExe = PUMPLOSS_CLI_EXE;
const std::string kDemo = PUMPLOSS_DEMO_DIR;

struct scratch {
  fs::path path;
  scratch() {
    std::random_device rd;
    path = fs::temp_directory_path() / ("pumploss_cli_flow_" + std::to_string(rd()) + std::to_string(rd()));
    fs::create_directories(path);
  }
  ~scratch() {
    std::error_code ec;
    fs::remove_all(path, ec);
  }
  std::string operator/(const std::string& n) const { return (path / n).string(); }
};

std::string slurp(const std::string& p) {
  std::ifstream in(p, std::ios::binary);
  std::stringstream ss;
  ss << in.rdbuf();
  return ss.str();
}

// Run the program; the exit code and the standard output.
std::pair<int, std::string> run(const std::string& args, const scratch& s) {
  const std::string out = s / ".stdout";
  const int st = std::system((kExe + " " + args + " >'" + out + "' 2>&1").c_str());
  return {WIFEXITED(st) ? WEXITSTATUS(st) : -1, slurp(out)};
}

// A CSV table written by the program: header cells and rows (comment lines '#' skipped).
struct csv {
  std::vector<std::string> head;
  std::vector<std::vector<std::string>> rows;
  double num(std::size_t r, const std::string& col) const {
    for (std::size_t c = 0; c < head.size(); ++c)
      if (head[c] == col) return std::stod(rows.at(r).at(c));
    ADD_FAILURE() << "no column " << col;
    return NAN;
  }
};
csv read(const std::string& path) {
  csv t;
  std::stringstream in(slurp(path));
  std::string line;
  while (std::getline(in, line)) {
    if (line.empty() || line[0] == '#') continue;
    std::vector<std::string> cells;
    std::stringstream ls(line);
    std::string cell;
    while (std::getline(ls, cell, ',')) cells.push_back(cell.size() > 1 && cell.front() == '"' ? cell.substr(1, cell.size() - 2) : cell);
    if (t.head.empty())
      t.head = cells;
    else
      t.rows.push_back(cells);
  }
  return t;
}

// The demo's oil (VG 46 with 6.8 cSt at 100 degC, 875 kg/m3 at 15 degC) built from the library.
pumploss::oil<double> demo_oil() {
  auto o = pumploss::typical_mineral_oil(pumploss::d341_fit(313.15, 46e-6, 373.15, 6.8e-6).value);
  o.rho_ref_kg_m3 = 875.0;
  o.t_ref_k = 288.15;
  return o;
}

bool has_cautions(const std::string& s) {
  return s.find("store energy") != std::string::npos && s.find("injection injury") != std::string::npos &&
         s.find("engineering estimates") != std::string::npos;
}

TEST(CliFlowTest, DemoMatchesLibrary) {
  scratch s;
  const auto [code, out] = run("flow-test '" + kDemo + "/flow_test_g12.toml' --out '" + (s / "o") + "'", s);
  ASSERT_EQ(code, 0) << out;
  const auto o = demo_oil();
  pumploss::flow_test_setup<double> st{};
  st.displacement_m3_rev = 12e-6;
  st.hydromech_efficiency = 0.85;
  st.motor = {25.0, 1450.0 / 60, 7500.0};
  st.mu_test_pa_s = pumploss::oil_dynamic_viscosity(o, 318.15, 0.0).value;
  st.mu_ref_pa_s = pumploss::oil_dynamic_viscosity(o, 323.15, 0.0).value;
  st.ref_pressure_pa = 180e5;
  st.ref_speed_rev_s = 1450.0 / 60;
  st.new_volumetric_efficiency = 0.94;
  st.limit = 0.85;
  st.watch_band = 0.05;
  const auto r = pumploss::flow_test_evaluate(pumploss::flow_reading<double>{17.9 / 60000, 5e5, 0.0},
                                              pumploss::flow_reading<double>{14.9 / 60000, 180e5, 0.0}, st);
  ASSERT_EQ(r.st, pumploss::status::ok);
  const auto t = read(s / "o/flow_test_readings.csv");
  ASSERT_EQ(t.rows.size(), 3u);
  EXPECT_NEAR(t.num(1, "speed [rpm]") / 60 / r.speed_loaded_rev_s, 1.0, 1e-9);
  EXPECT_NEAR(t.num(1, "leakage [L/min]") / 60000 / r.leakage_m3_s, 1.0, 1e-9);
  EXPECT_NEAR(t.num(2, "volumetric efficiency percent") / 100 / r.volumetric_efficiency_ref, 1.0, 1e-9);
  EXPECT_NE(out.find(std::string("Verdict:                ") + pumploss::flow_verdict_name(r.verdict)),
            std::string::npos)
      << out;
  EXPECT_TRUE(has_cautions(out));
  EXPECT_TRUE(has_cautions(slurp(s / "o/flow_test.txt")));
}

TEST(CliRotaryBudget, DemoMatchesLibrary) {
  scratch s;
  const auto [code, out] = run("rotary-budget '" + kDemo + "/flow_test_g12.toml' --out '" + (s / "o") + "'", s);
  ASSERT_EQ(code, 0) << out;
  pumploss::gear_pump<double> g;
  g.displacement_m3_rev = 12e-6;
  g.tip_radius_m = 0.0165;
  g.root_radius_m = 0.011;
  g.shaft_radius_m = 0.0085;
  g.face_width_m = 0.025;
  g.tip_land_m = 0.001;
  g.teeth_sealing = 4;
  g.tip_clearance_m = 25e-6;
  g.balanced_bushings = true;
  g.lateral_clearance_m = 10e-6;
  g.lateral_arc_rad = pumploss::detail::pi<double>();
  g.mesh_clearance_m = 3e-6;
  g.mesh_length_m = 1.5e-3;
  const auto t = read(s / "o/gear_budget_flows.csv");
  ASSERT_EQ(t.rows.size(), 9u);  // 40 to 200 bar in 20 bar steps
  for (std::size_t i = 0; i < t.rows.size(); ++i) {
    const double p = t.num(i, "outlet pressure [bar]") * 1e5;
    const auto b = pumploss::gear_pump_budget(g, demo_oil(), pumploss::rotary_operating_point<double>{p, 0.0, 1450.0 / 60, 323.15});
    EXPECT_NEAR(t.num(i, "total [L/min]") / 60000 / b.total_m3_s, 1.0, 1e-9) << i;
    EXPECT_NEAR(t.num(i, "tooth-tip [L/min]") / 60000 / b.flow_m3_s[0], 1.0, 1e-9) << i;
  }
  EXPECT_TRUE(has_cautions(out));
}

TEST(CliFlowTest, MalformedFileNamesItsPlaceAndWritesNothing) {
  scratch s;
  std::string text = slurp(kDemo + "/flow_test_g12.toml");
  const std::string key = "new_volumetric_efficiency_percent = 94";
  text.replace(text.find(key), key.size(), "new_volumetric_efficiency_percent = 140");
  std::ofstream(s / "bad.toml") << text;
  const auto [code, out] = run("flow-test '" + (s / "bad.toml") + "' --out '" + (s / "o") + "'", s);
  EXPECT_EQ(code, 2);
  EXPECT_NE(out.find("new_volumetric_efficiency_percent"), std::string::npos) << out;
  EXPECT_FALSE(fs::exists(s / "o"));
  // loaded pressure below the no-load pressure: refused by the library
  text = slurp(kDemo + "/flow_test_g12.toml");
  text.replace(text.find("pressure = \"180 bar\"\n\n[verdict]"), 20, "pressure = \"2 bar\"  ");
  std::ofstream(s / "bad2.toml") << text;
  EXPECT_EQ(run("flow-test '" + (s / "bad2.toml") + "'", s).first, 2);
}

TEST(CliFlowTest, HelpCarriesTheCautions) {
  scratch s;
  for (const char* sub : {"flow-test", "rotary-budget"}) {
    const auto [code, out] = run(std::string(sub) + " --help", s);
    EXPECT_EQ(code, 0) << sub;
    EXPECT_TRUE(has_cautions(out)) << out;
  }
}

}  // namespace
