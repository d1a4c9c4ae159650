#include "io/progress.hpp"

#include <gtest/gtest.h>

using brume::io::format_duration;

TEST(Progress, DurationsReadNaturally) {
  EXPECT_EQ(format_duration(42.4), "42 s");
  EXPECT_EQ(format_duration(200.0), "3 min 20 s");
  EXPECT_EQ(format_duration(7500.0), "2 h 05 min");
  EXPECT_EQ(format_duration(-1.0), "?");
}

TEST(Progress, LineCarriesStepTimeRateAndTimeToGo) {
  const brume::io::Log log(brume::io::Verbosity::quiet, false);
  const brume::io::Progress progress(log, 5.0, "Myr");
  brume::io::ProgressSample sample;
  sample.step = 120;
  sample.time = 2.5;
  sample.dt = 0.01;
  sample.stop_time = 10.0;
  sample.cells = 4096;
  // Half the wall time per quarter of the run: 30 s so far for 2.5 of 10 Myr leaves 90 s.
  const std::string line = progress.format(sample, 30.0, 1.5e6);
  EXPECT_NE(line.find("step      120"), std::string::npos) << line;
  EXPECT_NE(line.find("t = 2.500000e+00 Myr"), std::string::npos) << line;
  EXPECT_NE(line.find("1.500e+06 cell-updates/s"), std::string::npos) << line;
  EXPECT_NE(line.find("to go 1 min 30 s"), std::string::npos) << line;
}

TEST(Progress, ARestartCountsTheTimeToGoFromWhereItBegan) {
  const brume::io::Log log(brume::io::Verbosity::quiet, false);
  // Continued from 6 Myr: 30 s for 0.5 Myr leaves 3.5 Myr, 210 s.
  const brume::io::Progress progress(log, 5.0, "Myr", 3000, 6.0);
  brume::io::ProgressSample sample;
  sample.step = 3200;
  sample.time = 6.5;
  sample.dt = 0.002;
  sample.stop_time = 10.0;
  sample.cells = 4096;
  const std::string line = progress.format(sample, 30.0, 1.5e6);
  EXPECT_NE(line.find("to go 3 min 30 s"), std::string::npos) << line;
}
