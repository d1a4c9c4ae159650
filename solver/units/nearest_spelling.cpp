#include "solver/units/nearest_spelling.hpp"

#include <algorithm>
#include <numeric>
#include <vector>

namespace brume::units {

namespace {

// Code points of a UTF-8 string; a byte that does not start a well-formed sequence counts alone.
std::vector<char32_t> code_points(std::string_view text) {
  std::vector<char32_t> points;
  std::size_t i = 0;
  while (i < text.size()) {
    const auto lead = static_cast<unsigned char>(text[i]);
    std::size_t length = 1;
    char32_t point = lead;
    if (lead >= 0xC0 && lead < 0xE0) {
      length = 2;
      point = lead & 0x1Fu;
    } else if (lead >= 0xE0 && lead < 0xF0) {
      length = 3;
      point = lead & 0x0Fu;
    } else if (lead >= 0xF0 && lead < 0xF8) {
      length = 4;
      point = lead & 0x07u;
    }
    bool well_formed = i + length <= text.size();
    for (std::size_t k = 1; well_formed && k < length; ++k) {
      const auto next = static_cast<unsigned char>(text[i + k]);
      well_formed = (next & 0xC0u) == 0x80u;
      point = (point << 6) | (next & 0x3Fu);
    }
    if (!well_formed) {
      length = 1;
      point = lead;
    }
    points.push_back(point);
    i += length;
  }
  return points;
}

char32_t ascii_lower(char32_t c) {
  return (c >= U'A' && c <= U'Z') ? c - U'A' + U'a' : c;
}

// Optimal string alignment distance (Levenshtein 1966 with Damerau's 1964 adjacent
// transposition), three-row form.
int alignment_distance(const std::vector<char32_t>& a, const std::vector<char32_t>& b,
                       bool fold_case) {
  auto same = [fold_case](char32_t x, char32_t y) {
    return fold_case ? ascii_lower(x) == ascii_lower(y) : x == y;
  };
  std::vector<int> before(b.size() + 1);
  std::vector<int> previous(b.size() + 1);
  std::vector<int> current(b.size() + 1);
  std::iota(previous.begin(), previous.end(), 0);
  for (std::size_t i = 1; i <= a.size(); ++i) {
    current[0] = static_cast<int>(i);
    for (std::size_t j = 1; j <= b.size(); ++j) {
      int best = std::min({previous[j] + 1, current[j - 1] + 1,
                           previous[j - 1] + (same(a[i - 1], b[j - 1]) ? 0 : 1)});
      if (i > 1 && j > 1 && same(a[i - 1], b[j - 2]) && same(a[i - 2], b[j - 1])) {
        best = std::min(best, before[j - 2] + 1);
      }
      current[j] = best;
    }
    std::swap(before, previous);
    std::swap(previous, current);
  }
  return previous[b.size()];
}

int allowed_edits(std::size_t length, Leniency leniency) {
  if (leniency == Leniency::symbols) return length <= 1 ? 0 : (length <= 5 ? 1 : 2);
  return length <= 3 ? 1 : (length <= 5 ? 2 : 3);
}

}  // namespace

int edit_distance(std::string_view a, std::string_view b) {
  return alignment_distance(code_points(a), code_points(b), false);
}

std::optional<std::string_view> nearest_spelling(std::string_view word,
                                                 std::span<const std::string_view> candidates,
                                                 Leniency leniency) {
  const auto points = code_points(word);
  const int allowed = allowed_edits(points.size(), leniency);
  std::optional<std::string_view> best;
  int best_folded = allowed + 1;
  int best_exact = 0;
  for (const std::string_view candidate : candidates) {
    const auto other = code_points(candidate);
    const int folded = alignment_distance(points, other, true);
    if (folded > allowed || folded >= static_cast<int>(other.size())) continue;
    const int exact = alignment_distance(points, other, false);
    if (exact == 0) return std::nullopt;  // a known word needs no suggestion
    if (folded < best_folded || (folded == best_folded && exact < best_exact)) {
      best = candidate;
      best_folded = folded;
      best_exact = exact;
    }
  }
  return best;
}

std::optional<std::string> nearest_name(std::string_view word,
                                        const std::vector<std::string>& candidates) {
  const std::vector<std::string_view> views(candidates.begin(), candidates.end());
  const auto best = nearest_spelling(word, views, Leniency::names);
  return best ? std::optional<std::string>(*best) : std::nullopt;
}

}  // namespace brume::units
