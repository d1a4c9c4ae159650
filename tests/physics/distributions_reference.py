"""Reference values for brume's distributions and Jeans unit tests (Debian's Python, numpy and
scipy through /usr/bin/python3).

  distributions_reference.py fsum FILE BINS
      FILE holds lines "BIN VALUE"; prints math.fsum of each bin's values (correctly rounded,
      Shewchuk 1997), then of all values, one per line.
  distributions_reference.py equilibrium HEATING FLOOR CEILING N [N ...]
      P_eq/k_B = N T_eq with N Lambda(T_eq) = HEATING by scipy.optimize.brentq on [FLOOR,
      CEILING], Lambda the Koyama & Inutsuka 2002 (ApJ 564, L97) fit as physics/cooling_curve.cpp
      implements it: 2e-26 [1e7 exp(-1.184e5/(T + 1000)) + 1.4e-2 sqrt(T) exp(-92/T)].
      The lowest root is wanted: the bracket is scanned for the first sign change first.
  distributions_reference.py lognormal_rate SIGMA S_CRIT
      integral from S_CRIT to infinity of exp(3s/2) p(s) ds for the volume-weighted lognormal
      p(s) of mean -SIGMA^2/2, by scipy.integrate.quad.
"""
import math
import sys

import numpy as np
from scipy.integrate import quad
from scipy.optimize import brentq

GAMMA_0 = 2.0e-26


def cooling(t):
    return GAMMA_0 * (1.0e7 * math.exp(-1.184e5 / (t + 1000.0))
                      + 1.4e-2 * math.sqrt(t) * math.exp(-92.0 / t))


def equilibrium_pressure(heating, low, high, n):
    grid = np.geomspace(low, high, 4001)
    excess = [n * cooling(t) - heating for t in grid]
    for a, b, fa, fb in zip(grid[:-1], grid[1:], excess[:-1], excess[1:]):
        if fa == 0.0:
            return n * a
        if (fa < 0.0) != (fb < 0.0):
            return n * brentq(lambda t: n * cooling(t) - heating, a, b, xtol=1e-300, rtol=1e-15,
                              maxiter=500)
    return float("nan")


def main(argv):
    if argv[0] == "fsum":
        bins = int(argv[2])
        values = [[] for _ in range(bins)]
        everything = []
        with open(argv[1]) as f:
            for line in f:
                b, v = line.split()
                values[int(b)].append(float(v))
                everything.append(float(v))
        for b in range(bins):
            print("%.17g" % math.fsum(values[b]))
        print("%.17g" % math.fsum(everything))
    elif argv[0] == "equilibrium":
        heating, low, high = (float(a) for a in argv[1:4])
        for n in (float(a) for a in argv[4:]):
            print("%.17g" % equilibrium_pressure(heating, low, high, n))
    elif argv[0] == "lognormal_rate":
        sigma, s_crit = float(argv[1]), float(argv[2])
        mean = -0.5 * sigma * sigma

        def integrand(s):
            return math.exp(1.5 * s - (s - mean) ** 2 / (2 * sigma * sigma)) / \
                math.sqrt(2 * math.pi * sigma * sigma)
        value, _ = quad(integrand, s_crit, np.inf, epsabs=0.0, epsrel=1e-13, limit=200)
        print("%.17g" % value)
    else:
        raise SystemExit("unknown mode " + argv[0])


if __name__ == "__main__":
    main(sys.argv[1:])
