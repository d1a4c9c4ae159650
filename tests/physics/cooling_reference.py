"""Reference values for brume's heating and cooling tests, from scipy (Debian's, through
/usr/bin/python3).

  cooling_reference.py evolve GAMMA HEATING K_B  N T0 T_END  [N T0 T_END ...]
      T(T_END) of dT/dt = -(GAMMA - 1)/K_B (N Lambda(T) - HEATING) from T0 at constant N,
      by scipy.integrate.solve_ivp (Radau, rtol 1e-12), one value per line.
  cooling_reference.py equilibrium HEATING N [N ...]
      T_eq with N Lambda(T_eq) = HEATING by scipy.optimize.brentq on [10 K, 1e9 K].

Lambda is the Koyama & Inutsuka 2002 (ApJ 564, L97) fit in the corrected form brume uses
(physics/cooling_curve.hpp): 2e-26 [1e7 exp(-1.184e5/(T + 1000)) + 1.4e-2 sqrt(T) exp(-92/T)].
"""
import sys

import numpy as np
from scipy.integrate import solve_ivp
from scipy.optimize import brentq

GAMMA_0 = 2.0e-26


def cooling(t):
    return GAMMA_0 * (1.0e7 * np.exp(-1.184e5 / (t + 1000.0))
                      + 1.4e-2 * np.sqrt(t) * np.exp(-92.0 / t))


def cooling_slope(t):
    warm = 1.0e7 * np.exp(-1.184e5 / (t + 1000.0)) * 1.184e5 / (t + 1000.0) ** 2
    cold = 1.4e-2 * np.sqrt(t) * np.exp(-92.0 / t) * (0.5 / t + 92.0 / t ** 2)
    return GAMMA_0 * (warm + cold)


def evolve(gamma, heating, k_b, n, t0, t_end):
    factor = (gamma - 1.0) / k_b

    def rate(_, y):
        return [-factor * (n * cooling(y[0]) - heating)]

    def jacobian(_, y):
        return [[-factor * n * cooling_slope(y[0])]]

    solution = solve_ivp(rate, (0.0, t_end), [t0], method="Radau", rtol=1e-12,
                         atol=1e-12 * t0, jac=jacobian)
    if not solution.success:
        raise SystemExit("solve_ivp failed: " + solution.message)
    return solution.y[0, -1]


def main(argv):
    if argv[0] == "evolve":
        gamma, heating, k_b = (float(a) for a in argv[1:4])
        values = [float(a) for a in argv[4:]]
        for i in range(0, len(values), 3):
            print("%.17g" % evolve(gamma, heating, k_b, *values[i:i + 3]))
    elif argv[0] == "equilibrium":
        heating = float(argv[1])
        for n in (float(a) for a in argv[2:]):
            t = brentq(lambda x: n * cooling(x) - heating, 10.0, 1.0e9, xtol=1e-12, rtol=1e-15)
            print("%.17g" % t)
    else:
        raise SystemExit("unknown mode " + argv[0])


if __name__ == "__main__":
    main(sys.argv[1:])
