// States on the two sides of a cell face and the flux through it, in the frame of the face:
// "n" is the face normal, "t1", "t2" the two tangential directions in cyclic order
// (x: y, z; y: z, x; z: x, y). The normal field b_n is continuous across the face and passed apart.
#pragma once

namespace brume::solver {

struct FaceState {
  double density;
  double vn, vt1, vt2;  // velocity
  double pressure;      // gas pressure (ignored by isothermal solvers: p = c_s² ρ)
  double bt1, bt2;      // tangential magnetic field (zero for hydrodynamics)
};

struct FaceFlux {
  double density;     // ρ v_n
  double mn, mt1, mt2;  // momentum flux, with total (gas + magnetic) pressure in mn
  double energy;      // total-energy flux (unused by isothermal solvers)
  double bt1, bt2;    // flux of B_t1 and B_t2: v_n B_t − B_n v_t (the EMF components follow from it)
};

}  // namespace brume::solver
