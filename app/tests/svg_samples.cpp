// Writes one SVG of each plot kind the reports use (multi-line with a limit line, date axis,
// stacked areas, contour), with simple made-up shapes, for the XML and browser tests.
// Usage: cli_svg_samples OUTPUT_FOLDER
#include <cmath>
#include <cstdio>
#include <fstream>
#include <string>

#include "csv.hpp"
#include "svg.hpp"

using namespace plcli::svg;

static void save(const std::string& dir, const char* name, const plot& p) {
  std::ofstream(dir + "/" + name) << p.render();
}

int main(int argc, char** argv) {
  if (argc != 2) {
    std::fprintf(stderr, "usage: cli_svg_samples OUTPUT_FOLDER\n");
    return 1;
  }
  const std::string dir = argv[1];
  {  // case pressure over temperature with the allowed value
    plot p;
    p.title = "sample: case pressure over temperature";
    p.x.label = "oil temperature [degC]";
    p.y.label = "case pressure [bar]";
    series a{"12.7 mm line", {}, {}, true, true, false}, b{"19.1 mm line", {}, {}, true, true, true};
    for (int t = 0; t <= 70; t += 10) {
      a.x.push_back(t);
      a.y.push_back(6.0 * std::exp(-0.05 * t));
      b.x.push_back(t);
      b.y.push_back(1.2 * std::exp(-0.05 * t));
    }
    p.lines = {a, b};
    p.limits.push_back({1.0, "allowed 1.0 bar"});
    save(dir, "lines.svg", p);
  }
  {  // trend over dates with band edges
    plot p;
    p.title = "sample: trend over dates";
    p.x.label = "date";
    p.x.dates = true;
    p.y.label = "drain flow share [%]";
    series s{"normalised drain flow", {}, {}, true, true, false};
    for (int k = 0; k < 24; ++k) {
      s.x.push_back(static_cast<double>(plcli::days_from_civil(2023, 1 + k % 12, 10) + (k / 12) * 365));
      s.y.push_back(4.0 + 0.2 * k);
    }
    p.lines = {s};
    p.limits = {{6, "watch"}, {10, "plan overhaul"}};
    save(dir, "dates.svg", p);
  }
  {  // stacked areas
    plot p;
    p.title = "sample: stacked areas";
    p.x.label = "pressure [bar]";
    p.y.label = "flow [L/min]";
    stack st;
    st.names = {"path A", "path B", "path C"};
    st.layers.resize(3);
    for (int b = 20; b <= 260; b += 20) {
      st.x.push_back(b);
      st.layers[0].push_back(0.01 * b);
      st.layers[1].push_back(0.004 * b);
      st.layers[2].push_back(0.3);
    }
    p.areas = st;
    save(dir, "stack.svg", p);
  }
  {  // contour of a bowl-shaped function
    plot p;
    p.title = "sample: contour";
    p.x.label = "speed [rpm]";
    p.y.label = "pressure [bar]";
    contour c;
    for (int i = 0; i <= 28; ++i) c.x.push_back(400 + 50.0 * i);
    for (int j = 0; j <= 26; ++j) c.y.push_back(20 + 10.0 * j);
    for (const double y : c.y) {
      std::vector<double> row;
      for (const double x : c.x) row.push_back(0.92 - 0.1 * std::pow((x - 1300) / 900, 2) - 0.1 * std::pow((y - 180) / 160, 2));
      c.z.push_back(row);
    }
    c.levels = {0.86, 0.88, 0.90, 0.91};
    p.contours = c;
    save(dir, "contour.svg", p);
  }
  return 0;
}
