// The table reader (table_reader.hpp): header units converted to SI (exact factors of NIST SP 811
// 2008, Appendix B), dates, missing values, and every refusal with its line and column.
#include <gtest/gtest.h>

#include <cmath>
#include <cstdio>
#include <cstring>
#include <utility>
#include <fstream>

#include "pumploss/table_reader.hpp"

namespace {

using pumploss::column_kind;
using pumploss::dimension;
using pumploss::status;

const std::vector<pumploss::column_spec> kSpec = {{"p", column_kind::quantity, dimension::pressure, true},
                                                  {"q", column_kind::quantity, dimension::volume_flow, true},
                                                  {"t", column_kind::quantity, dimension::temperature, true},
                                                  {"note", column_kind::text, dimension::pressure, false}};

struct bad_case {
  const char* text;
  status st;
  int line, column;
  const char* what;
};

}  // namespace

TEST(TableReader, ConvertsHeaderUnitsToSi) {
  const auto d = pumploss::read_table("\xEF\xBB\xBF# comment\nP [psi], Q [gpm],T [degF],note\n100,2,212,\"a, b\"\n\n"
                                      "1e3,0.5,32,x\n",
                                      kSpec, "a.csv");
  ASSERT_EQ(d.error.st, status::ok) << d.error.message;
  ASSERT_EQ(d.rows(), 2u);
  EXPECT_EQ(d.line[0], 3);
  EXPECT_EQ(d.line[1], 5);
  // NIST SP 811 (2008), Appendix B: 1 psi = 6894.757293168361 Pa, 1 gal = 3.785411784e-3 m^3 (exact)
  EXPECT_NEAR(d.si("p")[0], 689475.7293168361, 1e-9);
  EXPECT_NEAR(d.si("q")[1], 0.5 * 3.785411784e-3 / 60, 1e-18);
  EXPECT_NEAR(d.si("t")[0], 373.15, 1e-12);  // 212 degF
  EXPECT_NEAR(d.si("t")[1], 273.15, 1e-12);  // 32 degF
  EXPECT_EQ(d.texts[3][0], "a, b");
  EXPECT_EQ(d.pos[1][0], 5);  // "2" stands in character column 5 of "100,2,..."
  EXPECT_TRUE(d.has("note"));
  EXPECT_FALSE(d.has("nothing"));
  EXPECT_TRUE(d.si("nothing").empty());
  EXPECT_EQ(d.unit[0]->symbol, std::string("psi"));
}

TEST(TableReader, DatesAndCalendar) {
  // 2024-02-29 is day 19782 after 1970-01-01 (self-calculated: 54 years of 365 days + 13 leap days + 59)
  EXPECT_EQ(pumploss::days_from_civil(1970, 1, 1), 0);
  EXPECT_EQ(pumploss::days_from_civil(2024, 2, 29), 54 * 365 + 13 + 59);
  EXPECT_EQ(pumploss::civil_from_days(pumploss::days_from_civil(2024, 2, 29)), "2024-02-29");
  EXPECT_EQ(pumploss::civil_from_days(-1), "1969-12-31");
  const std::vector<pumploss::column_spec> spec = {{"date", column_kind::date, dimension::pressure, true},
                                                   {"x", column_kind::number, dimension::pressure, true}};
  const auto ok = pumploss::read_table("date,x\n2024-02-29,1\n", spec);
  ASSERT_EQ(ok.error.st, status::ok);
  EXPECT_EQ(ok.si("date")[0], 19782.0);
  const auto bad = pumploss::read_table("date,x\n2023-02-29,1\n", spec);
  EXPECT_EQ(bad.error.st, status::domain);
  EXPECT_EQ(bad.error.line, 2);
  EXPECT_EQ(bad.error.column, 1);
}

TEST(TableReader, MissingValuesWhereAllowed) {
  std::vector<pumploss::column_spec> spec = {{"a", column_kind::number, dimension::pressure, true},
                                             {"b", column_kind::quantity, dimension::pressure, true, true}};
  const auto d = pumploss::read_table("a,b [bar]\n1,\n2,3\n", spec);
  ASSERT_EQ(d.error.st, status::ok) << d.error.message;
  EXPECT_TRUE(std::isnan(d.si("b")[0]));
  EXPECT_EQ(d.si("b")[1], 3e5);
  spec[1].allow_missing = false;
  const auto e = pumploss::read_table("a,b [bar]\n1,\n", spec);
  EXPECT_EQ(e.error.st, status::domain);
  EXPECT_EQ(e.error.line, 2);
  EXPECT_NE(e.error.message.find("empty field"), std::string::npos);
}

