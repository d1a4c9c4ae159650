#include "tests/config/test_schema.hpp"

#include "io/config/core_sections.hpp"
#include "solver/units/dimension.hpp"

namespace brume::config::testing {

namespace {

std::vector<Section> fake_problems() {
  Section blast{
      "problem.blast_wave",
      "A point explosion in a uniform medium.",
      {quantity_key("energy", units::dim::energy, "erg", "Energy of the explosion.").above(0),
       quantity_key("radius", units::dim::length, "pc", "Radius of the hot sphere.")
           .with_default("0.1 pc")
           .above(0)},
      {},
      Activation{"problem.name", "blast_wave"}};
  Section quiet{"problem.quiet_box",
                "Gas at rest.",
                {integer_key("seed", "Seed of the noise.").with_default("1").at_least(0)},
                {},
                Activation{"problem.name", "quiet_box"}};
  return {blast, quiet};
}

}  // namespace

const Schema& test_schema() {
  static const Schema schema = Schema::combine(
      {core_sections({{"blast_wave", "A point explosion."}, {"quiet_box", "Gas at rest."}}),
       fake_problems()});
  return schema;
}

}  // namespace brume::config::testing
