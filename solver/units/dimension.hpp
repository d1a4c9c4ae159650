// Physical dimensions as exponents of length, mass, time and temperature. Exponents are stored
// doubled so that the half powers of Gaussian units (1 G = 1 g^1/2 cm^-1/2 s^-1) stay exact.
#pragma once

#include <compare>
#include <string>

namespace brume::units {

struct Dimension {
  int length2 = 0;       // twice the exponent of length
  int mass2 = 0;         // twice the exponent of mass
  int time2 = 0;         // twice the exponent of time
  int temperature2 = 0;  // twice the exponent of temperature

  friend constexpr bool operator==(const Dimension&, const Dimension&) = default;
  friend constexpr Dimension operator*(Dimension a, Dimension b) {
    return {a.length2 + b.length2, a.mass2 + b.mass2, a.time2 + b.time2,
            a.temperature2 + b.temperature2};
  }
  friend constexpr Dimension operator/(Dimension a, Dimension b) {
    return {a.length2 - b.length2, a.mass2 - b.mass2, a.time2 - b.time2,
            a.temperature2 - b.temperature2};
  }
  // Raise to the power num/den (den 1 or 2); the caller guarantees the result has whole half
  // powers.
  [[nodiscard]] constexpr Dimension pow(int num, int den = 1) const {
    return {length2 * num / den, mass2 * num / den, time2 * num / den, temperature2 * num / den};
  }
  [[nodiscard]] bool dimensionless() const { return *this == Dimension{}; }
  // Readable form in cgs base units, e.g. "cm s^-1", "g^1/2 cm^-1/2 s^-1", "1" when dimensionless.
  [[nodiscard]] std::string to_string() const;
};

namespace dim {
inline constexpr Dimension none{};
inline constexpr Dimension length{2, 0, 0, 0};
inline constexpr Dimension mass{0, 2, 0, 0};
inline constexpr Dimension time{0, 0, 2, 0};
inline constexpr Dimension temperature{0, 0, 0, 2};
inline constexpr Dimension velocity = length / time;
inline constexpr Dimension number_density = length.pow(-3);
inline constexpr Dimension mass_density = mass / length.pow(3);
inline constexpr Dimension energy = mass * velocity * velocity;
inline constexpr Dimension power = energy / time;
inline constexpr Dimension pressure = energy / length.pow(3);
inline constexpr Dimension magnetic_field = mass.pow(1, 2) * length.pow(-1, 2) / time;
inline constexpr Dimension cooling_rate = energy * length.pow(3) / time;  // Λ: erg cm^3 s^-1
inline constexpr Dimension conductivity = power / length / temperature;   // erg s^-1 cm^-1 K^-1
inline constexpr Dimension diffusivity = length * length / time;          // cm^2 s^-1
}  // namespace dim

}  // namespace brume::units
