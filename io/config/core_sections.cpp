#include "io/config/core_sections.hpp"

#include <array>

#include "io/config/resolved.hpp"
#include "solver/units/dimension.hpp"

namespace brume::config {

namespace {

namespace dim = units::dim;

// Periodic boundaries come in pairs: a periodic face needs a periodic opposite face.
std::optional<Issue> periodic_in_pairs(const SectionValues& values) {
  for (const char* axis : {"x", "y", "z"}) {
    const std::string lower = std::string(axis) + "_lower";
    const std::string upper = std::string(axis) + "_upper";
    const bool lower_periodic = values.text(lower) == "periodic";
    const bool upper_periodic = values.text(upper) == "periodic";
    if (lower_periodic == upper_periodic) continue;
    const std::string& periodic = lower_periodic ? lower : upper;
    const std::string& other = lower_periodic ? upper : lower;
    return Issue{other, periodic + " is periodic but " + other + " is " + values.text(other) +
                            "; set both to periodic or neither"};
  }
  return std::nullopt;
}

// HLLC solves hydrodynamics only and HLLD magnetized flows only.
std::optional<Issue> solver_fits_the_gas(const SectionValues& values) {
  const std::string& solver = values.text("riemann_solver");
  const bool magnetized = values.config().flag("gas.magnetized");
  if (solver == "hllc" && magnetized) {
    return Issue{"riemann_solver",
                 "hllc is for hydrodynamics but gas.magnetized is true; choose hlld, hlle or llf, "
                 "or set gas.magnetized: false"};
  }
  if (solver == "hlld" && !magnetized) {
    return Issue{"riemann_solver",
                 "hlld is for magnetized gas but gas.magnetized is false; choose hllc, hlle or "
                 "llf, or set gas.magnetized: true"};
  }
  return std::nullopt;
}

Section box() {
  return {"box",
          "The simulated Cartesian box: resolution, size and position.",
          {integer_key("cells", "Number of cells along x, y and z.")
               .three()
               .with_default("[64, 64, 64]")
               .at_least(1)
               .at_most(1048576),
           quantity_key("size", dim::length, "pc", "Edge lengths of the box along x, y and z.")
               .three()
               .with_default("[1 pc, 1 pc, 1 pc]")
               .above(0),
           quantity_key("origin", dim::length, "pc", "Position of the box's lower corner.")
               .three()
               .with_default("0 pc"),
           integer_key("ranks",
                       "MPI ranks along x, y and z; their product must be the number of ranks "
                       "and each must divide box.cells along its axis. 0 lets brume choose "
                       "(the split with the smallest halo surface); [0, 0, 0] chooses all three.")
               .three()
               .with_default("[0, 0, 0]")
               .at_least(0)
               .at_most(1048576)},
          {},
          std::nullopt};
}

Section boundaries() {
  const std::vector<Choice> kinds{
      {"periodic", "Gas leaving through this face enters through the opposite one."},
      {"outflow", "Zero-gradient copy of the last interior cells."},
      {"reflecting", "Mirror with the normal velocity and normal field reversed."}};
  Section section{"box.boundaries", "Boundary condition on each face of the box.", {}, {}, {}};
  for (const char* axis : {"x", "y", "z"}) {
    for (const char* side : {"lower", "upper"}) {
      const std::string name = std::string(axis) + "_" + side;
      section.keys.push_back(
          choice_key(name, kinds, "Boundary at the " + std::string(side) + " " + axis + " face.")
              .with_default("periodic"));
    }
  }
  section.validators.push_back(periodic_in_pairs);
  return section;
}

Section gas() {
  return {"gas",
          "Thermodynamics of the gas.",
          {choice_key("equation_of_state",
                      {{"ideal", "Ideal gas with a constant adiabatic index."},
                       {"isothermal", "Constant sound speed; no energy equation."}},
                      "Equation of state.")
               .with_default("ideal"),
           real_key("adiabatic_index", "Ratio of specific heats of the ideal gas.")
               .with_default("1.6666666666666667")
               .above(1)
               .at_most(3),
           quantity_key("sound_speed", dim::velocity, "km/s",
                        "Isothermal sound speed (used when the gas is isothermal).")
               .with_default("1 km/s")
               .above(0),
           real_key("mean_molecular_weight", "Mean mass per particle in units of m_H.")
               .with_default("1.27")
               .above(0)
               .at_most(100),
           flag_key("magnetized", "Evolve a magnetic field (MHD); false for hydrodynamics.")
               .with_default("true")},
          {},
          std::nullopt};
}

Section code_units() {
  return {"units",
          "The code units: values in the solver are multiples of these.",
          {quantity_key("length", dim::length, "pc", "Code unit of length.")
               .with_default("1 pc")
               .above(0),
           quantity_key("velocity", dim::velocity, "km/s", "Code unit of velocity.")
               .with_default("1 km/s")
               .above(0),
           quantity_key("number_density", dim::number_density, "cm^-3",
                        "Code unit of number density (with the mean molecular weight it fixes "
                        "the code unit of mass density).")
               .with_default("1 cm^-3")
               .above(0)},
          {},
          std::nullopt};
}

Section scheme() {
  return {"scheme",
          "The finite-volume scheme for the ideal-MHD step.",
          {choice_key("reconstruction",
                      {{"donor", "Piecewise constant (first order)."},
                       {"plm", "Piecewise linear in primitive variables."},
                       {"ppm", "Piecewise parabolic."}},
                      "Reconstruction of interface states.")
               .with_default("plm"),
           choice_key("limiter",
                      {{"mc", "Monotonized central slope limiter."},
                       {"van_leer", "Harmonic-mean slope limiter of van Leer."}},
                      "Slope limiter of the piecewise-linear reconstruction.")
               .with_default("mc"),
           choice_key("ppm_limiter",
                      {{"extremum_preserving",
                        "Keeps smooth extrema, flattens only jumps (Colella & Sekora 2008)."},
                       {"monotone", "Flattens every extremum (Colella & Woodward 1984)."}},
                      "Limiter of the piecewise-parabolic reconstruction.")
               .with_default("monotone"),
           flag_key("characteristic_limiting",
                    "Limit PLM slopes in characteristic rather than primitive variables.")
               .with_default("false"),
           choice_key("riemann_solver",
                      {{"llf", "Local Lax-Friedrichs."},
                       {"hlle", "Two-wave HLLE."},
                       {"hllc", "Three-wave HLLC (hydrodynamics)."},
                       {"hlld", "Five-wave HLLD (MHD)."}},
                      "Approximate Riemann solver for interface fluxes.")
               .with_default("hlld"),
           real_key("courant", "CFL number: time step as a fraction of the signal-crossing time.")
               .with_default("0.3")
               .above(0)
               .below(1),
           quantity_key("density_floor", dim::number_density, "cm^-3",
                        "Smallest number density the solver keeps (counted when applied).")
               .with_default("1e-8 cm^-3")
               .above(0),
           quantity_key("pressure_floor", dim::pressure, "K cm^-3",
                        "Smallest thermal pressure, as P/k_B (counted when applied).")
               .with_default("1e-6 K cm^-3")
               .above(0),
           real_key("floor_limit",
                    "Largest fraction of the box's cells the floors may act on in one step "
                    "(both floors, both stages, summed); beyond it the run stops as failed.")
               .with_default("0.01")
               .above(0)
               .at_most(1)},
          {solver_fits_the_gas},
          std::nullopt};
}

Section clock() {
  return {"clock",
          "When the run stops.",
          {quantity_key("stop_time", dim::time, "Myr", "Simulated time at which the run ends.")
               .above(0),
           integer_key("max_steps",
                       "Step number at which the run stops, counted from its start across "
                       "restarts (0: no limit).")
               .with_default("0")
               .at_least(0),
           quantity_key("wall_budget", dim::time, "h",
                        "Wall-clock time of one invocation after which the run writes a "
                        "checkpoint and stops with exit code 4 (0: none).")
               .with_default("0 h")
               .at_least(0)},
          {},
          std::nullopt};
}

Section output() {
  return {
      "output",
      "What the run writes and where.",
      {text_key("folder", "Output folder (empty: runs/<name of the input file>).")
           .with_default("\"\""),
       quantity_key("snapshot_interval", dim::time, "Myr",
                    "Simulated time between snapshots (0: only at the end).")
           .with_default("0 Myr")
           .at_least(0),
       quantity_key("progress_interval", dim::time, "s", "Wall-clock time between progress lines.")
           .with_default("5 s")
           .at_least(0),
       choice_key("precision", {{"float64", "Double precision."}, {"float32", "Single precision."}},
                  "Floating-point precision of snapshot fields.")
           .with_default("float64"),
       choice_key("compression",
                  {{"none", "Contiguous datasets, written as they are."},
                   {"deflate", "Chunked datasets, byte-shuffled and deflated (zlib), lossless."}},
                  "Compression of snapshot fields.")
           .with_default("none"),
       integer_key("compression_level",
                   "Deflate level when output.compression is deflate: 1 fastest, 9 smallest.")
           .with_default("4")
           .at_least(1)
           .at_most(9),
       quantity_key("checkpoint_interval", dim::time, "h",
                    "Wall-clock time between checkpoints (0: only when the run stops).")
           .with_default("1 h")
           .at_least(0),
       integer_key("checkpoints_kept", "How many of the newest checkpoints the run folder keeps.")
           .with_default("2")
           .at_least(1)},
      {},
      std::nullopt};
}

Section problem(const std::vector<Choice>& problems) {
  return {"problem",
          "The initial condition; its parameters are in the subsection named after it.",
          {choice_key("name", problems, "Name of the problem that sets up the initial state.")},
          {},
          std::nullopt};
}

}  // namespace

std::vector<Section> core_sections(const std::vector<Choice>& problems) {
  return {box(), boundaries(), gas(), code_units(), scheme(), clock(), output(), problem(problems)};
}

}  // namespace brume::config
