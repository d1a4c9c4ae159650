// Chunks of compressed datasets: never larger than the dataset nor than chunk_elements, found by
// halving the longest extent. Common practice, no source.
#include "io/chunk_shape.hpp"

#include <gtest/gtest.h>

using brume::io::chunk_elements;
using brume::io::chunk_shape;
using Shape = std::array<hsize_t, 3>;

TEST(ChunkShape, SmallDatasetsAreOneChunk) {
  for (const Shape& shape : {Shape{1, 1, 1}, Shape{8, 8, 9}, Shape{1, 256, 512}}) {
    EXPECT_EQ(chunk_shape(shape), shape);
  }
}

TEST(ChunkShape, LargeDatasetsAreCutIntoChunksThatFitAndAreNotTooSmall) {
  for (const Shape& shape : {Shape{64, 64, 64}, Shape{1025, 1024, 1024}, Shape{3, 5, 1000003},
                             Shape{512, 513, 512}, Shape{1, 4096, 4097}}) {
    const Shape chunk = chunk_shape(shape);
    hsize_t elements = 1;
    for (int a = 0; a < 3; ++a) {
      EXPECT_GE(chunk[a], 1u);
      EXPECT_LE(chunk[a], shape[a]);
      elements *= chunk[a];
    }
    EXPECT_LE(elements, chunk_elements);
    // The last halving, c → ceil(c / 2) ≥ c / 2, started above the limit: at least half remains.
    EXPECT_GT(2 * elements, chunk_elements) << shape[0] << " " << shape[1] << " " << shape[2];
  }
}

TEST(ChunkShape, TheLongestExtentIsHalvedFirstAndTiesGoToTheSlowerAxis) {
  // 64³ holds 2^18 elements, twice the limit: one halving, of the slowest of three equal axes.
  EXPECT_EQ(chunk_shape({64, 64, 64}), (Shape{32, 64, 64}));
  // 3 × 5 × 1000003: only the long axis is cut, to ceil(1000003 / 2^k) ≤ 2^17 / 15 = 8738.
  const Shape chunk = chunk_shape({3, 5, 1000003});
  EXPECT_EQ(chunk[0], 3u);
  EXPECT_EQ(chunk[1], 5u);
  EXPECT_LE(chunk[2] * 15, chunk_elements);
}
