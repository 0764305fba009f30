#!/usr/bin/env python3
"""Writes mpmathOracles.json: reference values from mpmath for mathematics that
Driftcell shares with a general-purpose library, so those checks do not rest on
values recalled from tables:

- erfc(x) (mpmath.erfc) and erfcinv(y), the x with erfc(x) = y (mpmath.findroot
  on erfc, started from the asymptotic inverse; checked by re-evaluating erfc);
- van der Pauw's sheet resistance: the Rs solving
  exp(-pi*Ra/Rs) + exp(-pi*Rb/Rs) = 1 (van der Pauw 1958, his eq. for arbitrary
  shape; common practice, no source for the form), by mpmath.findroot.

Run with `python3 generate.py` in this folder; CI does not run it, it only reads
the committed JSON. Debian: python3-mpmath.
"""
import json
import os

import mpmath

PRECISION_DIGITS = 50
mpmath.mp.dps = PRECISION_DIGITS

ERFC_X = [-3, -1, -0.5, 0, 1e-8, 0.1, 0.25, 0.5, 0.75, 1, 1.5, 2, 2.5, 3, 3.5, 4, 5, 6, 8, 10, 15, 20, 25, 26]
ERFCINV_Y = ['1e-300', '1e-200', '1e-100', '1e-50', '1e-20', '1e-10', '1e-6', '1e-4', '0.001', '0.01', '0.1',
             '0.3', '0.5', '0.9', '1', '1.1', '1.5', '1.9', '1.99', '1.999999']
VDP_RATIOS = [1, 1.01, 1.1, 1.2, 1.5, 2, 3, 5, 10, 30, 100, 1000]


def erfcinv(y):
    # The double nearest the decimal, as the tests pass it (matters near y = 2).
    y = mpmath.mpf(float(y))
    if y == 1:
        return mpmath.mpf(0)
    start = mpmath.sqrt(-mpmath.log(y)) if y < 0.5 else mpmath.erfinv(1 - y)
    x = mpmath.findroot(lambda t: mpmath.log(mpmath.erfc(t)) - mpmath.log(y), start)
    assert abs(mpmath.erfc(x) / y - 1) < mpmath.mpf(10) ** (-(PRECISION_DIGITS - 10))
    return x


def van_der_pauw(ra, rb):
    ra = mpmath.mpf(ra)
    rb = mpmath.mpf(rb)
    start = mpmath.pi * (ra + rb) / (2 * mpmath.log(2))
    rs = mpmath.findroot(lambda r: mpmath.exp(-mpmath.pi * ra / r) + mpmath.exp(-mpmath.pi * rb / r) - 1, start)
    assert abs(mpmath.exp(-mpmath.pi * ra / rs) + mpmath.exp(-mpmath.pi * rb / rs) - 1) < mpmath.mpf(10) ** (-(PRECISION_DIGITS - 10))
    return rs


def text(value):
    return mpmath.nstr(value, 20, strip_zeros=False)


data = {
    'generator': 'tests/physics/reference/data/mpmath/generate.py',
    'mpmath': mpmath.__version__,
    'precisionDigits': PRECISION_DIGITS,
    'erfc': [{'x': x, 'value': text(mpmath.erfc(x))} for x in ERFC_X],
    'erfcinv': [{'y': y, 'value': text(erfcinv(y))} for y in ERFCINV_Y],
    'vanDerPauw': [{'ra': 10 * r, 'rb': 10, 'sheetResistance': text(van_der_pauw(10 * r, 10))} for r in VDP_RATIOS],
}

with open(os.path.join(os.path.dirname(os.path.abspath(__file__)), 'mpmathOracles.json'), 'w') as handle:
    json.dump(data, handle, indent=2)
    handle.write('\n')
