// What HDF5 said about its last failure, for messages a user can act on ("truncated file: eof =
// 1024, ..."). Automatic printing of the error stack is off in brume (H5Eset_auto2), so the
// stack is read here instead.
#pragma once

#include <string>

namespace brume::io {

// The message of the innermost entry of the calling thread's HDF5 error stack (where the error
// was first detected), or "" when the stack is empty. Clears the stack.
[[nodiscard]] std::string hdf5_error_text();

}  // namespace brume::io
