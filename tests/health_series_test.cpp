// health_series (one workflow for a series of field readings) and table_stream (the streaming
// reader it is fed from): a series generated from a known truth is recovered, the workflow gives
// what the program's former composition of the library calls gave, and the streaming reader
// reads what read_table reads.
#include <gtest/gtest.h>

#include <cmath>
#include <random>
#include <sstream>
#include <string>
#include <vector>

#include "pumploss/health.hpp"
#include "pumploss/health_series.hpp"
#include "pumploss/table_reader.hpp"

namespace {

using pumploss::health_event;
using pumploss::status;

pumploss::health_reference<double> reference() {
  pumploss::health_reference<double> r{};
  r.max_displacement_m3_rev = 71e-6;
  r.reference_dp_pa = 250e5;
  r.reference_t_k = 323.15;
  r.fluid = pumploss::typical_mineral_oil(pumploss::d341_fit(313.15, 46e-6, 373.15, 6.8e-6).value);
  r.reference_speed_rev_s = 25.0;
  r.rated_speed_rev_s = 25.0;
  r.constant_m3_s = 0.3 / 60000;
  r.baseline_m3_s = 3.1 / 60000;
  return r;
}

pumploss::health_bands<double> bands() {
  pumploss::health_bands<double> b;
  b.sound_max = 0.03;
  b.acceptable_max = 0.05;
  b.worn_min = 0.08;
  b.growth_moderate = 0.25;
  b.growth_large = 0.50;
  return b;
}

// The truth (invented for the test): the normalised drain flow grows 0.02 % a day, jumps by 25 %
// at reading `step_at` (a worn slipper, say), readings 1 to 3 days apart (gaps), temperature and
// pressure wander, 0.5 % noise on the meter; every 97th reading reads zero (meter unplugged,
// refused) and reading 211 is taken far from the rated speed (refused).
struct truth_series {
  std::vector<pumploss::health_series_input> in;
  std::vector<double> q_ref;  // true normalised drain flow
  std::size_t step_at = 350;
  std::size_t refused = 0;
};

truth_series make_truth(std::size_t n, unsigned seed, bool events) {
  truth_series t;
  const auto ref = reference();
  std::mt19937 rng(seed);
  std::uniform_real_distribution<double> u(0.0, 1.0);
  std::normal_distribution<double> noise(0.0, 0.005);
  const double mu_ref = pumploss::oil_dynamic_viscosity(ref.fluid, ref.reference_t_k, 0.0).value;
  double day = 19000;
  for (std::size_t i = 0; i < n; ++i) {
    day += 1 + std::floor(3 * u(rng));
    const double age = day - 19000;
    double q = ref.baseline_m3_s * (1 + 0.0002 * age) * (i >= t.step_at ? 1.25 : 1.0);
    if (events && i >= 500) q = ref.baseline_m3_s * (1 + 0.0001 * (day - 20000));  // overhauled
    const double tk = 273.15 + 40 + 20 * u(rng);
    const double dp = 180e5 + 70e5 * u(rng);
    const double mu = pumploss::oil_dynamic_viscosity(ref.fluid, tk, 0.0).value;
    const double qc = ref.constant_m3_s;
    double drain = (qc + (q - qc) * (dp / ref.reference_dp_pa) * (mu_ref / mu)) * (1 + noise(rng));
    double speed = 25 + 0.2 * (u(rng) - 0.5);
    if (i % 97 == 50) drain = 0, ++t.refused;
    if (i == 211) speed = 5, ++t.refused;
    pumploss::health_series_input x;
    x.reading = {drain, dp, 0.0, tk, speed};
    x.time = day;
    x.date = day;
    x.row = i;
    if (events && i == 500) x.event = health_event::overhaul;
    if (events && i == 700) x.event = health_event::meter_change;
    if (events && i % 53 == 7) x.reading.state = pumploss::operating_state::deadhead;
    t.in.push_back(x);
    t.q_ref.push_back(q);
  }
  return t;
}

TEST(HealthSeries, KnownTruthIsRecovered) {
  const auto t = make_truth(480, 11u, false);
  std::vector<pumploss::health_series_row> rows;
  pumploss::health_series s(reference(), bands(), [&](const pumploss::health_series_row& r) { rows.push_back(r); });
  for (const auto& x : t.in) ASSERT_EQ(s.feed(x), status::ok);
  const auto sum = s.finish();
  ASSERT_TRUE(sum.ok());
  ASSERT_EQ(rows.size(), t.in.size());
  EXPECT_EQ(sum.rows, t.in.size());
  EXPECT_EQ(sum.refused, t.refused);
  EXPECT_EQ(sum.scored + sum.refused, sum.rows);
  EXPECT_EQ(sum.refused_by[0], t.refused - 1);  // refuse_drain_not_positive (bit 0)
  for (std::size_t i = 0; i < rows.size(); ++i) {
    EXPECT_EQ(rows[i].row, i);
    if (rows[i].a.st == status::out_of_validity) continue;
    // the normalisation recovers the truth within the meter's noise (0.5 %, 5 sigma)
    EXPECT_NEAR(rows[i].a.drain_at_reference_m3_s / t.q_ref[i], 1.0, 0.025) << i;
  }
  // one abrupt step, placed within a few readings of the truth, of about +25 %
  ASSERT_EQ(sum.steps.size(), 1u);
  EXPECT_LE(std::abs(static_cast<long>(sum.steps[0].row) - static_cast<long>(t.step_at)), 3L);
  EXPECT_NEAR(sum.steps[0].after / sum.steps[0].before, 1.25, 0.05);
  // the trend after the step: 0.02 % of the baseline a day, as a fraction of V n_ref
  EXPECT_GE(sum.trend_from_row, t.step_at - 3);
  const double slope_truth = 0.0002 * reference().baseline_m3_s * 1.25 / (71e-6 * 25.0);
  EXPECT_NEAR(sum.trend.slope_per_day / slope_truth, 1.0, 0.25);
  EXPECT_EQ(sum.changes.empty(), false);
  EXPECT_EQ(sum.latest_row, t.in.size() - 1);
}

// What the program did before the workflow existed (cmd_health.cpp up to this change), in the
// test: base per row, per-row assessment, steps per segment, trend after the last step or event.
struct old_path {
  std::vector<pumploss::health_assessment<double>> a;
  std::vector<std::size_t> step_rows;
  pumploss::health_trend<double> trend{};
  pumploss::projection_kind kind{};
};

old_path run_old(const std::vector<pumploss::health_series_input>& in) {
  const auto ref = reference();
  const auto b = bands();
  const std::size_t n = in.size();
  old_path o;
  std::vector<double> base_of(n, ref.baseline_m3_s);
  double current = ref.baseline_m3_s;
  for (std::size_t i = 0; i < n; ++i) {
    if (in[i].event == health_event::overhaul) {
      double sum = 0;
      int k = 0;
      for (std::size_t j = i; j < n && k < 3; ++j) {
        const auto a = pumploss::assess_health(ref, b, in[j].reading);
        if (!pumploss::is_error(a.st)) sum += a.drain_at_reference_m3_s, ++k;
      }
      if (k > 0) current = sum / k;
    }
    base_of[i] = current;
  }
  std::vector<std::size_t> acc;
  std::vector<double> time, qn, frac;
  std::vector<int> seg;
  int segment = 0;
  pumploss::health_assessment<double> last{};
  for (std::size_t i = 0; i < n; ++i) {
    if (in[i].event == health_event::overhaul || in[i].event == health_event::meter_change) ++segment;
    auto ri = ref;
    ri.baseline_m3_s = base_of[i];
    o.a.push_back(pumploss::assess_health(ri, b, in[i].reading));
    if (pumploss::is_error(o.a.back().st)) continue;
    last = o.a.back();
    if (in[i].reading.state != ref.baseline_state) continue;
    acc.push_back(i);
    time.push_back(in[i].time);
    qn.push_back(last.drain_at_reference_m3_s);
    frac.push_back(last.fraction_at_reference);
    seg.push_back(segment);
  }
  const std::size_t m = acc.size();
  std::vector<double> work(m);
  const auto sig = pumploss::health_noise_sigma(qn.data(), m, work.data());
  std::size_t trend_from = 0;
  for (std::size_t k = 1; k < m; ++k)
    if (seg[k] != seg[k - 1]) trend_from = k;
  for (std::size_t b0 = 0; b0 < m;) {
    std::size_t b1 = b0;
    while (b1 < m && seg[b1] == seg[b0]) ++b1;
    std::vector<pumploss::health_step<double>> steps(b1 - b0);
    std::size_t found = 0;
    const auto st = pumploss::health_detect_steps(qn.data() + b0, b1 - b0, std::nan(""), sig.value, 0.5, 5.0,
                                                  steps.data(), steps.size(), work.data(), found);
    if (pumploss::is_usable(st))
      for (std::size_t k = 0; k < found; ++k)
        if (steps[k].abrupt) {
          o.step_rows.push_back(acc[b0 + steps[k].index]);
          trend_from = std::max(trend_from, b0 + steps[k].index);
        }
    b0 = b1;
  }
  o.trend = pumploss::fit_health_trend(time.data() + trend_from, frac.data() + trend_from, m - trend_from,
                                       b.worn_min);
  o.kind = pumploss::health_projection(o.trend, last.level).kind;
  return o;
}

TEST(HealthSeries, SameVerdictsAsTheFormerComposition) {
  for (const bool events : {false, true}) {
    const auto t = make_truth(900, 5u, events);
    const auto old = run_old(t.in);
    std::vector<pumploss::health_series_row> rows;
    pumploss::health_series s(reference(), bands(), [&](const pumploss::health_series_row& r) { rows.push_back(r); });
    for (const auto& x : t.in) ASSERT_EQ(s.feed(x), status::ok);
    const auto sum = s.finish();
    ASSERT_TRUE(sum.ok());
    ASSERT_EQ(rows.size(), old.a.size());
    for (std::size_t i = 0; i < rows.size(); ++i) {
      EXPECT_EQ(rows[i].a.st, old.a[i].st) << i;
      EXPECT_EQ(rows[i].a.level, old.a[i].level) << i;
      EXPECT_EQ(rows[i].a.reasons, old.a[i].reasons) << i;
      if (pumploss::is_usable(old.a[i].st)) {
        EXPECT_EQ(rows[i].a.drain_at_reference_m3_s, old.a[i].drain_at_reference_m3_s) << i;
        EXPECT_EQ(rows[i].a.growth, old.a[i].growth) << i;
      }
    }
    ASSERT_EQ(sum.steps.size(), old.step_rows.size()) << events;
    for (std::size_t k = 0; k < sum.steps.size(); ++k) EXPECT_EQ(sum.steps[k].row, old.step_rows[k]);
    EXPECT_EQ(sum.trend.slope_per_day, old.trend.slope_per_day);
    EXPECT_EQ(sum.projection.kind, old.kind);
    if (events) {
      EXPECT_NE(rows[600].baseline_m3_s, reference().baseline_m3_s);  // the overhaul's new baseline
      EXPECT_GE(sum.trend_from_row, 700u);                           // restarted at the meter change
    }
  }
}

TEST(HealthSeries, BadInputAndMisuse) {
  pumploss::health_series s(reference(), bands(), {});
  EXPECT_EQ(s.finish().st, status::insufficient_data);  // nothing fed
  EXPECT_EQ(s.feed({}), status::misuse);                // fed after finish
  EXPECT_EQ(s.finish().st, status::misuse);
  // a reading with NaN values: handed back with an error status, never scored
  std::vector<pumploss::health_series_row> rows;
  pumploss::health_series s2(reference(), bands(), [&](const pumploss::health_series_row& r) { rows.push_back(r); });
  pumploss::health_series_input x;
  x.reading = {std::nan(""), 250e5, 0.0, 323.15, 25.0};
  EXPECT_EQ(s2.feed(x), status::ok);
  ASSERT_EQ(rows.size(), 1u);
  EXPECT_TRUE(pumploss::is_error(rows[0].a.st));
  EXPECT_TRUE(std::isnan(rows[0].a.drain_at_reference_m3_s));
  const auto sum = s2.finish();
  EXPECT_EQ(sum.st, status::insufficient_data);
  EXPECT_EQ(sum.scored, 0u);
  EXPECT_EQ(sum.refused, 1u);
  EXPECT_STREQ(pumploss::health_event_name(health_event::overhaul), "overhaul");
}

// ---- table_stream: what read_table reads, row by row

std::vector<pumploss::column_spec> spec() {
  using pumploss::column_kind;
  using D = pumploss::dimension;
  return {{"date", column_kind::date, D::pressure, true},
          {"outlet pressure", column_kind::quantity, D::pressure, true},
          {"drain flow", column_kind::quantity, D::volume_flow, true},
          {"note", column_kind::text, D::pressure, false},
          {"state", column_kind::text, D::pressure, false}};
}

void expect_same(const std::string& text, pumploss::csv_dialect dialect = pumploss::csv_dialect::detect) {
  const auto whole = pumploss::read_table(text, spec(), "f.csv", dialect);
  std::istringstream in(text);
  pumploss::table_stream s(in, spec(), "f.csv", dialect);
  pumploss::table_row row;
  std::size_t i = 0;
  while (s.next(row)) {
    if (pumploss::is_error(whole.error.st)) {  // the stream may hand out rows before the faulty one
      ++i;
      continue;
    }
    ASSERT_LT(i, whole.rows()) << text;
    EXPECT_EQ(row.line, whole.line[i]);
    for (std::size_t k = 0; k < spec().size(); ++k) {
      if (!whole.present[k]) {
        EXPECT_TRUE(row.texts[k].empty());
        continue;
      }
      const double a = row.values[k], b = whole.values[k][i];
      EXPECT_TRUE(a == b || (std::isnan(a) && std::isnan(b))) << text << " row " << i << " col " << k;
      EXPECT_EQ(row.texts[k], whole.texts[k][i]);
      EXPECT_EQ(row.pos[k], whole.pos[k][i]);
    }
    ++i;
  }
  EXPECT_EQ(s.error().st, whole.error.st) << text;
  if (pumploss::is_error(whole.error.st)) {
    EXPECT_EQ(s.error().line, whole.error.line) << text;
    EXPECT_EQ(s.error().column, whole.error.column) << text;
    EXPECT_EQ(s.error().message, whole.error.message) << text;
  } else {
    EXPECT_EQ(i, whole.rows());
    EXPECT_EQ(s.rows(), whole.rows());
    EXPECT_EQ(s.header().dialect, whole.dialect);
    EXPECT_EQ(s.header().notes, whole.notes);
  }
}

TEST(TableStream, ReadsWhatReadTableReads) {
  expect_same("\xEF\xBB\xBF# comment\r\ndate,outlet pressure [bar],drain flow [L/min],note\r\n"
              "2024-01-02,250,3.1,\"a, quoted\"\r\n\r\n2024-01-03, 240.5 ,3.25,x\n");
  expect_same("date;outlet pressure [bar];drain flow [L/min]\n2024-01-02;250;3,1\n2024-01-03;240;3,25\n");
  expect_same("date;outlet pressure [bar];drain flow [L/min]\n2024-01-02;250;3\n2024-01-03;240;4\n");
  expect_same("date;outlet pressure [psi];drain flow [gpm]\n2024-01-02;250;3.5\n",
              pumploss::csv_dialect::semicolon_point);
  // errors at the same line and column with the same sentence
  expect_same("date,outlet pressure [bar],drain flow [L/min]\n2024-01-02,250,3.1\n2024-01-03,2O4,3.1\n");
  expect_same("date,outlet pressure [bar],drain flow [L/min]\n2024-01-02,250,3.1\n2024-13-03,204,3.1\n");
  expect_same("date,outlet pressure [bar],drain flow [L/mn]\n2024-01-02,250,3.1\n");
  expect_same("date,outlet pressure [bar]\n2024-01-02,250\n");
  expect_same("date,outlet pressure [bar],drain flow [L/min]\n2024-01-02,250,3.1,7\n");
  expect_same("date,outlet pressure [bar],drain flow [L/min]\n2024-01-02,250,\"1,5\"\n");
  expect_same("date,outlet pressure [bar],drain flow [L/min]\n");
  expect_same("");
  expect_same("date;outlet pressure [bar];drain flow [L/min]\n2024-01-02;250;1.500,5\n");
  // a ';' file that mixes decimal marks: read_table looks at every number first, the stream
  // stops at the later row; both name the same field
  expect_same("date;outlet pressure [bar];drain flow [L/min]\n2024-01-02;250;3,1\n2024-01-03;240;3.2\n");
}

TEST(TableStream, FileThatCannotBeOpened) {
  pumploss::table_stream s(std::string("no such file.csv"), spec());
  pumploss::table_row row;
  EXPECT_FALSE(s.next(row));
  EXPECT_EQ(s.error().st, status::misuse);
  EXPECT_EQ(s.error().line, 0);
}

}  // namespace
