/**
 * Irvin's resistivity-vs-doping curves for silicon at 300 K (J. C. Irvin,
 * Bell Syst. Tech. J. 41, 387 (1962)): [N cm⁻³, n-type ρ Ω·cm, p-type ρ Ω·cm].
 * Readings from memory, so checks against them allow READ_OFF_TOLERANCE.
 */
export const IRVIN_BULK_READINGS: ReadonlyArray<readonly [number, number, number]> = [
  [1e14, 45, 130],
  [1e15, 4.5, 13],
  [1e16, 0.5, 1.4],
  [1e17, 0.09, 0.2],
  [1e18, 0.025, 0.045],
  [1e19, 0.006, 0.009],
  [1e20, 0.0008, 0.0012],
];

/** Relative read-off tolerance of the recalled curve. */
export const READ_OFF_TOLERANCE = 0.2;
