import { AIR_GASES, bunsenCoefficient } from '@/lib/chemistry/air';
import { CO2_G_PER_VOLUME, M_CO2, M_ETHANOL, M_HEXOSE, M_SUCROSE } from '@/lib/chemistry/constants';
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

describe('air dissolved in water (Weiss 1970)', () => {
  const gas = (name: string) => AIR_GASES.find((g) => g.gas === name)!;

  it('gives the oxygen solubility of the standard table from 0 to 40 °C', () => {
    // Dissolved oxygen in fresh water in equilibrium with air at 1 atm, mg/L (Benson & Krause 1984, as tabulated by the
    // USGS and in Standard Methods 4500-O; from memory). By hand from a Bunsen coefficient β: β × 0.20946 (O2 in dry air)
    // × (1 atm − water's vapour pressure) × 1.42905 g/L (O2 at 0 °C, 1 atm; CRC) × 1000.
    const table: [number, number][] = [
      [0, 14.62],
      [10, 11.29],
      [20, 9.09],
      [25, 8.26],
      [30, 7.56],
      [40, 6.41],
    ];
    for (const [tempC, mgPerL] of table)
      within(
        bunsenCoefficient(gas('O2'), tempC) * 0.20946 * (1 - waterVapourPressureAtm(tempC)) * 1.42905 * 1000,
        mgPerL,
        0.005,
      );
  });

  it('matches the compiled Henry constants of nitrogen, oxygen and argon at 25 °C', () => {
    // Sander (2015), Atmos. Chem. Phys. 15:4399–4981, Hcp at 298.15 K in mol/(m³·Pa), two significant figures (from
    // memory): N2 6.4e-6, O2 1.3e-5, Ar 1.4e-5. Bunsen → Hcp: β ÷ 22.414 L/mol ÷ 101.325 (Pa per atm, L per m³).
    const hcp = (name: string) => bunsenCoefficient(gas(name), 25) / 22.414 / 101.325;
    within(hcp('N2'), 6.4e-6, 0.05);
    within(hcp('O2'), 1.3e-5, 0.05);
    within(hcp('Ar'), 1.4e-5, 0.05);
  });
});

describe('water', () => {
  it('has the density of the CIPM table (Tanaka et al. 2001)', () => {
    // Tanaka et al. (2001), Metrologia 38:301, Table 4 (CIPM): 4 °C 999.9749 kg/m³, 20 °C 998.2067, 25 °C 997.0470.
    expect(waterDensityGPerL(4)).toBeCloseTo(999.9749, 2);
    expect(waterDensityGPerL(20)).toBeCloseTo(998.2067, 2);
    expect(waterDensityGPerL(25)).toBeCloseTo(997.047, 2);
    expect(waterDensityGPerL(35)).toBeCloseTo(994.0319, 2);
  });

  it('stays close to the handbook density up to 60 °C, beyond the fit', () => {
    // CRC Handbook, "Properties of water in the range 0–100 °C" (from memory): 50 °C 988.04 kg/m³, 60 °C 983.20.
    within(waterDensityGPerL(50), 988.04, 0.0001);
    within(waterDensityGPerL(60), 983.2, 0.0001);
  });

  it('has the vapour pressure of the CRC Handbook table', () => {
    // CRC Handbook of Chemistry and Physics, "Vapor pressure of water from 0 to 370 °C": 20 °C 2.3393 kPa,
    // 40 °C 7.3851 kPa, 50 °C 12.352 kPa.
    within(waterVapourPressureAtm(20) * 101.325, 2.3393, 0.005);
    within(waterVapourPressureAtm(40) * 101.325, 7.3851, 0.005);
    within(waterVapourPressureAtm(50) * 101.325, 12.352, 0.005);
  });
});
