#include "io/config/override_reader.hpp"

#include <algorithm>

#include "io/config/error.hpp"
#include "io/config/unknown_name.hpp"
#include "io/config/value_reader.hpp"

namespace brume::config {

namespace {

int to_int(std::size_t value) {
  return static_cast<int>(value);
}

}  // namespace

void read_override(const Schema& schema, const std::string& argument, FoundSettings& found) {
  const std::string where = "--set " + argument;
  const auto equals = argument.find('=');
  if (equals == std::string::npos) {
    throw Error(where, 0, 0, "", "expected section.key=value, e.g. --set box.cells=[32,32,32]");
  }
  const auto first = argument.find_first_not_of(' ');
  const auto last = argument.find_last_not_of(' ', equals == 0 ? 0 : equals - 1);
  if (equals == 0 || first >= equals) {
    throw Error(where, 0, 1, "", "the key before '=' is empty, expected section.key=value");
  }
  const std::string path = argument.substr(first, last - first + 1);
  const KeyEntry* entry = schema.entry(path);
  if (!entry) throw Error(where, 0, to_int(first + 1), path, unknown_path_message(schema, path));

  const std::size_t value_start = equals + 1;  // 0-based column of the value in the argument
  YAML::Node node;
  try {
    node = YAML::Load(argument.substr(value_start));
  } catch (const YAML::ParserException& e) {
    throw Error(where, 0, to_int(value_start + 1) + e.mark.column, path,
                "malformed value: " + e.msg);
  }
  const Key& key = schema.spec(*entry);
  const ReadResult result = read_value(key, node, YAML::Mark());
  if (!result.value) {
    const int column = to_int(value_start + 1) + std::max(0, result.failure.mark.column);
    throw Error(where, 0, column, path + result.failure.path_suffix, result.failure.detail);
  }
  found.settings[path] =
      Setting{*result.value, Source{Source::Origin::command_line, argument, 0, to_int(first + 1)}};
}

}  // namespace brume::config
