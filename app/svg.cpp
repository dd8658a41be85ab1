#include "svg.hpp"

#include <fmt/format.h>

#include <algorithm>
#include <array>
#include <cmath>
#include <limits>
#include <stdexcept>

#include "csv.hpp"

namespace plcli::svg {

namespace {

const char* const kPalette[] = {"#1f5f99", "#c8501e", "#2e8540", "#7a3f9d", "#b8860b",
                                "#0f8b8d", "#a23b72", "#555555", "#d1495b", "#3d5a80"};
constexpr std::size_t kPaletteSize = sizeof kPalette / sizeof kPalette[0];

std::string num(double v) { return fmt::format("{:.2f}", v); }

struct range {
  double lo = std::numeric_limits<double>::infinity();
  double hi = -std::numeric_limits<double>::infinity();
  void add(double v) {
    if (!std::isfinite(v)) return;
    lo = std::min(lo, v);
    hi = std::max(hi, v);
  }
  bool empty() const { return !(lo <= hi); }
};

struct mapper {
  double p0, p1;  // pixel positions of lo and hi
  double lo, hi;
  bool log;
  double operator()(double v) const {
    const double a = log ? std::log10(v) : v;
    const double l = log ? std::log10(lo) : lo;
    const double h = log ? std::log10(hi) : hi;
    return p0 + (a - l) / (h - l) * (p1 - p0);
  }
};

void finish_range(range& r, const axis& a) {
  if (a.lo) r.lo = *a.lo;
  if (a.hi) r.hi = *a.hi;
  if (r.empty()) throw std::invalid_argument("plot: nothing to draw");
  if (a.log && !(r.lo > 0)) throw std::invalid_argument("plot: a logarithmic axis needs values above zero");
  if (r.lo == r.hi) {
    const double d = r.lo == 0 ? 1.0 : std::fabs(r.lo) * 0.05;
    r.lo -= d;
    r.hi += d;
  }
  if (a.dates && !a.lo && !a.hi) {  // dates: a small margin, ticks at month starts
    const double pad = std::max(1.0, 0.02 * (r.hi - r.lo));
    r.lo -= pad;
    r.hi += pad;
    return;
  }
  if (!a.log && !a.lo && !a.hi) {  // widen to nice tick positions
    const auto t = nice_ticks(r.lo, r.hi);
    const double step = t.size() > 1 ? t[1] - t[0] : 1.0;
    r.lo = std::floor(r.lo / step + 1e-9) * step;
    r.hi = std::ceil(r.hi / step - 1e-9) * step;
  }
  if (a.log && !a.lo && !a.hi) {
    r.lo = std::pow(10.0, std::floor(std::log10(r.lo) + 1e-9));
    r.hi = std::pow(10.0, std::ceil(std::log10(r.hi) - 1e-9));
  }
}

std::vector<std::pair<double, std::string>> ticks_for(const axis& a, double lo, double hi) {
  std::vector<std::pair<double, std::string>> out;
  if (a.log) {
    const int d0 = static_cast<int>(std::floor(std::log10(lo) + 1e-9));
    const int d1 = static_cast<int>(std::ceil(std::log10(hi) - 1e-9));
    const bool minor = d1 - d0 <= 3;
    for (int d = d0; d <= d1; ++d) {
      for (const double m : {1.0, 2.0, 5.0}) {
        if (m != 1.0 && !minor) continue;
        const double v = m * std::pow(10.0, d);
        if (v < lo * (1 - 1e-9) || v > hi * (1 + 1e-9)) continue;
        out.emplace_back(v, fmt::format("{:g}", v));
      }
    }
    return out;
  }
  if (a.dates) {
    // month starts, thinned to at most about 8 labels
    const std::string s0 = civil_from_days(static_cast<long>(std::floor(lo)));
    int y = std::stoi(s0.substr(0, 4));
    int m = std::stoi(s0.substr(5, 2));
    std::vector<double> months;
    for (int k = 0; k < 1200; ++k) {
      const double d = static_cast<double>(days_from_civil(y, m, 1));
      if (d > hi) break;
      if (d >= lo) months.push_back(d);
      if (++m > 12) {
        m = 1;
        ++y;
      }
    }
    std::size_t step = 1;
    for (const std::size_t s : {1u, 2u, 3u, 6u, 12u, 24u, 60u}) {
      step = s;
      if (months.size() / s <= 8) break;
    }
    for (std::size_t k = 0; k < months.size(); ++k) {
      const std::string date = civil_from_days(static_cast<long>(months[k]));
      const int month = std::stoi(date.substr(5, 2));
      if (step >= 12 ? month != 1 : (month - 1) % static_cast<int>(step) != 0) continue;
      out.emplace_back(months[k], date.substr(0, 7));
    }
    return out;
  }
  for (const double v : nice_ticks(lo, hi)) {
    if (v < lo - 1e-9 * (hi - lo) || v > hi + 1e-9 * (hi - lo)) continue;
    const double clean = std::fabs(v) < 1e-12 * (hi - lo) ? 0.0 : v;
    out.emplace_back(clean, fmt::format("{:g}", clean));
  }
  return out;
}

// Marching squares: segments of the level line through one grid cell.
void cell_segments(double x0, double x1, double y0, double y1, double z00, double z10, double z01, double z11,
                   double level, std::vector<std::array<double, 4>>& seg) {
  // corners: a=(x0,y0) z00, b=(x1,y0) z10, c=(x1,y1) z11, d=(x0,y1) z01
  const int idx = (z00 > level ? 1 : 0) | (z10 > level ? 2 : 0) | (z11 > level ? 4 : 0) | (z01 > level ? 8 : 0);
  if (idx == 0 || idx == 15) return;
  auto lerp = [&](double za, double zb) { return (level - za) / (zb - za); };
  const std::array<double, 2> bottom = {x0 + lerp(z00, z10) * (x1 - x0), y0};
  const std::array<double, 2> right = {x1, y0 + lerp(z10, z11) * (y1 - y0)};
  const std::array<double, 2> top = {x0 + lerp(z01, z11) * (x1 - x0), y1};
  const std::array<double, 2> left = {x0, y0 + lerp(z00, z01) * (y1 - y0)};
  auto add = [&](const std::array<double, 2>& p, const std::array<double, 2>& q) {
    seg.push_back({p[0], p[1], q[0], q[1]});
  };
  const double centre = (z00 + z10 + z01 + z11) / 4;
  switch (idx) {
    case 1: case 14: add(left, bottom); break;
    case 2: case 13: add(bottom, right); break;
    case 3: case 12: add(left, right); break;
    case 4: case 11: add(right, top); break;
    case 6: case 9: add(bottom, top); break;
    case 7: case 8: add(left, top); break;
    case 5:
      if (centre > level) { add(left, top); add(bottom, right); } else { add(left, bottom); add(right, top); }
      break;
    case 10:
      if (centre > level) { add(left, bottom); add(right, top); } else { add(left, top); add(bottom, right); }
      break;
    default: break;
  }
}

}  // namespace

std::string xml_escape(const std::string& s) {
  std::string out;
  for (const char c : s) {
    switch (c) {
      case '&': out += "&amp;"; break;
      case '<': out += "&lt;"; break;
      case '>': out += "&gt;"; break;
      case '"': out += "&quot;"; break;
      default: out += c;
    }
  }
  return out;
}

std::vector<double> nice_ticks(double lo, double hi, int target) {
  std::vector<double> out;
  if (!(hi > lo) || !std::isfinite(lo) || !std::isfinite(hi)) return out;
  const double raw = (hi - lo) / std::max(1, target);
  const double p = std::pow(10.0, std::floor(std::log10(raw)));
  double step = p;
  for (const double m : {1.0, 2.0, 2.5, 5.0, 10.0}) {
    step = m * p;
    if (step >= raw) break;
  }
  const double first = std::ceil(lo / step - 1e-9) * step;
  for (int k = 0; k < 1000; ++k) {
    const double v = first + k * step;
    if (v > hi + 1e-9 * step) break;
    out.push_back(v);
  }
  return out;
}

namespace {
int footer_height(const std::vector<std::string>& footer) {
  return footer.empty() ? 0 : 14 * static_cast<int>(footer.size()) + 8;
}
}  // namespace

std::string plot::render(int width, int height) const {
  const double W = width, H = height;
  const double left = 78, right = 210, top = subtitle.empty() ? 48 : 66, bottom = 62;
  const double px0 = left, px1 = W - right, py0 = H - bottom, py1 = top;

  range rx, ry;
  for (const auto& s : lines)
    for (std::size_t i = 0; i < std::min(s.x.size(), s.y.size()); ++i) {
      rx.add(s.x[i]);
      ry.add(s.y[i]);
    }
  for (const auto& l : limits) ry.add(l.y);
  if (areas) {
    for (const double v : areas->x) rx.add(v);
    ry.add(0.0);
    for (std::size_t i = 0; i < areas->x.size(); ++i) {
      double sum = 0;
      for (const auto& layer : areas->layers) sum += layer.at(i);
      ry.add(sum);
    }
  }
  if (contours) {
    for (const double v : contours->x) rx.add(v);
    for (const double v : contours->y) ry.add(v);
  }
  finish_range(rx, x);
  finish_range(ry, y);
  const mapper mx{px0, px1, rx.lo, rx.hi, x.log};
  const mapper my{py0, py1, ry.lo, ry.hi, y.log};

  std::string o;
  o += fmt::format(
      "<?xml version=\"1.0\" encoding=\"UTF-8\"?>\n"
      "<svg xmlns=\"http://www.w3.org/2000/svg\" width=\"{0}\" height=\"{1}\" viewBox=\"0 0 {0} {1}\" "
      "font-family=\"DejaVu Sans, Arial, Helvetica, sans-serif\" font-size=\"12\">\n",
      width, height + footer_height(footer));
  o += "<title>" + xml_escape(title) + "</title>\n";
  o += fmt::format("<rect x=\"0\" y=\"0\" width=\"{}\" height=\"{}\" fill=\"#ffffff\"/>\n", width,
                   height + footer_height(footer));
  o += fmt::format("<text x=\"{}\" y=\"24\" font-size=\"16\" font-weight=\"bold\">{}</text>\n", num(left),
                   xml_escape(title));
  if (!subtitle.empty())
    o += fmt::format("<text x=\"{}\" y=\"44\" font-size=\"12\" fill=\"#444444\">{}</text>\n", num(left),
                     xml_escape(subtitle));

  // grid and ticks
  const auto xt = ticks_for(x, rx.lo, rx.hi);
  const auto yt = ticks_for(y, ry.lo, ry.hi);
  o += "<g class=\"grid\" stroke=\"#dddddd\" stroke-width=\"1\">\n";
  for (const auto& t : xt)
    o += fmt::format("<line x1=\"{0}\" y1=\"{1}\" x2=\"{0}\" y2=\"{2}\"/>\n", num(mx(t.first)), num(py0), num(py1));
  for (const auto& t : yt)
    o += fmt::format("<line x1=\"{1}\" y1=\"{0}\" x2=\"{2}\" y2=\"{0}\"/>\n", num(my(t.first)), num(px0), num(px1));
  o += "</g>\n";

  o += fmt::format("<clipPath id=\"plotarea\"><rect x=\"{}\" y=\"{}\" width=\"{}\" height=\"{}\"/></clipPath>\n",
                   num(px0), num(py1), num(px1 - px0), num(py0 - py1));

  struct legend_entry {
    std::string name, color, kind;
    bool dashed;
  };
  std::vector<legend_entry> legend;

  if (areas) {
    std::vector<double> base(areas->x.size(), 0.0);
    for (std::size_t k = 0; k < areas->layers.size(); ++k) {
      const std::string color = kPalette[k % kPaletteSize];
      const std::string name = k < areas->names.size() ? areas->names[k] : fmt::format("layer {}", k + 1);
      std::string d;
      for (std::size_t i = 0; i < areas->x.size(); ++i)
        d += fmt::format("{}{},{} ", i == 0 ? "M" : "L", num(mx(areas->x[i])), num(my(base[i] + areas->layers[k][i])));
      for (std::size_t i = areas->x.size(); i-- > 0;) d += fmt::format("L{},{} ", num(mx(areas->x[i])), num(my(base[i])));
      d += "Z";
      o += fmt::format(
          "<g class=\"area\" data-name=\"{}\" clip-path=\"url(#plotarea)\"><path d=\"{}\" fill=\"{}\" "
          "fill-opacity=\"0.75\" stroke=\"{}\" stroke-width=\"1\"/></g>\n",
          xml_escape(name), d, color, color);
      for (std::size_t i = 0; i < base.size(); ++i) base[i] += areas->layers[k][i];
      legend.push_back({name, color, "area", false});
    }
  }

  for (const auto& sh : shades) {  // shaded areas: grey, under the contours and lines
    std::string d;
    for (const auto& q : sh.rects)
      d += fmt::format("M{},{} H{} V{} H{} Z ", num(mx(q[0])), num(my(q[1])), num(mx(q[2])), num(my(q[3])), num(mx(q[0])));
    o += fmt::format("<g class=\"shade\" data-name=\"{}\" clip-path=\"url(#plotarea)\"><path d=\"{}\" fill=\"#9a9a9a\" "
                     "fill-opacity=\"0.35\" stroke=\"none\"/></g>\n",
                     xml_escape(sh.name), d);
    legend.push_back({sh.name, "#9a9a9a", "area", false});
  }

  if (contours) {
    const auto& c = *contours;
    for (std::size_t k = 0; k < c.levels.size(); ++k) {
      const double level = c.levels[k];
      std::vector<std::array<double, 4>> seg;
      for (std::size_t j = 0; j + 1 < c.y.size(); ++j)
        for (std::size_t i = 0; i + 1 < c.x.size(); ++i)
          cell_segments(c.x[i], c.x[i + 1], c.y[j], c.y[j + 1], c.z[j][i], c.z[j][i + 1], c.z[j + 1][i],
                        c.z[j + 1][i + 1], level, seg);
      const std::string color = kPalette[k % kPaletteSize];
      const std::string label = fmt::format(fmt::runtime(c.level_format), level);
      std::string d;
      for (const auto& s : seg) d += fmt::format("M{},{} L{},{} ", num(mx(s[0])), num(my(s[1])), num(mx(s[2])), num(my(s[3])));
      o += fmt::format("<g class=\"contour\" data-name=\"{}\" data-level=\"{}\" clip-path=\"url(#plotarea)\">",
                       xml_escape(label), fmt::format("{:g}", level));
      if (!seg.empty()) {
        o += fmt::format("<path d=\"{}\" fill=\"none\" stroke=\"{}\" stroke-width=\"1.8\"/>", d, color);
        const auto& mid = seg[seg.size() / 2];
        o += fmt::format(
            "<text x=\"{}\" y=\"{}\" font-size=\"11\" fill=\"{}\" stroke=\"#ffffff\" stroke-width=\"3\" "
            "paint-order=\"stroke\">{}</text>",
            num(mx((mid[0] + mid[2]) / 2) + 3), num(my((mid[1] + mid[3]) / 2) - 3), color, xml_escape(label));
      }
      o += "</g>\n";
      legend.push_back({label, color, "line", false});
    }
  }

  std::size_t color_index = areas ? areas->layers.size() : 0;
  for (const auto& s : lines) {
    const std::string color = kPalette[color_index++ % kPaletteSize];
    o += fmt::format("<g class=\"series\" data-name=\"{}\" clip-path=\"url(#plotarea)\">", xml_escape(s.name));
    const std::size_t n = std::min(s.x.size(), s.y.size());
    if (s.line && n > 1) {
      std::string pts;
      for (std::size_t i = 0; i < n; ++i) pts += num(mx(s.x[i])) + "," + num(my(s.y[i])) + " ";
      o += fmt::format("<polyline points=\"{}\" fill=\"none\" stroke=\"{}\" stroke-width=\"2\"{}/>", pts, color,
                       s.dashed ? " stroke-dasharray=\"6 4\"" : "");
    }
    if (s.markers)
      for (std::size_t i = 0; i < n; ++i)
        o += fmt::format("<circle cx=\"{}\" cy=\"{}\" r=\"3\" fill=\"{}\"/>", num(mx(s.x[i])), num(my(s.y[i])), color);
    o += "</g>\n";
    legend.push_back({s.name, color, s.line ? "line" : "marker", s.dashed});
  }

  for (const auto& l : limits) {
    const double yy = my(l.y);
    o += fmt::format(
        "<g class=\"limit\" data-name=\"{0}\"><line x1=\"{1}\" y1=\"{2}\" x2=\"{3}\" y2=\"{2}\" stroke=\"#cc0000\" "
        "stroke-width=\"2\" stroke-dasharray=\"8 4\"/><text x=\"{4}\" y=\"{5}\" fill=\"#cc0000\" "
        "text-anchor=\"end\">{0}</text></g>\n",
        xml_escape(l.label), num(px0), num(yy), num(px1), num(px1 - 4), num(yy - 5));
    legend.push_back({l.label, "#cc0000", "limit", true});
  }

  // axes, tick labels, axis labels
  o += fmt::format(
      "<g class=\"axes\" stroke=\"#222222\" stroke-width=\"1.2\"><line x1=\"{0}\" y1=\"{1}\" x2=\"{2}\" y2=\"{1}\"/>"
      "<line x1=\"{0}\" y1=\"{1}\" x2=\"{0}\" y2=\"{3}\"/></g>\n",
      num(px0), num(py0), num(px1), num(py1));
  o += "<g class=\"ticks\" font-size=\"11\" fill=\"#222222\">\n";
  for (const auto& t : xt)
    o += fmt::format(
        "<line x1=\"{0}\" y1=\"{1}\" x2=\"{0}\" y2=\"{2}\" stroke=\"#222222\"/><text x=\"{0}\" y=\"{3}\" "
        "text-anchor=\"middle\">{4}</text>\n",
        num(mx(t.first)), num(py0), num(py0 + 5), num(py0 + 18), xml_escape(t.second));
  for (const auto& t : yt)
    o += fmt::format(
        "<line x1=\"{0}\" y1=\"{1}\" x2=\"{2}\" y2=\"{1}\" stroke=\"#222222\"/><text x=\"{3}\" y=\"{4}\" "
        "text-anchor=\"end\">{5}</text>\n",
        num(px0 - 5), num(my(t.first)), num(px0), num(px0 - 8), num(my(t.first) + 4), xml_escape(t.second));
  o += "</g>\n";
  o += fmt::format("<text class=\"xlabel\" x=\"{}\" y=\"{}\" text-anchor=\"middle\">{}</text>\n",
                   num((px0 + px1) / 2), num(H - 18), xml_escape(x.label));
  o += fmt::format(
      "<text class=\"ylabel\" x=\"{0}\" y=\"{1}\" text-anchor=\"middle\" transform=\"rotate(-90 {0} {1})\">{2}</text>\n",
      num(20), num((py0 + py1) / 2), xml_escape(y.label));

  // legend
  o += "<g class=\"legend\" font-size=\"11\">\n";
  double ly = py1 + 6;
  for (const auto& e : legend) {
    const double lx = px1 + 16;
    if (e.kind == "area")
      o += fmt::format("<rect x=\"{}\" y=\"{}\" width=\"18\" height=\"10\" fill=\"{}\" fill-opacity=\"0.75\"/>",
                       num(lx), num(ly - 5), e.color);
    else
      o += fmt::format("<line x1=\"{0}\" y1=\"{1}\" x2=\"{2}\" y2=\"{1}\" stroke=\"{3}\" stroke-width=\"2\"{4}/>",
                       num(lx), num(ly), num(lx + 18), e.color, e.dashed ? " stroke-dasharray=\"5 3\"" : "");
    o += fmt::format("<text x=\"{}\" y=\"{}\">{}</text>\n", num(lx + 24), num(ly + 4), xml_escape(e.name));
    ly += 18;
  }
  o += "</g>\n";
  for (std::size_t i = 0; i < footer.size(); ++i)
    o += fmt::format("<text x=\"12\" y=\"{}\" font-size=\"11\" fill=\"#7a2e00\">{}</text>\n",
                     height + 14 * static_cast<int>(i) + 12, xml_escape(footer[i]));
  o += "</svg>\n";
  return o;
}

}  // namespace plcli::svg
