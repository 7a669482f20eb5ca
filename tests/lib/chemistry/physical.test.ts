import { M_CO2, M_ETHANOL, M_HEXOSE, M_SUCROSE, CO2_G_PER_VOLUME } from '@/lib/chemistry/constants';
import { co2SolubilityMolPerKgAtm, co2SolubilityMolPerLAtm, dissolvedVolumes } from '@/lib/chemistry/solubility';
import { waterDensityGPerL, waterVapourPressureAtm } from '@/lib/chemistry/water';

const within = (actual: number, expected: number, relative: number) => {
  expect(Math.abs(actual - expected) / Math.abs(expected)).toBeLessThanOrEqual(relative);
};

describe('molar masses', () => {
  it('match the formula masses from IUPAC standard atomic weights', () => {
    // Hand sums: C12H22O11 = 12×12.011 + 22×1.008 + 11×15.999 = 342.297; C6H12O6 = 180.156; C2H5OH = 46.069; CO2 = 44.009.
    expect(M_SUCROSE).toBeCloseTo(342.297, 3);
    expect(M_HEXOSE).toBeCloseTo(180.156, 3);
    expect(M_ETHANOL).toBeCloseTo(46.069, 3);
    expect(M_CO2).toBeCloseTo(44.009, 3);
  });

  it('give about 1.96 g of CO2 per "volume"', () => {
    // 44.009 g/mol ÷ 22.414 L/mol (CODATA ideal molar volume at 0 °C, 1 atm) = 1.9635 g/L.
    expect(CO2_G_PER_VOLUME).toBeCloseTo(1.9635, 4);
  });
});

describe('CO2 solubility in water (Weiss 1974)', () => {
  it('matches the compiled Henry constant at 25 °C', () => {
    // Sander (2015), Atmos. Chem. Phys. 15:4399–4981, CO2: Hcp = 3.3e-4 mol/(m³·Pa) at 298.15 K
    // = 3.3e-4 × 101325 / 1000 = 0.0334 mol/(L·atm), given to two significant figures.
    within(co2SolubilityMolPerLAtm(25), 0.0334, 0.03);
  });

  it('matches the Bunsen absorption coefficients of CO2 in water from 0 to 40 °C', () => {
    // Bunsen coefficients (L of CO2 at 0 °C, 1 atm per L of water at 1 atm partial pressure), the classical table
    // reproduced in Lange's Handbook of Chemistry (from memory): 0 °C 1.713, 10 °C 1.194, 20 °C 0.878, 30 °C 0.665, 40 °C 0.530.
    const table: [number, number][] = [
      [0, 1.713],
      [10, 1.194],
      [20, 0.878],
      [30, 0.665],
      [40, 0.53],
    ];
    for (const [tempC, bunsen] of table) within(dissolvedVolumes(tempC, 1), bunsen, 0.025);
  });

  it('gives the values of the equation itself', () => {
    // Hand evaluation of Weiss eq. 12 at 20 °C: T/100 = 2.9315; ln K0 = −60.2409 + 93.4517/2.9315 + 23.3585·ln 2.9315 = −3.2399.
    expect(co2SolubilityMolPerKgAtm(20)).toBeCloseTo(Math.exp(-3.2399), 4);
    // Solubility falls as the liquid warms: the reason warm bottles hold more pressure.
    expect(co2SolubilityMolPerKgAtm(35)).toBeLessThan(co2SolubilityMolPerKgAtm(4));
  });
});

describe('water', () => {
  it('has the density of the CIPM table (Tanaka et al. 2001)', () => {
    // Tanaka et al. (2001), Metrologia 38:301, Table 4 (CIPM): 4 °C 999.9749 kg/m³, 20 °C 998.2067, 25 °C 997.0470.
    expect(waterDensityGPerL(4)).toBeCloseTo(999.9749, 2);
    expect(waterDensityGPerL(20)).toBeCloseTo(998.2067, 2);
    expect(waterDensityGPerL(25)).toBeCloseTo(997.047, 2);
  });

  it('has the vapour pressure of the CRC Handbook table', () => {
    // CRC Handbook of Chemistry and Physics, "Vapor pressure of water from 0 to 370 °C": 20 °C 2.3393 kPa,
    // 40 °C 7.3851 kPa, 50 °C 12.352 kPa.
    within(waterVapourPressureAtm(20) * 101.325, 2.3393, 0.005);
    within(waterVapourPressureAtm(40) * 101.325, 7.3851, 0.005);
    within(waterVapourPressureAtm(50) * 101.325, 12.352, 0.005);
  });
});
