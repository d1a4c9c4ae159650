// The schema refuses inconsistent section lists at construction.
#include <gtest/gtest.h>

#include "io/config/schema.hpp"
#include "solver/units/dimension.hpp"

namespace brume::config {
namespace {

Section one_key_section(std::string path, Key key) {
  return Section{std::move(path), "A test section.", {std::move(key)}, {}, std::nullopt};
}

void expect_refused(std::vector<Section> sections, const std::string& words) {
  try {
    const Schema schema(std::move(sections));
    FAIL() << "expected std::logic_error mentioning: " << words;
  } catch (const std::logic_error& e) {
    EXPECT_NE(std::string(e.what()).find(words), std::string::npos) << e.what();
  }
}

TEST(ConfigSchema, AcceptsAConsistentSchemaAndIndexesItsKeys) {
  const Schema schema =
      Schema::combine({{one_key_section("a", integer_key("n", "A count.").with_default("3"))},
                       {one_key_section("a.b", flag_key("on", "A switch.").with_default("true"))}});
  ASSERT_NE(schema.entry("a.b.on"), nullptr);
  EXPECT_TRUE(std::get<bool>(*schema.entry("a.b.on")->default_value));
  EXPECT_EQ(std::get<long long>(*schema.entry("a.n")->default_value), 3);
  ASSERT_EQ(schema.children("a").size(), 1U);
  EXPECT_EQ(schema.children("a").front()->path, "a.b");
}

TEST(ConfigSchema, DefaultsGoThroughTheirKeysChecks) {
  expect_refused(
      {one_key_section("a",
                       quantity_key("l", units::dim::length, "pc", "L.").with_default("1 km/s"))},
      "a.l");
  expect_refused({one_key_section("a", integer_key("n", "N.").with_default("0").at_least(1))},
                 ">= 1");
  expect_refused({one_key_section("a", real_key("x", "X.").with_default("[1, 2"))}, "not YAML");
}

TEST(ConfigSchema, RefusesStructuralMistakes) {
  expect_refused({one_key_section("a.b", flag_key("on", "On."))}, "parent section 'a'");
  expect_refused(
      {one_key_section("a", flag_key("on", "On.")), one_key_section("a", flag_key("off", "Off."))},
      "section defined twice");
  expect_refused({Section{"a", "A.", {flag_key("on", "On."), flag_key("on", "On.")}, {}, {}}},
                 "key defined twice");
  expect_refused({one_key_section("a", choice_key("c", {}, "C."))}, "needs choices");
  expect_refused({one_key_section("a", flag_key("on", "On.").three())}, "three values");
  expect_refused({one_key_section("A", flag_key("on", "On."))}, "lower-case");
  expect_refused({one_key_section("a", quantity_key("l", units::dim::length, "s", "L."))},
                 "unit 's'");
  expect_refused(
      {one_key_section("a", flag_key("b", "B.")), one_key_section("a.b", flag_key("on", "On."))},
      "same name");
}

TEST(ConfigSchema, ActivationMustNameAChoice) {
  Section chooser = one_key_section("p", choice_key("name", {{"x", "X."}}, "Which."));
  Section bad = one_key_section("p.y", flag_key("on", "On."));
  bad.only_when = Activation{"p.name", "y"};
  expect_refused({chooser, bad}, "not a choice of p.name");
}

}  // namespace
}  // namespace brume::config
