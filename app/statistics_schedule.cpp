#include "app/statistics_schedule.hpp"

#include <chrono>
#include <cstdio>
#include <limits>
#include <stdexcept>
#include <utility>

#include "app/on_rank_zero.hpp"
#include "app/user_error.hpp"
#include "physics/box_overview.hpp"
#include "solver/constrained_transport.hpp"

namespace brume::app {

namespace {

std::string statistics_name(int number) {
  char name[40];
  std::snprintf(name, sizeof name, "statistics-%04d.h5", number);
  return name;
}

double number_named(const std::vector<io::MeasuredNumber>& numbers, const std::string& name) {
  for (const io::MeasuredNumber& n : numbers)
    if (n.name == name) return n.value;
  return 0.0;
}

// Rank 0's output failure, as a user error on every rank (disk full, folder removed).
void on_rank_zero_writing(MPI_Comm comm, const std::function<void()>& action) {
  on_rank_zero(comm, [&] {
    try {
      action();
    } catch (const std::runtime_error& error) {
      throw UserError(error.what());
    }
  });
}

class WallClock {
 public:
  explicit WallClock(double& total) : total_(total), start_(std::chrono::steady_clock::now()) {}
  ~WallClock() {
    total_ += std::chrono::duration<double>(std::chrono::steady_clock::now() - start_).count();
  }
  WallClock(const WallClock&) = delete;
  WallClock& operator=(const WallClock&) = delete;

