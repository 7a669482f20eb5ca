/**
 * Properties of water the engine needs, as functions of temperature in °C.
 */

/**
 * Density of air-free water, kg/m³ (equal to g/L), fitted for 0–40 °C; up to 60 °C it stays within 0.01 % of the
 * CRC Handbook table (tested).
 * Tanaka et al. (2001), Metrologia 38:301–309, equation (1) with the coefficients of its Table 2.
 */
export function waterDensityGPerL(tempC: number): number {
  const a1 = -3.983035;
  const a2 = 301.797;
  const a3 = 522528.9;
  const a4 = 69.34881;
  const a5 = 999.97495;
  return a5 * (1 - ((tempC + a1) ** 2 * (tempC + a2)) / (a3 * (tempC + a4)));
}

/**
 * Saturation vapour pressure of water over liquid water, in atm.
 * Buck (1996) revision of Buck (1981), J. Appl. Meteorol. 20:1527–1532: e = 0.61121·exp((18.678 − t/234.5)·t/(257.14 + t)) kPa.
 */
export function waterVapourPressureAtm(tempC: number): number {
  const kPa = 0.61121 * Math.exp((18.678 - tempC / 234.5) * (tempC / (257.14 + tempC)));
  return kPa / 101.325;
}
