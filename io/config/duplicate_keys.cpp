#include "io/config/duplicate_keys.hpp"

#include <map>

#include "io/config/error.hpp"

namespace brume::config {

namespace {

void visit(const YAML::Node& node, const std::string& path, const std::string& file) {
  if (node.IsSequence()) {
    for (std::size_t i = 0; i < node.size(); ++i) {
      visit(node[i], path + "[" + std::to_string(i) + "]", file);
    }
    return;
  }
  if (!node.IsMap()) return;
  std::map<std::string, YAML::Mark> seen;
  for (auto it = node.begin(); it != node.end(); ++it) {
    if (!it->first.IsScalar()) continue;  // reported later as a name that is not a word
    const std::string name = it->first.Scalar();
    const std::string here = path.empty() ? name : path + "." + name;
    const YAML::Mark mark = it->first.Mark();
    const auto [first, inserted] = seen.emplace(name, mark);
    if (!inserted) {
      throw Error(file, mark.line + 1, mark.column + 1, here,
                  "given twice (first at line " + std::to_string(first->second.line + 1) +
                      "); keep only one");
    }
    visit(it->second, here, file);
  }
}

}  // namespace

void reject_duplicate_keys(const YAML::Node& root, const std::string& file) {
  visit(root, "", file);
}

}  // namespace brume::config
