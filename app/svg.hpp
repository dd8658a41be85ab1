// A small SVG writer of our own for the report plots: line plots with axes, ticks, labels and a
// legend; horizontal limit lines; stacked areas; contour lines over a grid. Every drawn series is
// a <g> element with class="series" (or "limit", "area", "contour") and a data-name attribute,
// so tests and other tools can find it.
#ifndef PUMPLOSS_CLI_SVG_HPP
#define PUMPLOSS_CLI_SVG_HPP

#include <array>
#include <optional>
#include <string>
#include <vector>

namespace plcli::svg {

/// One axis.
struct axis {
  std::string label;
  bool log = false;    ///< logarithmic (values must be > 0)
  bool dates = false;  ///< values are days since 1970-01-01; ticks are labelled as dates
  std::optional<double> lo, hi;  ///< fixed range; otherwise from the data
};

/// A line (and/or markers) through points.
struct series {
  std::string name;
  std::vector<double> x, y;
  bool line = true;
  bool markers = true;
  bool dashed = false;
};

/// A horizontal line across the plot, e.g. an allowed case pressure.
struct limit_line {
  double y;
  std::string label;
};

/// Areas stacked on each other over a common x (layers[k][i] is the k-th layer at x[i]).
struct stack {
  std::vector<std::string> names;
  std::vector<double> x;
  std::vector<std::vector<double>> layers;
};

/// Contour lines of z over a grid: z[j][i] at (x[i], y[j]).
struct contour {
  std::vector<double> x, y;
  std::vector<std::vector<double>> z;
  std::vector<double> levels;
  std::string level_format = "{:.2f}";  ///< fmt format of a level label
};

/// Shaded rectangles in data coordinates {x0, y0, x1, y1}, drawn under the lines and contours
/// (e.g. the extrapolated cells of a map); a <g class="shade"> with the name in data-name.
struct shade {
  std::string name;
  std::vector<std::array<double, 4>> rects;
};

/// A plot.
struct plot {
  std::string title;
  std::string subtitle;
  axis x, y;
  std::vector<series> lines;
  std::vector<limit_line> limits;
  std::optional<stack> areas;
  std::optional<contour> contours;
  std::vector<shade> shades;        ///< shaded areas (grey), under everything else drawn
  std::vector<std::string> footer;  ///< lines below the plot (cautions), the drawing grows to hold them

  /// The SVG document (UTF-8). Throws std::invalid_argument when there is nothing to draw or a
  /// log axis has a value <= 0.
  std::string render(int width = 860, int height = 520) const;
};

/// "Nice" tick positions (1-2-5 steps) covering [lo, hi], about `target` of them.
std::vector<double> nice_ticks(double lo, double hi, int target = 6);

/// Escape &, <, >, " for XML text and attributes.
std::string xml_escape(const std::string& s);

}  // namespace plcli::svg

#endif
