// Factors that turn each code quantity into cgs, as stored with every snapshot field.
#pragma once

namespace brume::io {

struct FieldUnits {
  double length = 1.0;          // cm
  double time = 1.0;            // s
  double density = 1.0;         // g cm^-3
  double momentum = 1.0;        // g cm^-2 s^-1
  double energy_density = 1.0;  // erg cm^-3
  double magnetic_field = 1.0;  // G (code B includes 1/sqrt(4π): B_G = B_code × this)
};

}  // namespace brume::io