 private:
  double& total_;
  std::chrono::steady_clock::time_point start_;
};

}  // namespace

StatisticsSchedule::StatisticsSchedule(std::filesystem::path folder,
                                       std::vector<ScheduledDiagnostic> diagnostics,
                                       physics::RunContext context, io::StatisticsHeader header,
                                       double interval, long long timeline_every, double time_unit,
                                       const io::Log& log)
    : folder_(std::move(folder)),
      diagnostics_(std::move(diagnostics)),
      context_(std::move(context)),
      header_(std::move(header)),
      interval_(interval),
      next_(interval > 0.0 ? interval : std::numeric_limits<double>::infinity()),
      timeline_every_(timeline_every),
      time_unit_(time_unit),
      log_(log) {
  int rank = 0;
  MPI_Comm_rank(context_.comm, &rank);
  if (rank == 0) timeline_.emplace(folder_);
}

void StatisticsSchedule::refresh_cells(const solver::State& state) {
  // A row and a file at the same step share one pass over the block.
  if (state.step == cells_step_) return;
  physics::fill_cell_quantities(state, context_, cells_);
  cells_step_ = state.step;
}

void StatisticsSchedule::measure(const solver::State& state, bool everything) {
  if (state.step == last_step_) return;
  const WallClock clock(wall_);
  last_step_ = state.step;
  refresh_cells(state);
  std::vector<io::Measurement> results;
  for (const ScheduledDiagnostic& d : diagnostics_) {
    if (everything || count_ % d.every == 0)
      results.push_back(d.diagnostic->measure(cells_, context_));
  }
  io::StatisticsHeader header = header_;
  header.time = state.time;
  header.step = state.step;
  const std::filesystem::path file = folder_ / statistics_name(count_++);
  on_rank_zero_writing(context_.comm, [&] { io::write_statistics(file, header, results); });
  // Each warning is printed the first time only; every statistics file keeps its own.
  for (const io::Measurement& m : results) {
    for (const std::string& w : m.warnings) {
      const std::string text = m.name + ": " + w;
      if (printed_warnings_.insert(text).second) {
        log_.warning(text);
      } else if (!said_repeats_) {
        said_repeats_ = true;
        log_.info(
            "brume: statistics warnings that repeat are not printed again; each statistics "
            "file keeps its own (attribute `warnings` of each group)");
      }
    }
  }
  log_.detail("brume: wrote " + file.string());
}

void StatisticsSchedule::timeline_row(const solver::State& state, double dt,
                                      const SplitIntegrator& integrator,
                                      const RunCounters& counters) {
  if (timeline_every_ <= 0 || state.step == last_row_step_) return;
  const WallClock clock(wall_);
  last_row_step_ = state.step;
  refresh_cells(state);
  // make_diagnostics puts the overview first: its numbers are the columns.
  const io::Measurement overview = diagnostics_.front().diagnostic->measure(cells_, context_);
  std::vector<io::MeasuredNumber> row = {
      {"step", double(state.step), "1", 1.0, "Steps since the start of the run"},
      {"time", state.time / time_unit_, "Myr", 3.15576e13, "Simulated time"},
      {"time_step", dt / time_unit_, "Myr", 3.15576e13, "The step that led here"}};
  row.insert(row.end(), overview.numbers.begin(), overview.numbers.end());
  const double mechanical = number_named(overview.numbers, "kinetic_energy") +
                            number_named(overview.numbers, "magnetic_energy_mean_field") +
                            number_named(overview.numbers, "magnetic_energy_fluctuating");
  if (!initial_mechanical_) initial_mechanical_ = mechanical;
  for (const auto& term : integrator.terms()) {
    const std::vector<io::MeasuredNumber> budget = term->budget();
    row.insert(row.end(), budget.begin(), budget.end());
    if (term->name() == "forcing") {
      const double work = number_named(budget, "stirring_work");
      row.push_back({"dissipated_energy", work - (mechanical - *initial_mechanical_), "erg", 1.0,
                     "Stirring work minus the gain of kinetic + magnetic energy since the start "
                     "(numerical and explicit dissipation, and net pdV work)"});
    }
  }
  double divergence = solver::relative_divergence(state);
  MPI_Allreduce(MPI_IN_PLACE, &divergence, 1, MPI_DOUBLE, MPI_MAX, context_.comm);
  row.push_back({"divergence_max", divergence, "1", 1.0,
                 "max |div B| dx / max |B| over the cells (of each block)"});
  row.push_back({"density_floors", double(counters.density_floors), "1", 1.0,
                 "Cell-stages floored in density since the start"});
  row.push_back({"pressure_floors", double(counters.pressure_floors), "1", 1.0,
                 "Cell-stages floored in pressure since the start"});
  row.push_back({"fallback_cells", double(counters.fallback_cells), "1", 1.0,
                 "Cell updates redone at first order since the start"});
  on_rank_zero_writing(context_.comm, [&] { timeline_->append(row); });
}

void StatisticsSchedule::after_step(const solver::State& state, double dt,
                                    const SplitIntegrator& integrator,
                                    const RunCounters& counters) {
  if (timeline_every_ > 0 && state.step % timeline_every_ == 0)
    timeline_row(state, dt, integrator, counters);
  if (interval_ > 0.0 && state.time >= next_ - 1e-12 * interval_) {
    measure(state, false);
    while (next_ <= state.time + 1e-12 * interval_)
      next_ += interval_;
  }
}

void StatisticsSchedule::write_timeline_hdf5() const {
  if (timeline_every_ <= 0) return;
  on_rank_zero_writing(context_.comm, [&] { timeline_->write_hdf5(); });
}

void StatisticsSchedule::save(io::RunRecord& record) const {
  record.set("statistics_count", static_cast<long long>(count_));
  record.set("statistics_next_time", next_);
  record.set("statistics_last_step", static_cast<long long>(last_step_));
  record.set("timeline_last_step", static_cast<long long>(last_row_step_));
  record.set("timeline_initial_mechanical_energy", initial_mechanical_.value_or(0.0));
}

void StatisticsSchedule::restore(const io::RunRecord& record, const solver::State& state) {
  count_ = static_cast<int>(record.integer("statistics_count"));
  next_ = record.real("statistics_next_time");
  last_step_ = static_cast<long>(record.integer("statistics_last_step"));
  last_row_step_ = static_cast<long>(record.integer("timeline_last_step"));
  initial_mechanical_ = record.real("timeline_initial_mechanical_energy");
  on_rank_zero_writing(context_.comm, [&] { timeline_->resume(state.step); });
}

}  // namespace brume::app