TEST(TableReader, RefusalsNameLineAndColumn) {
  const bad_case cases[] = {
      {"p [bar],q [L/min],t [degC]\ninf,1,2\n", status::domain, 2, 1, "'inf' is not a number"},
      {"p [bar],q [L/min],t [degC]\n1,nan,2\n", status::domain, 2, 3, "'nan' is not a number"},
      {"p [bar],q [L/min],t [degC]\n0x10,1,2\n", status::domain, 2, 1, "not a number"},
      {"p [bar],q [L/min],t [degC]\n1e999,1,2\n", status::domain, 2, 1, "not a number"},
      {"p [bar],q [L/min],t [degC],x\n1,1,1,1\n", status::domain, 1, 28, "unknown column 'x'"},
      {"p [bar],q [L/min],p [bar],t [degC]\n", status::domain, 1, 19, "appears twice"},
      {"p [bar],q [L/min]\n1,2\n", status::insufficient_data, 1, 0, "missing column 't'"},
      {"p,q [L/min],t [degC]\n1,2,3\n", status::domain, 1, 1, "needs its unit"},
      {"p [bars],q [L/min],t [degC]\n", status::unknown_unit, 1, 1, "unknown unit 'bars'"},
      {"p [L/min],q [L/min],t [degC]\n", status::incompatible_units, 1, 1, "is a unit of volume flow"},
      {"p [bar]\tq [L/min]\tt [degC]\n", status::domain, 1, 8, "separated by 'TAB'"},
      {"p [bar],q [L/min],t [degC]\n1,2,5,5\n", status::domain, 2, 7, "decimal comma"},
      {"p [bar],q [L/min],t [degC]\n1;2;3\n", status::domain, 2, 0, "not separated by ','"},
      {"p [bar],q [L/min],t [degC],note\n1,2,3,\"open\n", status::domain, 2, 7, "closing quote"},
      {"p [bar],q [L/min],t [degC],note\n1,2,3,\"a\"b\n", status::domain, 2, 10, "after a closing quote"},
      {"", status::insufficient_data, 1, 0, "empty"},
      {"# only a comment\n", status::insufficient_data, 1, 0, "empty"},
      {"p [bar],q [L/min],t [degC]\n", status::insufficient_data, 1, 0, "no data rows"},
      {"p [bar],q [L/min],t [degC],note [m]\n", status::domain, 1, 28, "takes no unit"},
      {"p [bar,q [L/min],t [degC]\n", status::domain, 1, 1, "write the unit as"},
      {"p (bar,q [L/min],t [degC]\n", status::domain, 1, 1, "unknown column 'p (bar'"},
  };
  for (const auto& c : cases) {
    const auto d = pumploss::read_table(c.text, kSpec, "f.csv");
    EXPECT_EQ(d.error.st, c.st) << c.text;
    EXPECT_EQ(d.error.line, c.line) << c.text;
    EXPECT_EQ(d.error.column, c.column) << c.text << ": " << d.error.message;
    EXPECT_NE(d.error.message.find(c.what), std::string::npos) << c.text << ": " << d.error.message;
  }
}

TEST(TableReader, ReadsAFileAndRefusesAMissingOne) {
  const std::string path = ::testing::TempDir() + "pumploss_table_reader_test.csv";
  {
    std::ofstream out(path, std::ios::binary);
    out << "t [K],p [kPa],q [L/s]\r\n300,1,2\r\n";
  }
  const auto d = pumploss::read_table_file(path, kSpec);
  std::remove(path.c_str());
  ASSERT_EQ(d.error.st, status::ok) << d.error.message;
  EXPECT_EQ(d.source, path);
  EXPECT_EQ(d.si("p")[0], 1e3);
  EXPECT_EQ(d.si("q")[0], 2e-3);
  const auto none = pumploss::read_table_file(path, kSpec);
  EXPECT_EQ(none.error.st, status::misuse);
  EXPECT_EQ(none.error.line, 0);
}

TEST(TableReader, NumbersAndNames) {
  EXPECT_EQ(pumploss::parse_number(" -1.5e3 ").value_or(0), -1500.0);
  EXPECT_FALSE(pumploss::parse_number("1,5"));
  EXPECT_FALSE(pumploss::parse_number(""));
  EXPECT_FALSE(pumploss::parse_number("Infinity"));
  EXPECT_STREQ(pumploss::dimension_name(dimension::rotational_speed), "speed");
  EXPECT_EQ(pumploss::unit_symbols(dimension::density), "kg/m3, g/cm3");
}

// ------------------------------------------------------------------ files as people export them

