#include "io/hdf5_error_text.hpp"

#include <hdf5.h>

namespace brume::io {

namespace {

// Walking from the API call inwards, the last entry seen is where the error was detected.
herr_t keep_innermost(unsigned /*position*/, const H5E_error2_t* entry, void* data) {
  if (entry->desc != nullptr && entry->desc[0] != '\0') {
    *static_cast<std::string*>(data) = entry->desc;
  }
  return 0;
}

}  // namespace

std::string hdf5_error_text() {
  std::string text;
  H5Ewalk2(H5E_DEFAULT, H5E_WALK_DOWNWARD, keep_innermost, &text);
  H5Eclear2(H5E_DEFAULT);
  return text;
}

}  // namespace brume::io
