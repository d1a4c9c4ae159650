#include "solver/block_geometry.hpp"

#include <gtest/gtest.h>

namespace brume::solver {
namespace {

TEST(BlockGeometry, ActiveAxesHaveGhostsAndAnExtraFaceSlot) {
  const BlockGeometry g = whole_box_geometry({8, 4, 1}, {0, -1, 0}, {2, 1, 1}, 2);
  EXPECT_EQ(g.dimensions(), 2);
  EXPECT_EQ(g.extent(0), 8 + 4 + 1);
  EXPECT_EQ(g.extent(1), 4 + 4 + 1);
  EXPECT_EQ(g.extent(2), 1);  // inactive: no ghosts
  EXPECT_EQ(g.step(2), 0);
  EXPECT_EQ(g.stride(1), 13);
  EXPECT_EQ(g.index(-2, -2, 0), 0);
  EXPECT_EQ(g.index(0, 0, 0), 2 + 2 * 13);
  EXPECT_DOUBLE_EQ(g.spacing[0], 0.25);
  EXPECT_DOUBLE_EQ(g.centre(1, 0), -1.0 + 0.25);
  EXPECT_DOUBLE_EQ(g.face(0, 8), 2.0);
  EXPECT_EQ(g.storage_size(), std::size_t(13 * 9));
}

TEST(BlockGeometry, RejectsImpossibleBoxes) {
  EXPECT_THROW((void)whole_box_geometry({0, 1, 1}, {0, 0, 0}, {1, 1, 1}, 2), std::invalid_argument);
  EXPECT_THROW((void)whole_box_geometry({4, 1, 1}, {0, 0, 0}, {0, 1, 1}, 2), std::invalid_argument);
  EXPECT_THROW((void)whole_box_geometry({2, 1, 1}, {0, 0, 0}, {1, 1, 1}, 3), std::invalid_argument);
}

}  // namespace
}  // namespace brume::solver
