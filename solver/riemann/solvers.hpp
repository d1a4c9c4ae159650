// The approximate Riemann solvers. Each is a function template over the equation of state
// (IdealGas or Isothermal, solver/eos.hpp) and a flag `Magnetic` (false: hydrodynamics, the field
// arguments are ignored and the field fluxes are zero). All are header-only and inline, so that the
// flux loops compile to straight code with the choice made at compile time.
//
//   FaceFlux llf <Eos, Magnetic>(const FaceState& left, const FaceState& right, double bn, const Eos&);
//   FaceFlux hlle<Eos, Magnetic>(...);
//   FaceFlux hllc<Eos>(...);          // hydrodynamics only (ideal gas and isothermal)
//   FaceFlux hlld<Eos>(...);          // MHD: adiabatic (IdealGas) and isothermal (Isothermal)
//
// Each solver also has a tag type usable as a template parameter (struct Llf, Hlle, Hllc, Hlld) with
//   template <class Eos, bool Magnetic>
//   static FaceFlux flux(const FaceState& left, const FaceState& right, double bn, const Eos& eos);
// and `static constexpr bool supports_magnetic, supports_hydro` (Hllc: hydro only, static_assert on
// Magnetic; Hlld: magnetic only).
#pragma once

#include "solver/riemann/llf.hpp"
#include "solver/riemann/hlle.hpp"
#include "solver/riemann/hllc.hpp"
#include "solver/riemann/hlld.hpp"
