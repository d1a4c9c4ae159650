#include "app/schema.hpp"

#include "io/config/core_sections.hpp"
#include "problems/problem.hpp"

namespace brume::app {

const config::Schema& brume_schema() {
  static const config::Schema schema = config::Schema::combine({
      config::core_sections(problems::problem_choices()),
      problems::problem_sections(),
  });
  return schema;
}

}  // namespace brume::app
