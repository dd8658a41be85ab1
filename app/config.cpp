#include "config.hpp"

#include <cmath>

#include <toml++/toml.h>

namespace plcli {

// Access to the toml++ types, kept out of config.hpp.
struct section::impl {
  static const toml::table& tbl(const section& s) { return *static_cast<const toml::table*>(s.table_); }
  static const toml::node* get(section& s, const std::string& key);
  static const toml::node& need(section& s, const std::string& key);
  static double quantity_node(const section& s, const toml::node& n, const std::string& key, pumploss::dimension dim);
  static input_error error_node(const section& s, const toml::node& n, const std::string& what);
};

namespace {
int line_of(const toml::node& n) { return static_cast<int>(n.source().begin.line); }
int col_of(const toml::node& n) { return static_cast<int>(n.source().begin.column); }
const char* type_name(const toml::node& n) {
  switch (n.type()) {
    case toml::node_type::table: return "a table";
    case toml::node_type::array: return "a list";
    case toml::node_type::string: return "a text";
    case toml::node_type::integer: return "a whole number";
    case toml::node_type::floating_point: return "a number";
    case toml::node_type::boolean: return "true/false";
    default: return "a date or time";
  }
}
}  // namespace

section::section(std::shared_ptr<const void> root, const void* table, std::string file,
                 std::string name, int line, int column)
    : root_(std::move(root)), table_(table), file_(std::move(file)), name_(std::move(name)), line_(line),
      column_(column) {}

bool section::has(const std::string& key) const { return impl::tbl(*this).contains(key); }

bool section::is_text(const std::string& key) const {
  const auto* n = impl::tbl(*this).get(key);
  return n != nullptr && n->is_string();
}

const toml::node* section::impl::get(section& s, const std::string& key) {
  s.used_.insert(key);
  return tbl(s).get(key);
}

const toml::node& section::impl::need(section& s, const std::string& key) {
  const auto* n = get(s, key);
  if (n == nullptr) throw s.error_here("missing key '" + key + "'" + (s.name_.empty() ? "" : " in [" + s.name_ + "]"));
  return *n;
}

input_error section::impl::error_node(const section& s, const toml::node& n, const std::string& what) {
  return input_error(s.file_, line_of(n), col_of(n), what);
}

input_error section::error(const std::string& key, const std::string& what) const {
  const auto* n = impl::tbl(*this).get(key);
  if (n == nullptr) return error_here(what);
  return impl::error_node(*this, *n, "'" + key + "': " + what);
}

input_error section::error_here(const std::string& what) const { return input_error(file_, line_, column_, what); }

double section::impl::quantity_node(const section& s, const toml::node& n, const std::string& key,
                                    pumploss::dimension dim) {
  if (!n.is_string()) {
    if (n.is_number())
      throw error_node(s, n, "'" + key + "' needs a unit, written as text: \"" +
                              std::to_string(n.value<double>().value_or(0.0)).substr(0, 6) + " " +
                              pumploss::si_symbol(dim) + "\" (units of " + dimension_name(dim) + ": " +
                              units_of(dim) + ")");
    throw error_node(s, n, "'" + key + "' must be a " + dimension_name(dim) + " such as \"12.5 " +
                            pumploss::si_symbol(dim) + "\", not " + type_name(n));
  }
  try {
    return quantity_si(*n.value<std::string>(), dim);
  } catch (const std::invalid_argument& e) {
    throw error_node(s, n, "'" + key + "': " + e.what());
  }
}

double section::quantity(const std::string& key, pumploss::dimension dim) {
  return impl::quantity_node(*this, impl::need(*this, key), key, dim);
}

std::optional<double> section::quantity_opt(const std::string& key, pumploss::dimension dim) {
  const auto* n = impl::get(*this, key);
  if (n == nullptr) return std::nullopt;
  return impl::quantity_node(*this, *n, key, dim);
}

double section::temperature_step(const std::string& key) {
  const auto& n = impl::need(*this, key);
  if (!n.is_string()) throw impl::error_node(*this, n, "'" + key + "' must be a temperature difference such as \"5 K\"");
  try {
    const double v = temperature_difference_k(*n.value<std::string>());
    if (!(v > 0)) throw impl::error_node(*this, n, "'" + key + "' must be positive");
    return v;
  } catch (const std::invalid_argument& e) {
    throw impl::error_node(*this, n, "'" + key + "': " + e.what());
  }
}

double section::number(const std::string& key) {
  const auto& n = impl::need(*this, key);
  if (!n.is_number()) throw impl::error_node(*this, n, "'" + key + "' must be a number without unit, not " + type_name(n));
  const double v = *n.value<double>();
  if (!std::isfinite(v)) throw impl::error_node(*this, n, "'" + key + "' must be finite");
  return v;
}

std::optional<double> section::number_opt(const std::string& key) {
  if (!has(key)) {
    used_.insert(key);
    return std::nullopt;
  }
  return number(key);
}

long section::integer(const std::string& key) {
  const auto& n = impl::need(*this, key);
  if (!n.is_integer()) throw impl::error_node(*this, n, "'" + key + "' must be a whole number, not " + type_name(n));
  return static_cast<long>(*n.value<int64_t>());
}

std::optional<long> section::integer_opt(const std::string& key) {
  if (!has(key)) {
    used_.insert(key);
    return std::nullopt;
  }
  return integer(key);
}

std::string section::text(const std::string& key) {
  const auto& n = impl::need(*this, key);
  if (!n.is_string()) throw impl::error_node(*this, n, "'" + key + "' must be a text in quotes, not " + type_name(n));
  return *n.value<std::string>();
}

std::optional<std::string> section::text_opt(const std::string& key) {
  if (!has(key)) {
    used_.insert(key);
    return std::nullopt;
  }
  return text(key);
}

std::string section::choice(const std::string& key, std::initializer_list<const char*> options,
                            const char* fallback) {
  if (!has(key) && fallback != nullptr) {
    used_.insert(key);
    return fallback;
  }
  const auto v = text(key);
  std::string list;
  for (const char* o : options) {
    if (v == o) return v;
    list += (list.empty() ? "\"" : ", \"") + std::string(o) + "\"";
  }
  throw error(key, "\"" + v + "\" is not one of " + list);
}

std::vector<double> section::quantity_list(const std::string& key, pumploss::dimension dim) {
  const auto& n = impl::need(*this, key);
  const auto* arr = n.as_array();
  if (arr == nullptr) throw impl::error_node(*this, n, "'" + key + "' must be a list such as [\"9.5 mm\", \"12.7 mm\"]");
  if (arr->empty()) throw impl::error_node(*this, n, "'" + key + "' is an empty list");
  std::vector<double> out;
  for (const auto& e : *arr) out.push_back(impl::quantity_node(*this, e, key, dim));
  return out;
}

std::vector<double> section::number_list(const std::string& key) {
  const auto& n = impl::need(*this, key);
  const auto* arr = n.as_array();
  if (arr == nullptr || arr->empty()) throw impl::error_node(*this, n, "'" + key + "' must be a list of numbers such as [80, 85, 90]");
  std::vector<double> out;
  for (const auto& e : *arr) {
    if (!e.is_number()) throw impl::error_node(*this, e, "'" + key + "': each entry must be a number without unit");
    out.push_back(*e.value<double>());
  }
  return out;
}

std::pair<double, double> section::quantity_pair(const std::string& key, pumploss::dimension d1,
                                                 pumploss::dimension d2) {
  const auto& n = impl::need(*this, key);
  const auto* arr = n.as_array();
  if (arr == nullptr || arr->size() != 2)
    throw impl::error_node(*this, n, "'" + key + "' must be a pair [\"... " + pumploss::si_symbol(d1) + "\", \"... " +
                            pumploss::si_symbol(d2) + "\"]");
  return {impl::quantity_node(*this, *arr->get(0), key, d1), impl::quantity_node(*this, *arr->get(1), key, d2)};
}

std::vector<std::pair<double, double>> section::pair_list(const std::string& key, pumploss::dimension d1,
                                                          pumploss::dimension d2) {
  const auto& n = impl::need(*this, key);
  const auto* arr = n.as_array();
  if (arr == nullptr || arr->empty())
    throw impl::error_node(*this, n, "'" + key + "' must be a list of pairs [[\"...\", \"...\"], ...]");
  std::vector<std::pair<double, double>> out;
  for (const auto& e : *arr) {
    const auto* p = e.as_array();
    if (p == nullptr || p->size() != 2)
      throw impl::error_node(*this, e, "'" + key + "': each entry must be a pair [\"... " + pumploss::si_symbol(d1) +
                              "\", \"... " + pumploss::si_symbol(d2) + "\"]");
    out.emplace_back(impl::quantity_node(*this, *p->get(0), key, d1), impl::quantity_node(*this, *p->get(1), key, d2));
  }
  return out;
}

section section::table(const std::string& key) {
  auto t = table_opt(key);
  if (!t) throw error_here("missing table [" + (name_.empty() ? key : name_ + "." + key) + "]");
  return *t;
}

std::optional<section> section::table_opt(const std::string& key) {
  const auto* n = impl::get(*this, key);
  if (n == nullptr) return std::nullopt;
  const auto* t = n->as_table();
  if (t == nullptr) throw impl::error_node(*this, *n, "'" + key + "' must be a table, not " + type_name(*n));
  return section(root_, t, file_, name_.empty() ? key : name_ + "." + key, line_of(*n), col_of(*n));
}

std::vector<section> section::tables(const std::string& key) {
  std::vector<section> out;
  const auto* n = impl::get(*this, key);
  if (n == nullptr) return out;
  const auto* arr = n->as_array();
  if (arr == nullptr || !arr->is_array_of_tables())
    throw impl::error_node(*this, *n, "'" + key + "' must be written as [[" + key + "]] tables");
  for (const auto& e : *arr)
    out.emplace_back(root_, e.as_table(), file_, name_.empty() ? key : name_ + "." + key, line_of(e), col_of(e));
  return out;
}

void section::finish() const {
  for (const auto& [k, v] : impl::tbl(*this)) {
    const std::string key(k.str());
    if (used_.count(key) == 0) {
      const auto& src = k.source();
      throw input_error(file_, static_cast<int>(src.begin.line), static_cast<int>(src.begin.column),
                        "unknown key '" + key + "'" + (name_.empty() ? "" : " in [" + name_ + "]") +
                            " (misspelt, or not used by this command)");
    }
    (void)v;
  }
}

section load_config(const std::string& path) {
  try {
    auto root = std::make_shared<toml::table>(toml::parse_file(path));
    const void* t = root.get();
    return section(std::shared_ptr<const void>(root, t), t, path, "", 0, 0);
  } catch (const toml::parse_error& e) {
    const auto& src = e.source();
    if (src.begin.line == 0) throw input_error(path, 0, 0, std::string(e.description()));
    throw input_error(path, static_cast<int>(src.begin.line), static_cast<int>(src.begin.column),
                      std::string(e.description()));
  }
}

std::string directory_of(const std::string& path) {
  const auto slash = path.find_last_of('/');
  return slash == std::string::npos ? std::string() : path.substr(0, slash + 1);
}

}  // namespace plcli
