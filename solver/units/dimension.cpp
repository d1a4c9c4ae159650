#include "solver/units/dimension.hpp"

#include <array>
#include <string_view>

namespace brume::units {

namespace {

// Appends "^-1/2", "^3" or nothing (power one) for a doubled exponent.
void append_power(std::string& text, int doubled) {
  if (doubled == 2) return;
  text += '^';
  text += std::to_string(doubled % 2 == 0 ? doubled / 2 : doubled);
  if (doubled % 2 != 0) text += "/2";
}

}  // namespace

std::string Dimension::to_string() const {
  // Mass first, as Gaussian units are usually written (g^1/2 cm^-1/2 s^-1).
  const std::array<std::pair<std::string_view, int>, 4> parts{
      {{"g", mass2}, {"cm", length2}, {"s", time2}, {"K", temperature2}}};
  std::string text;
  for (const auto& [symbol, doubled] : parts) {
    if (doubled == 0) continue;
    if (!text.empty()) text += ' ';
    text += symbol;
    append_power(text, doubled);
  }
  return text.empty() ? "1" : text;
}

}  // namespace brume::units
