// "Did you mean" support: the candidate closest to a misspelt word, if it is close enough. Used
// for unit symbols here and for configuration keys, sections, choices and subcommands above.
#pragma once

#include <optional>
#include <span>
#include <string>
#include <string_view>
#include <vector>

namespace brume::units {

// Damerau–Levenshtein distance in its optimal-string-alignment form between two UTF-8 strings,
// counted in code points: insertions, deletions, substitutions and transpositions of adjacent
// code points cost one each, and no substring is edited twice (Levenshtein 1966; Damerau 1964).
[[nodiscard]] int edit_distance(std::string_view a, std::string_view b);

// How far a word may be from a candidate to count as a misspelling of it.
enum class Leniency {
  symbols,  // short unit symbols: 0 edits for one letter, 1 up to five, 2 beyond
  names,    // words of configuration and the command line: 1 up to three, 2 up to five, 3 beyond
};

// The candidate with the smallest edit distance to `word`, ignoring ASCII case (ties: the
// exact-case distance, then the first in order), or nothing if even that one is not close
// enough, or if `word` is itself a candidate. A suggestion never replaces a whole candidate.
[[nodiscard]] std::optional<std::string_view> nearest_spelling(
    std::string_view word, std::span<const std::string_view> candidates,
    Leniency leniency = Leniency::symbols);

// The same for a list of names (Leniency::names).
[[nodiscard]] std::optional<std::string> nearest_name(std::string_view word,
                                                      const std::vector<std::string>& candidates);

}  // namespace brume::units
