#include <cstdio>

#include "app/commands.hpp"
#include "app/schema.hpp"
#include "app/user_error.hpp"
#include "io/config/reference.hpp"

namespace brume::app {

int keys_command(const CommandLine& line) {
  if (line.positional.size() > 1) {
    throw UserError("command line: brume keys takes at most one section name");
  }
  const std::string filter = line.positional.empty() ? "" : line.positional.front();
  if (line.markdown && !filter.empty()) {
    throw UserError("command line: brume keys --markdown writes the whole reference; drop '" +
                    filter + "'");
  }
  const std::string text = line.markdown ? config::markdown_reference(brume_schema())
                                         : config::text_reference(brume_schema(), filter);
  std::fputs(text.c_str(), stdout);
  return 0;
}

}  // namespace brume::app
