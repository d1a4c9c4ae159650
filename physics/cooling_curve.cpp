#include "physics/cooling_curve.hpp"

#include <algorithm>
#include <cmath>
#include <iterator>

namespace brume::physics {

// Koyama & Inutsuka 2002, ApJ 564, L97, eq. 4 (corrected form, see the header; from memory).
CoolingValue KoyamaInutsukaFit::operator()(double temperature) const {
  const double t = temperature;
  const double warm = 1.0e7 * std::exp(-1.184e5 / (t + 1000.0));
  const double cold = 1.4e-2 * std::sqrt(t) * std::exp(-92.0 / t);
  const double warm_slope = warm * 1.184e5 / ((t + 1000.0) * (t + 1000.0));
  const double cold_slope = cold * (0.5 / t + 92.0 / (t * t));
  return {reference_heating * (warm + cold), reference_heating * (warm_slope + cold_slope)};
}

CoolingTable::CoolingTable(const std::vector<double>& temperature,
                           const std::vector<double>& lambda) {
  log_t_.reserve(temperature.size());
  log_lambda_.reserve(lambda.size());
  for (std::size_t r = 0; r < temperature.size(); ++r) {
    log_t_.push_back(std::log(temperature[r]));
    log_lambda_.push_back(std::log(lambda[r]));
  }
}

double CoolingTable::lowest_temperature() const {
  return std::exp(log_t_.front());
}

double CoolingTable::highest_temperature() const {
  return std::exp(log_t_.back());
}

// Piecewise power law between rows: common practice, no source.
CoolingValue CoolingTable::operator()(double temperature) const {
  const double x = std::log(temperature);
  const auto upper = std::upper_bound(log_t_.begin() + 1, log_t_.end() - 1, x);
  const auto r = static_cast<std::size_t>(std::distance(log_t_.begin(), upper)) - 1;
  const double exponent = (log_lambda_[r + 1] - log_lambda_[r]) / (log_t_[r + 1] - log_t_[r]);
  const double lambda = std::exp(log_lambda_[r] + exponent * (x - log_t_[r]));
  return {lambda, exponent * lambda / temperature};
}

CoolingValue NetCooling::lambda(double temperature) const {
  return std::visit([temperature](const auto& f) { return f(temperature); }, function);
}

double NetCooling::rate(double number_density, double temperature) const {
  return number_density * (number_density * lambda(temperature).lambda - heating);
}

}  // namespace brume::physics
