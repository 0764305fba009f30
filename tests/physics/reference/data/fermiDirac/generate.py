#!/usr/bin/env python3
"""Writes fermiDirac.json: reference values of the normalised complete Fermi-Dirac
integrals F_j(eta) = (1/Gamma(j+1)) * integral_0^inf x^j / (1 + exp(x - eta)) dx
for j = 1/2 and j = -1/2, from mpmath's general polylogarithm:

    F_j(eta) = -Li_{j+1}(-exp(eta))

(common practice, no source; e.g. the polylogarithm form used by mpmath's own
documentation of polylog). Run with `python3 generate.py` in this folder; CI does
not run it, it only reads the committed JSON. Debian: python3-mpmath.
"""
import json
import os

import mpmath

PRECISION_DIGITS = 50
mpmath.mp.dps = PRECISION_DIGITS

# eta points: dense near 0 (where the methods of the implementation meet the
# hardest part of the integral), both sides of every switch-over (-2, 35), the
# Boltzmann tail and the degenerate side up to 200, plus a few far points.
ETAS = sorted(set(
    [-700, -300, -100, -50, -40, -38, -30, -25, -20, -15, -10, -8, -6, -5, -4, -3, -2.5]
    + [-2.000001, -2, -1.999999, -1.75, -1.5, -1.25, -1, -0.75, -0.5, -0.25, -0.1, -0.01]
    + [0, 0.01, 0.1, 0.25, 0.5, 0.75, 1, 1.25, 1.5, 2, 2.5, 3, 4, 5, 6, 7, 8, 10, 12, 15]
    + [17.5, 20, 25, 30, 34, 34.999999, 35, 35.000001, 36, 40, 45, 50, 60, 75, 100, 125]
    + [150, 175, 200, 500, 1000, 10000]
))


def fermi_dirac(order, eta):
    value = -mpmath.polylog(order + 1, -mpmath.exp(eta))
    # For eta > 0 mpmath returns a complex number whose imaginary part is rounding
    # noise (the integral is real); keep the real part after checking the noise is tiny.
    real = mpmath.re(value)
    assert abs(mpmath.im(value)) <= mpmath.mpf(10) ** (-(PRECISION_DIGITS - 10)) * abs(real)
    return real


def main():
    half = mpmath.mpf(1) / 2
    points = []
    for eta in ETAS:
        e = mpmath.mpf(eta)
        points.append({
            'eta': float(e),
            'half': mpmath.nstr(fermi_dirac(half, e), 20, min_fixed=0, max_fixed=0),
            'minusHalf': mpmath.nstr(fermi_dirac(-half, e), 20, min_fixed=0, max_fixed=0),
        })
    data = {
        'description': 'F_j(eta) = -polylog(j+1, -exp(eta)), normalised complete Fermi-Dirac integrals, j = 1/2 and -1/2',
        'generator': 'tests/physics/reference/data/fermiDirac/generate.py',
        'mpmath': mpmath.__version__,
        'precisionDigits': PRECISION_DIGITS,
        'significantDigitsWritten': 20,
        'points': points,
    }
    path = os.path.join(os.path.dirname(os.path.abspath(__file__)), 'fermiDirac.json')
    with open(path, 'w', encoding='utf-8') as out:
        json.dump(data, out, indent=1)
        out.write('\n')
    print(f'wrote {len(points)} points to {path}')


if __name__ == '__main__':
    main()
