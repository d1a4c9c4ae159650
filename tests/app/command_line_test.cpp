#include "app/command_line.hpp"

#include <gtest/gtest.h>

#include "app/user_error.hpp"

using brume::app::parse_command_line;
using brume::app::UserError;

TEST(CommandLine, SortsWordsIntoCommandArgumentsAndOptions) {
  const auto line = parse_command_line({"run", "box.yaml", "--set", "box.cells=32",
                                        "--set=clock.stop_time=1Myr", "--out", "runs/x", "-q"});
  EXPECT_EQ(line.command, "run");
  ASSERT_EQ(line.positional.size(), 1u);
  EXPECT_EQ(line.positional[0], "box.yaml");
  ASSERT_EQ(line.overrides.size(), 2u);
  EXPECT_EQ(line.overrides[0], "box.cells=32");
  EXPECT_EQ(line.overrides[1], "clock.stop_time=1Myr");
  EXPECT_EQ(line.out.value_or(""), "runs/x");
  EXPECT_EQ(line.verbosity, brume::io::Verbosity::quiet);
}

TEST(CommandLine, RejectsUnknownWordsAndMissingValues) {
  EXPECT_THROW((void)parse_command_line({"simulate", "box.yaml"}), UserError);
  EXPECT_THROW((void)parse_command_line({"run", "--frobnicate"}), UserError);
  EXPECT_THROW((void)parse_command_line({"run", "box.yaml", "--set"}), UserError);
  EXPECT_THROW((void)parse_command_line({"run", "box.yaml", "--out"}), UserError);
}

TEST(CommandLine, HelpAndVersionNeedNoCommand) {
  EXPECT_TRUE(parse_command_line({"--help"}).help);
  EXPECT_TRUE(parse_command_line({"--version"}).version);
  EXPECT_TRUE(parse_command_line({}).command.empty());
}

TEST(CommandLine, InspectTakesAFileAndItsFlags) {
  const auto line =
      parse_command_line({"inspect", "snapshot-0001.h5", "--json", "--configuration"});
  EXPECT_EQ(line.command, "inspect");
  ASSERT_EQ(line.positional.size(), 1u);
  EXPECT_EQ(line.positional[0], "snapshot-0001.h5");
  EXPECT_TRUE(line.json);
  EXPECT_TRUE(line.configuration);
  EXPECT_FALSE(parse_command_line({"inspect", "a.h5"}).configuration);
}