namespace {

// The same readings in the forms spreadsheets and loggers export (invented values).
const char* const kPlain = "p [bar],q [L/min],t [degC],note\n250.5,12.25,45.3,\"a; b\"\n-0.35,0.5,-12.75,x\n1500,3,40,\n";

void expect_same_values(const pumploss::table_data& a, const pumploss::table_data& b, const std::string& what) {
  ASSERT_EQ(a.error.st, status::ok) << what << ": " << a.error.line << ":" << a.error.column << ": " << a.error.message;
  ASSERT_EQ(b.error.st, status::ok) << what << ": " << b.error.message;
  ASSERT_EQ(a.rows(), b.rows()) << what;
  for (std::size_t k = 0; k < a.spec.size(); ++k) {
    ASSERT_EQ(a.values[k].size(), b.values[k].size()) << what;
    for (std::size_t i = 0; i < a.values[k].size(); ++i)  // bit for bit: the same text gives the same double
      EXPECT_EQ(std::memcmp(&a.values[k][i], &b.values[k][i], sizeof(double)), 0)
          << what << " column " << a.spec[k].name << " row " << i << ": " << a.values[k][i] << " vs " << b.values[k][i];
    EXPECT_EQ(a.texts[k].size(), b.texts[k].size());
  }
}

}  // namespace

TEST(TableReaderExports, EuropeanSemicolonAndDecimalCommaGiveTheSameNumbers) {
  const auto plain = pumploss::read_table(kPlain, kSpec, "plain.csv");
  ASSERT_EQ(plain.error.st, status::ok) << plain.error.message;
  EXPECT_EQ(plain.dialect, pumploss::csv_dialect::comma);
  EXPECT_TRUE(plain.notes.empty());
  const char* euro = "p [bar];q [L/min];t [degC];note\n250,5;12,25;45,3;\"a; b\"\n-0,35;0,5;-12,75;x\n1500;3;40;\n";
  const auto d = pumploss::read_table(euro, kSpec, "euro.csv");
  expect_same_values(plain, d, "semicolon, decimal comma");
  EXPECT_EQ(d.dialect, pumploss::csv_dialect::semicolon_comma);
  ASSERT_EQ(d.notes.size(), 1u);
  EXPECT_NE(d.notes[0].find("',' as the decimal mark"), std::string::npos) << d.notes[0];
  EXPECT_EQ(d.texts[0][0], "250,5");  // the field as written
  // the same with the dialect given
  expect_same_values(plain, pumploss::read_table(euro, kSpec, "euro.csv", pumploss::csv_dialect::semicolon_comma),
                     "semicolon-comma given");
  // ';' with a decimal point
  const auto sp = pumploss::read_table("p [bar];q [L/min];t [degC];note\n250.5;12.25;45.3;a; b\n", kSpec);
  EXPECT_EQ(sp.error.st, status::domain);  // the unquoted ';' inside the note: one field too many
  const auto pt = pumploss::read_table(
      "p [bar];q [L/min];t [degC];note\n250.5;12.25;45.3;\"a; b\"\n-0.35;0.5;-12.75;x\n1500;3;40;\n", kSpec);
  expect_same_values(plain, pt, "semicolon, decimal point");
  EXPECT_EQ(pt.dialect, pumploss::csv_dialect::semicolon_point);
  // whole numbers only: nothing to tell, read and said so
  const auto whole = pumploss::read_table("p [bar];q [L/min];t [degC]\n250;12;45\n", kSpec);
  ASSERT_EQ(whole.error.st, status::ok);
  ASSERT_EQ(whole.notes.size(), 1u);
  EXPECT_NE(whole.notes[0].find("whole numbers"), std::string::npos);
}

TEST(TableReaderExports, BomCrlfDegreeSignsAndParentheses) {
  const auto plain = pumploss::read_table(kPlain, kSpec, "plain.csv");
  const std::string rows = "250.5,12.25,45.3,\"a; b\"\r\n-0.35,0.5,-12.75,x\r\n1500,3,40,\r\n";
  const char* const headers[] = {
      "\xEF\xBB\xBFp [bar],q [L/min],t [degC],note\r\n",
      "p (bar),q (l/min),t (\xC2\xB0\x43),note\r\n",     // parentheses, UTF-8 degree sign, C
      "P [bar],Q [lpm],T [\xE2\x84\x83],Note\r\n",        // U+2103 DEGREE CELSIUS
      "p [bar],q [LPM],t [deg C],note\n",
  };
  for (const char* h : headers) expect_same_values(plain, pumploss::read_table(std::string(h) + rows, kSpec), h);
  // the Windows-1252 degree byte (a file that is not UTF-8): read, with a note
  const auto w = pumploss::read_table(std::string("p [bar],q [L/min],t [\xB0" "C],note\n") + rows, kSpec);
  expect_same_values(plain, w, "Windows-1252 degree sign");
  ASSERT_EQ(w.notes.size(), 1u);
  EXPECT_NE(w.notes[0].find("Windows-1252"), std::string::npos);
  EXPECT_EQ(w.unit[2]->symbol, std::string("degC"));
}

