#include "io/config/value_text.hpp"

#include <cstdio>
#include <variant>

#include "io/config/number_text.hpp"

namespace brume::config {

namespace {

bool plain_word(const std::string& text) {
  if (text.empty() || text == "true" || text == "false" || text == "null") return false;
  for (char c : text) {
    const bool ok =
        (c >= 'a' && c <= 'z') || (c >= 'A' && c <= 'Z') || c == '_' || (c >= '0' && c <= '9');
    if (!ok) return false;
  }
  return !(text.front() >= '0' && text.front() <= '9');
}

std::string list(const std::string& x, const std::string& y, const std::string& z) {
  return std::string("[").append(x).append(", ").append(y).append(", ").append(z).append("]");
}

struct Writer {
  const Key& key;

  std::string number(double value) const {
    const std::string digits = format_number(value);
    return key.kind == Kind::quantity ? digits + " " + key.unit : digits;
  }
  std::string operator()(long long value) const { return std::to_string(value); }
  std::string operator()(double value) const { return number(value); }
  std::string operator()(bool value) const { return value ? "true" : "false"; }
  std::string operator()(const std::string& value) const {
    return key.kind == Kind::choice && plain_word(value) ? value : quoted(value);
  }
  std::string operator()(const std::array<long long, 3>& values) const {
    return list(std::to_string(values[0]), std::to_string(values[1]), std::to_string(values[2]));
  }
  std::string operator()(const std::array<double, 3>& values) const {
    return list(number(values[0]), number(values[1]), number(values[2]));
  }
};

}  // namespace

std::string quoted(const std::string& text) {
  std::string out = "\"";
  for (char c : text) {
    switch (c) {
      case '"':
        out += "\\\"";
        break;
      case '\\':
        out += "\\\\";
        break;
      case '\n':
        out += "\\n";
        break;
      case '\t':
        out += "\\t";
        break;
      default:
        if (static_cast<unsigned char>(c) < 0x20) {
          char escape[8];
          std::snprintf(escape, sizeof escape, "\\x%02x", static_cast<unsigned>(c));
          out += escape;
        } else {
          out += c;
        }
    }
  }
  return out + "\"";
}

std::string value_text(const Key& key, const Value& value) {
  return std::visit(Writer{key}, value);
}

}  // namespace brume::config
