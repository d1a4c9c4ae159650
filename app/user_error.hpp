// An error the user can fix (bad command line, bad file, impossible parameters): one message that
// says what is wrong, where, and what is expected; brume exits with code 2.
#pragma once

#include <stdexcept>
#include <string>

namespace brume::app {

class UserError : public std::runtime_error {
 public:
  explicit UserError(const std::string& message) : std::runtime_error(message) {}
};

}  // namespace brume::app
