/**
 * Geometry of uniform conductors: a layer's sheet resistance and a bar
 * resistor's value from resistivity. Lengths in µm as spreadsheets carry
 * them; resistivity in Ω·cm.
 */

/** Centimetres per micrometre. */
export const CM_PER_UM = 1e-4;

/**
 * Sheet resistance of a uniform layer, Rs = ρ / t.
 *
 * @param resistivity - ρ in Ω·cm
 * @param thicknessUm - layer thickness t in µm
 * @returns Rs in Ω/sq
 * @example sheetResistance(1, 10) // ≈ 1000 Ω/sq (1 Ω·cm over 10 µm)
 */
export function sheetResistance(resistivity: number, thicknessUm: number): number {
  return resistivity / (thicknessUm * CM_PER_UM);
}

/**
 * Resistance of a uniform rectangular bar, R = ρ·L / (W·t), current along L.
 *
 * @param resistivity - ρ in Ω·cm
 * @param lengthUm - L in µm, along the current
 * @param widthUm - W in µm
 * @param thicknessUm - t in µm
 * @returns R in Ω
 * @example resistorValue(1, 100, 10, 10) // ≈ 1.000e4 Ω (ten squares of a 1000 Ω/sq layer)
 */
export function resistorValue(resistivity: number, lengthUm: number, widthUm: number, thicknessUm: number): number {
  return sheetResistance(resistivity, thicknessUm) * (lengthUm / widthUm);
}
