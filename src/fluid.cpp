// ISO 3448 viscosity grade table (fluid.hpp).
// Source: ISO 3448:1992, Table 1: 18 grades, mid-point kinematic viscosity at 40 degC in
// mm^2/s, limits +/-10 % of the mid-point.
#include "pumploss/fluid.hpp"

#include <iterator>
#include <limits>

namespace pumploss {
namespace {
struct vg_row {
  int grade;
  double mid_mm2_s;
};
constexpr vg_row kGrades[] = {{2, 2.2},     {3, 3.2},     {5, 4.6},     {7, 6.8},    {10, 10.0},
                              {15, 15.0},   {22, 22.0},   {32, 32.0},   {46, 46.0},  {68, 68.0},
                              {100, 100.0}, {150, 150.0}, {220, 220.0}, {320, 320.0},
                              {460, 460.0}, {680, 680.0}, {1000, 1000.0}, {1500, 1500.0}};

iso_vg_grade make(const vg_row& r) {
  const double mid = r.mid_mm2_s * 1e-6;
  return {r.grade, mid, 0.9 * r.mid_mm2_s * 1e-6, 1.1 * r.mid_mm2_s * 1e-6};
}
iso_vg_grade nan_grade() {
  const double nan = std::numeric_limits<double>::quiet_NaN();
  return {0, nan, nan, nan};
}
}  // namespace

result<iso_vg_grade> iso_vg(int grade) noexcept {
  for (const vg_row& r : kGrades) {
    if (r.grade == grade) return {make(r), status::ok};
  }
  return {nan_grade(), status::domain};
}

result<iso_vg_grade> iso_vg_classify(double nu40_m2_s) noexcept {
  if (!detail::finite(nu40_m2_s)) return {nan_grade(), status::nonfinite};
  if (!(nu40_m2_s > 0.0)) return {nan_grade(), status::domain};
  for (const vg_row& r : kGrades) {
    const iso_vg_grade g = make(r);
    if (nu40_m2_s >= g.min_m2_s && nu40_m2_s <= g.max_m2_s) return {g, status::ok};
  }
  return {nan_grade(), status::out_of_validity};
}

}  // namespace pumploss
