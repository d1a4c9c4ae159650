#include "app/stop_signals.hpp"

#include <csignal>

namespace brume::app {

namespace {

volatile std::sig_atomic_t first_signal = 0;

extern "C" void record_stop_signal(int signal_number) {
  if (first_signal == 0) {
    first_signal = signal_number;
    return;
  }
  // Asked twice: the user means it. SIGUSR1 only ever asks.
  if (signal_number == SIGUSR1) return;
  std::signal(signal_number, SIG_DFL);
  std::raise(signal_number);
}

constexpr int stop_signals[] = {SIGTERM, SIGINT, SIGUSR1};

}  // namespace

StopSignals::StopSignals() {
  first_signal = 0;
  for (const int s : stop_signals)
    std::signal(s, record_stop_signal);
}

StopSignals::~StopSignals() {
  for (const int s : stop_signals)
    std::signal(s, SIG_DFL);
}

int StopSignals::received() {
  return first_signal;
}

const char* signal_name(int signal_number) {
  switch (signal_number) {
    case SIGTERM:
      return "SIGTERM";
    case SIGINT:
      return "SIGINT";
    case SIGUSR1:
      return "SIGUSR1";
    default:
      return "a signal";
  }
}

}  // namespace brume::app
