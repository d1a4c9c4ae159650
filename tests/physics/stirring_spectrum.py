# Spectral check of a stirring acceleration field written by stirring_term_test.cpp, with numpy's
# FFT (Debian python3-numpy, the reference library): the part that must vanish — the
# compressive k·F̂ (for ζ = 1) or the solenoidal k × F̂ (for ζ = 0) — relative to |k||F̂| over
# all k. Tolerance 1e-12: the field is a sum of exact Fourier modes of the grid (|n| ≤ 3 below
# the Nyquist wavenumbers), so only round-off of the direct sum (~1e-15 per term, tens of terms)
# and of the FFT remains; a wrong projection or a wrong L_d scaling gives O(1).
#
# stirring_spectrum.py FILE NX NY NZ LX LY LZ compressive|solenoidal
import sys

import numpy as np

path = sys.argv[1]
nx, ny, nz = (int(v) for v in sys.argv[2:5])
lx, ly, lz = (float(v) for v in sys.argv[5:8])
vanishing = sys.argv[8]
data = np.fromfile(path, dtype=np.float64)
if data.size != 3 * nx * ny * nz:
    sys.exit(f"{path}: {data.size} values, expected {3 * nx * ny * nz}")
# i fastest: reshape to (component, z, y, x)
field = data.reshape(3, nz, ny, nx)
spectrum = [np.fft.fftn(field[d]) for d in range(3)]  # axes (z, y, x)
kz = np.fft.fftfreq(nz, d=1.0 / nz) / lz
ky = np.fft.fftfreq(ny, d=1.0 / ny) / ly
kx = np.fft.fftfreq(nx, d=1.0 / nx) / lx
KZ, KY, KX = np.meshgrid(kz, ky, kx, indexing="ij")
k = [KX, KY, KZ]
kmag = np.sqrt(KX**2 + KY**2 + KZ**2)
fmag = np.sqrt(sum(np.abs(spectrum[d]) ** 2 for d in range(3)))
scale = np.max(kmag * fmag)
if scale == 0.0:
    sys.exit("the field is zero")
if vanishing == "compressive":
    part = np.abs(sum(k[d] * spectrum[d] for d in range(3)))
else:
    cross = [k[1] * spectrum[2] - k[2] * spectrum[1], k[2] * spectrum[0] - k[0] * spectrum[2],
             k[0] * spectrum[1] - k[1] * spectrum[0]]
    part = np.sqrt(sum(np.abs(c) ** 2 for c in cross))
# The other part must be present (the check could not pass on a zero projection).
if vanishing == "compressive":
    other = np.sqrt(sum(np.abs(c) ** 2 for c in [k[1] * spectrum[2] - k[2] * spectrum[1],
                                                 k[2] * spectrum[0] - k[0] * spectrum[2],
                                                 k[0] * spectrum[1] - k[1] * spectrum[0]]))
else:
    other = np.abs(sum(k[d] * spectrum[d] for d in range(3)))
worst = np.max(part) / scale
present = np.max(other) / scale
modes = int(np.count_nonzero(fmag > 1e-8 * np.max(fmag)))
print(f"{vanishing} part: largest |.|/max|k||F| = {worst:.3e} over {modes} Fourier coefficients; "
      f"the other part {present:.3e}")
sys.exit(0 if worst < 1e-12 and present > 0.1 else 1)
