#!/usr/bin/python3
"""Reference for tests/physics/steady_state_test.cpp, with numpy (Debian python3-numpy).

fit T1 Y1 T2 Y2 ...        : mean, slope (numpy.polyfit, degree 1), rms residual and the slope's
                             standard error inflated by 1 + 2 sum of the residuals' autocorrelation
                             (numpy.correlate) up to its first lag <= 0, one per line
since ALLOW FROM T1 Y1 ... : the earliest row time t_s up to the first one >= FROM (10 rows or more on) with |slope * (t_end - t_s)| <= ALLOW
                             for the rows from t_s on (numpy.polyfit for each start), or "none"
"""
import sys

import numpy as np


def fit(t, y):
    slope, intercept = np.polyfit(t, y, 1)
    residual = y - (intercept + slope * t)
    return y.mean(), slope, np.sqrt(np.mean(residual ** 2))


def slope_error(t, y):
    slope, intercept = np.polyfit(t, y, 1)
    r = y - (intercept + slope * t)
    full = np.correlate(r, r, mode="full")[len(r) - 1:]
    inflation = 1.0
    for c in full[1:]:
        if not c > 0:
            break
        inflation += 2 * c / full[0]
    return np.sqrt(np.sum(r ** 2) / (len(r) - 2) / np.sum((t - t.mean()) ** 2) * inflation)


def main(argv):
    if argv[0] == "fit":
        values = np.array([float(v) for v in argv[1:]])
        mean, slope, scatter = fit(values[0::2], values[1::2])
        print(repr(mean))
        print(repr(slope))
        print(repr(scatter))
        print(repr(slope_error(values[0::2], values[1::2])))
        return 0
    if argv[0] == "since":
        allow, start = float(argv[1]), float(argv[2])
        values = np.array([float(v) for v in argv[3:]])
        t, y = values[0::2], values[1::2]
        for s in range(len(t) - 9):  # at least 10 rows, as brume asks
            if s > 0 and t[s - 1] >= start:  # up to the first row at or after FROM
                break
            _, slope, _ = fit(t[s:], y[s:])
            if abs(slope * (t[-1] - t[s])) <= allow:
                print(repr(t[s]))
                return 0
        print("none")
        return 0
    return 2


if __name__ == "__main__":
    sys.exit(main(sys.argv[1:]))
