// Feeding a test_stand_readings to a test_stand_stream row by row, for the tests and the fuzz
// target that compare the streamed reduction with reduce_test_stand() on the same readings.
#ifndef PUMPLOSS_TESTS_TEST_STAND_FEED_HPP
#define PUMPLOSS_TESTS_TEST_STAND_FEED_HPP

#include <cmath>
#include <cstddef>
#include <utility>
#include <vector>

#include "pumploss/test_stand.hpp"

namespace pltest {

// A column of the readings, its field in a row, and its column bit.
struct stand_column {
  std::vector<double> pumploss::test_stand_readings::*column;
  double pumploss::test_stand_row::*field;
  unsigned bit;
};
inline const stand_column (&stand_columns())[11] {
  using D = pumploss::test_stand_readings;
  using R = pumploss::test_stand_row;
  using S = pumploss::test_stand_stream;
  static const stand_column c[11] = {
      {&D::speed_rev_s, &R::speed_rev_s, S::speed},
      {&D::inlet_pressure_pa, &R::inlet_pressure_pa, S::inlet_pressure},
      {&D::outlet_pressure_pa, &R::outlet_pressure_pa, S::outlet_pressure},
      {&D::flow_m3_s, &R::flow_m3_s, S::flow},
      {&D::torque_n_m, &R::torque_n_m, S::torque},
      {&D::drain_flow_m3_s, &R::drain_flow_m3_s, S::drain_flow},
      {&D::inlet_temperature_k, &R::inlet_temperature_k, S::inlet_temperature},
      {&D::outlet_temperature_k, &R::outlet_temperature_k, S::outlet_temperature},
      {&D::drain_temperature_k, &R::drain_temperature_k, S::drain_temperature},
      {&D::meter_temperature_k, &R::meter_temperature_k, S::meter_temperature},
      {&D::case_pressure_pa, &R::case_pressure_pa, S::case_pressure}};
  return c;
}

// The column bits of the columns a readings struct has.
inline unsigned columns_of(const pumploss::test_stand_readings& r) {
  unsigned bits = 0;
  for (const auto& c : stand_columns())
    if (!(r.*c.column).empty()) bits |= c.bit;
  return bits;
}

// Feed every row of r (as many as it has speeds) into a stream; a column shorter than that
// gives NaN for the rows it lacks.
inline void feed(pumploss::test_stand_stream& st, const pumploss::test_stand_readings& r) {
  for (std::size_t i = 0; i < r.speed_rev_s.size(); ++i) {
    pumploss::test_stand_row row;
    for (const auto& c : stand_columns()) {
      const auto& v = r.*c.column;
      row.*c.field = i < v.size() ? v[i] : std::nan("");
    }
    st.add(row);
  }
}

}  // namespace pltest

#endif
