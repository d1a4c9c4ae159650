// Dimension algebra and its readable form.
#include "solver/units/dimension.hpp"

#include <gtest/gtest.h>

namespace brume::units {
namespace {

// The cgs base-unit forms below are facts of the cgs system (common practice, no source).
TEST(Dimension, ToStringOfBaseAndDerivedDimensions) {
  EXPECT_EQ(dim::none.to_string(), "1");
  EXPECT_EQ(dim::length.to_string(), "cm");
  EXPECT_EQ(dim::mass.to_string(), "g");
  EXPECT_EQ(dim::time.to_string(), "s");
  EXPECT_EQ(dim::temperature.to_string(), "K");
  EXPECT_EQ(dim::velocity.to_string(), "cm s^-1");
  EXPECT_EQ(dim::number_density.to_string(), "cm^-3");
  EXPECT_EQ(dim::mass_density.to_string(), "g cm^-3");
  EXPECT_EQ(dim::energy.to_string(), "g cm^2 s^-2");
  EXPECT_EQ(dim::pressure.to_string(), "g cm^-1 s^-2");
  EXPECT_EQ(dim::cooling_rate.to_string(), "g cm^5 s^-3");
  EXPECT_EQ(dim::conductivity.to_string(), "g cm s^-3 K^-1");
  // Gaussian units: 1 G = 1 g^1/2 cm^-1/2 s^-1.
  EXPECT_EQ(dim::magnetic_field.to_string(), "g^1/2 cm^-1/2 s^-1");
  EXPECT_EQ(dim::magnetic_field.pow(3).to_string(), "g^3/2 cm^-3/2 s^-3");
}

TEST(Dimension, AlgebraKeepsHalfPowersExact) {
  // B² has the dimension of an energy density (B²/8π is the magnetic pressure, Gaussian units).
  EXPECT_EQ(dim::magnetic_field * dim::magnetic_field, dim::pressure);
  EXPECT_EQ(dim::pressure.pow(1, 2), dim::magnetic_field);
  EXPECT_EQ(dim::energy / dim::energy, dim::none);
  EXPECT_TRUE(dim::none.dimensionless());
  EXPECT_FALSE(dim::length.dimensionless());
  EXPECT_NE(dim::pressure, dim::energy);
}

}  // namespace
}  // namespace brume::units
