// Reference documentation generated from the schema.
#include <gtest/gtest.h>

#include "io/config/error.hpp"
#include "io/config/reference.hpp"
#include "tests/config/test_schema.hpp"

namespace brume::config {
namespace {

using testing::test_schema;

TEST(ConfigReference, MarkdownListsEverySectionAndKey) {
  const std::string page = markdown_reference(test_schema());
  for (const Section& section : test_schema().sections()) {
    EXPECT_NE(page.find("\n## `" + section.path + "`\n"), std::string::npos) << section.path;
    for (const Key& key : section.keys) {
      EXPECT_NE(page.find("| `" + key.name + "` | "), std::string::npos) << key.name;
    }
  }
  EXPECT_EQ(page, markdown_reference(test_schema()));  // deterministic
}

TEST(ConfigReference, MarkdownRowsCarryTypeUnitDefaultAndRange) {
  const std::string page = markdown_reference(test_schema());
  EXPECT_NE(page.find("| `cells` | integer ×3 |  | `[64, 64, 64]` | within [1, 1048576] |"),
            std::string::npos)
      << page;
  EXPECT_NE(page.find("| `stop_time` | time | `Myr` | **required** | > 0 Myr |"),
            std::string::npos);
  EXPECT_NE(page.find("| `reconstruction` | choice |  | `plm` | donor, plm, ppm |"),
            std::string::npos);
  EXPECT_NE(page.find("Applies when `problem.name` is `blast_wave`."), std::string::npos);
  EXPECT_NE(page.find("- `blast_wave`: A point explosion."), std::string::npos);
  // Keys sharing their choices list them once.
  EXPECT_NE(page.find("Choices of `x_lower`, `x_upper`, `y_lower`, `y_upper`, `z_lower`, "
                      "`z_upper`:\n\n- `periodic`: "),
            std::string::npos);
}

TEST(ConfigReference, SubsectionsFollowTheirParent) {
  const std::string page = markdown_reference(test_schema());
  const auto box = page.find("## `box`");
  const auto boundaries = page.find("## `box.boundaries`");
  const auto gas = page.find("## `gas`");
  EXPECT_LT(box, boundaries);
  EXPECT_LT(boundaries, gas);
}

TEST(ConfigReference, TextReferenceFiltersBySection) {
  const std::string box = text_reference(test_schema(), "box");
  EXPECT_NE(box.find("[box.boundaries]"), std::string::npos);
  EXPECT_NE(box.find("  cells = [64, 64, 64]"), std::string::npos) << box;
  EXPECT_EQ(box.find("[gas]"), std::string::npos);
  const std::string all = text_reference(test_schema(), "");
  EXPECT_NE(all.find("[gas]"), std::string::npos);
  EXPECT_NE(all.find("  stop_time = <required>"), std::string::npos);
}

TEST(ConfigReference, UnknownFilterSuggestsASection) {
  try {
    (void)text_reference(test_schema(), "shceme");
    FAIL() << "expected config::Error";
  } catch (const Error& e) {
    EXPECT_NE(std::string(e.what()).find("did you mean 'scheme'?"), std::string::npos) << e.what();
  }
}

}  // namespace
}  // namespace brume::config