TEST(TableReaderExports, UnitsAsWritten) {
  // spellings -> symbols (the factors are those of the symbols: NIST SP 811 (2008), Appendix B)
  const std::pair<const char*, const char*> cases[] = {
      {"\xC2\xB0" "C", "degC"}, {"\xC2\xB0" "F", "degF"}, {"\xE2\x84\x89", "degF"}, {"l/min", "L/min"},
      {"lpm", "L/min"},        {"LPM", "L/min"},        {"RPM", "rpm"},          {"rpm", "rpm"},
      {"Rpm", "rpm"},          {"r/min", "rpm"},        {"1/min", "rpm"},        {"U/min", "rpm"},
      {"gpm", "gpm"},          {"GPM", "gpm"},          {"l", "L"},              {"l/s", "L/s"},
      {"cm\xC2\xB3/rev", "cm3/rev"}, {"mm\xC2\xB2/s", "mm2/s"}, {"N\xC2\xB7m", "N.m"}, {"Nm", "N.m"},
      {"\xC2\xB5m", "um"},     {"\xCE\xBCm", "um"},     {" bar ", "bar"},        {"cm\xB3/rev", "cm3/rev"}};
  for (const auto& [written, symbol] : cases) {
    const auto* u = pumploss::find_unit_written(written);
    ASSERT_NE(u, nullptr) << written;
    EXPECT_STREQ(u->symbol, symbol) << written;
  }
  bool w1252 = true;
  EXPECT_STREQ(pumploss::find_unit_written("\xC2\xB0" "C", &w1252)->symbol, "degC");
  EXPECT_FALSE(w1252);
  EXPECT_STREQ(pumploss::find_unit_written("\xB0" "F", &w1252)->symbol, "degF");
  EXPECT_TRUE(w1252);
  // not units: case matters outside the trade spellings, unknown bytes, a bare degree
  for (const char* bad : {"nm", "BAR", "\xC2\xB0", "\xB0", "\xE9" "C", "\xC3\xA9", "C", "L/mn", "deg", ""})
    EXPECT_EQ(pumploss::find_unit_written(bad), nullptr) << bad;
}

TEST(TableReaderExports, AmbiguousFilesAreRefusedWithThePlaceAndTheFix) {
  using D = pumploss::csv_dialect;
  const struct {
    const char* text;
    D dialect;
    int line, column;
    const char* what;
  } cases[] = {
      // comma-separated with a grouped number: thousands or decimal comma?
      {"p [bar],q [L/min],t [degC]\n1,500,2,3\n", D::detect, 2, 9, "'1,500' could be 1.5 or 1500"},
      {"p [bar],q [L/min],t [degC]\n\"1,500\",2,3\n", D::detect, 2, 1, "thousands separator or a decimal comma"},
      // the header holds both delimiters
      {"p [bar],q [L/min];t [degC]\n1,2,3\n", D::detect, 1, 18, "both ',' and ';'"},
      // a thousands separator in a European export
      {"p [bar];q [L/min];t [degC]\n1.500,5;2;3\n", D::detect, 2, 1, "holds both ',' and '.'"},
      // decimal marks mixed: one of them is grouping
      {"p [bar];q [L/min];t [degC]\n1,5;2;3\n1;2.5;3\n", D::detect, 3, 3, "line 2 has '1,5'"},
      {"p [bar];q [L/min];t [degC]\n1.500;2;3\n1;2,5;3\n", D::detect, 3, 3, "line 2 has '1.500'"},
      // a format given that the numbers contradict
      {"p [bar];q [L/min];t [degC]\n1.500;2;3\n", D::semicolon_comma, 2, 1, "the format given says ','"},
      {"p [bar];q [L/min];t [degC]\n1,5;2;3\n", D::semicolon_point, 2, 1, "the format given says '.'"},
      {"p [bar];q [L/min];t [degC]\n1;2;3\n", D::comma, 1, 8, "separated by ';'"},
      {"p [bar],q [L/min],t [degC]\n1,2,3\n", D::semicolon_comma, 1, 8, "separated by ','"},
  };
  for (const auto& c : cases) {
    const auto d = pumploss::read_table(c.text, kSpec, "f.csv", c.dialect);
    EXPECT_EQ(d.error.st, status::domain) << c.text;
    EXPECT_EQ(d.error.line, c.line) << c.text << ": " << d.error.message;
    EXPECT_EQ(d.error.column, c.column) << c.text << ": " << d.error.message;
    EXPECT_NE(d.error.message.find(c.what), std::string::npos) << c.text << ": " << d.error.message;
  }
  EXPECT_STREQ(pumploss::csv_dialect_name(D::semicolon_comma), "semicolon-comma");
}
