#include "app/command_line.hpp"

#include <algorithm>

#include "app/user_error.hpp"
#include "solver/units/nearest_spelling.hpp"

namespace brume::app {

const std::vector<SubcommandInfo>& subcommands() {
  static const std::vector<SubcommandInfo> list = {
      {"run", "CONFIG [--set KEY=VALUE]... [--out DIR] | --restart CHECKPOINT|RUN_FOLDER",
       "run a simulation, or continue one from a checkpoint"},
      {"check", "CONFIG [--set KEY=VALUE]...",
       "validate a configuration; print it resolved, with derived quantities"},
      {"keys", "[SECTION] [--markdown]",
       "list every configuration key: type, unit, default, range"},
      {"problems", "", "list the initial conditions brume can set up"},
      {"bench", "[scaling] [--json] [--cells N] [--steps N]",
       "measure cell-updates per second per core and bytes per cell of the main schemes; "
       "scaling: the same over 1, 2, 4, ... ranks (under mpiexec)"},
      {"inspect", "FILE [--json] [--configuration]",
       "describe a snapshot (fields, units, provenance) and check that it is sound"},
      {"analyze", "SNAPSHOT [--out FILE] [--set KEY=VALUE]...",
       "measure a saved snapshot with the run's diagnostics (PDFs, spectra, maps, ...)"},
      {"plot", "RUN_FOLDER [--out DIR]",
       "draw the figures of a run folder as PNG files (time series, PDFs, spectra, maps)"},
      {"steadiness", "RUN_FOLDER [--since TIME]",
       "tell from a run's time series whether it is statistically steady, and since when"},
  };
  return list;
}

namespace {

bool is_subcommand(const std::string& word) {
  const auto& list = subcommands();
  return std::any_of(list.begin(), list.end(), [&](const auto& s) { return word == s.name; });
}

// "--set" takes its value from the next word or after '=' ("--set=a.b=1").
std::string option_value(const std::vector<std::string>& words, std::size_t& i,
                         const std::string& option) {
  const std::string& word = words[i];
  if (word.size() > option.size() && word[option.size()] == '=') {
    return word.substr(option.size() + 1);
  }
  if (i + 1 >= words.size()) {
    throw UserError("command line: " + option + " needs a value (" +
                    (option == "--set"       ? "--set SECTION.KEY=VALUE"
                     : option == "--out"     ? option + " DIR"
                     : option == "--restart" ? option + " CHECKPOINT|RUN_FOLDER"
                     : option == "--since"   ? option + " TIME"
                                             : option + " N") +
                    ")");
  }
  return words[++i];
}

std::string unknown_command(const std::string& word) {
  std::vector<std::string_view> names;
  std::string list;
  for (const auto& s : subcommands()) {
    names.emplace_back(s.name);
    list += (list.empty() ? "" : ", ") + std::string(s.name);
  }
  std::string message = "command line: unknown command '" + word + "'";
  if (const auto near = units::nearest_spelling(word, names)) {
    message += " (did you mean '" + std::string(*near) + "'?)";
  }
  return message + "; expected one of " + list + " (see brume --help)";
}

bool starts_with_option(const std::string& word, const std::string& option) {
  return word == option || word.rfind(option + "=", 0) == 0;
}

}  // namespace

CommandLine parse_command_line(const std::vector<std::string>& words) {
  CommandLine line;
  for (std::size_t i = 0; i < words.size(); ++i) {
    const std::string& word = words[i];
    if (word == "--help" || word == "-h") {
      line.help = true;
    } else if (word == "--version") {
      line.version = true;
    } else if (word == "--quiet" || word == "-q") {
      line.verbosity = io::Verbosity::quiet;
    } else if (word == "--verbose" || word == "-v") {
      line.verbosity = io::Verbosity::verbose;
    } else if (word == "--markdown") {
      line.markdown = true;
    } else if (starts_with_option(word, "--set")) {
      line.overrides.push_back(option_value(words, i, "--set"));
    } else if (starts_with_option(word, "--out")) {
      line.out = option_value(words, i, "--out");
    } else if (starts_with_option(word, "--restart")) {
      line.restart = option_value(words, i, "--restart");
    } else if (word == "--json") {
      line.json = true;
    } else if (word == "--configuration") {
      line.configuration = true;
    } else if (starts_with_option(word, "--cells")) {
      line.cells = option_value(words, i, "--cells");
    } else if (starts_with_option(word, "--steps")) {
      line.steps = option_value(words, i, "--steps");
    } else if (starts_with_option(word, "--since")) {
      line.since = option_value(words, i, "--since");
    } else if (word.size() > 1 && word[0] == '-') {
      throw UserError("command line: unknown option '" + word + "' (see brume --help)");
    } else if (line.command.empty()) {
      if (!is_subcommand(word)) throw UserError(unknown_command(word));
      line.command = word;
    } else {
      line.positional.push_back(word);
    }
  }
  return line;
}

}  // namespace brume::app
