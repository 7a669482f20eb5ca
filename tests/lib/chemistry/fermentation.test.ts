import { brixToSpecificGravity, brixToSugarGPerL, specificGravityToBrix } from '@/lib/chemistry/brix';
import { M_HEXOSE, M_SUCROSE } from '@/lib/chemistry/constants';
import { abvPercent, fermentationProducts } from '@/lib/chemistry/fermentation';
import { molToVolumes } from '@/lib/chemistry/pressure';

const sucrose = (grams: number) => ({ grams, molarMass: M_SUCROSE, co2PerMole: 4 });
const glucose = (grams: number) => ({ grams, molarMass: M_HEXOSE, co2PerMole: 2 });

describe('fermentation stoichiometry (Gay-Lussac)', () => {
  it('turns 10 g of sucrose into 5.143 g of CO2 and 5.383 g of ethanol at theoretical yield', () => {
    // By hand: 10 / 342.297 = 0.029214 mol sucrose; × 4 = 0.116857 mol CO2 and ethanol;
    // × 44.009 = 5.1428 g CO2; × 46.069 = 5.3834 g ethanol.
    const products = fermentationProducts([sucrose(10)], 1);
    expect(products.co2G).toBeCloseTo(5.1428, 3);
    expect(products.ethanolG).toBeCloseTo(5.3834, 3);
  });

  it('turns 10 g of glucose into 4.886 g of CO2 and 5.114 g of ethanol', () => {
    // By hand: 10 / 180.156 = 0.055508 mol; × 2 = 0.111015 mol; × 44.009 = 4.8857 g; × 46.069 = 5.1143 g.
    const products = fermentationProducts([glucose(10)], 1);
    expect(products.co2G).toBeCloseTo(4.8857, 3);
    expect(products.ethanolG).toBeCloseTo(5.1143, 3);
  });

  it('scales with the yield factor', () => {
    expect(fermentationProducts([sucrose(10)], 0.95).co2G).toBeCloseTo(5.1428 * 0.95, 3);
  });
});

describe('alcohol from sugar', () => {
  it('makes 0.682 % ABV from 10 g/L of sucrose', () => {
    // By hand: 5.3834 g ethanol ÷ 0.78924 g/mL (ethanol at 20 °C, CRC Handbook) = 6.8210 mL in 1000 mL = 0.682 % ABV.
    expect(abvPercent(fermentationProducts([sucrose(10)], 1).ethanolG, 1000)).toBeCloseTo(0.6821, 3);
  });

  it('agrees with the winemaker’s rule of about 17 g/L of sugar per 1 % ABV', () => {
    // Common practice, no source: 16.5–18 g/L of sugar per 1 % ABV in real fermentations (below theoretical yield).
    // At the expected 95 % yield this model needs 14.66 / 0.95 = 15.4 g/L; theoretical yield needs 14.66 g/L.
    const gPerLPerPercent = 10 / abvPercent(fermentationProducts([sucrose(10)], 1).ethanolG, 1000);
    expect(gPerLPerPercent).toBeCloseTo(14.66, 1);
    expect(gPerLPerPercent / 0.95).toBeGreaterThan(14);
    expect(gPerLPerPercent / 0.95).toBeLessThan(18);
  });
});

describe('volumes of CO2 from sugar', () => {
  it('gives 1.048 volumes from 4 g/L of sucrose, near the brewer’s "4 g/L per volume"', () => {
    // By hand: 4 g/L × 0.51428 g CO2/g = 2.0571 g/L ÷ 1.9635 g per volume = 1.0477 volumes.
    // Common practice, no source: about 4 g of sucrose per litre raises carbonation by one volume.
    const { co2Mol } = fermentationProducts([sucrose(4)], 1);
    expect(molToVolumes(co2Mol, 1000)).toBeCloseTo(1.0477, 3);
  });
});

describe('Brix and specific gravity of sucrose solutions', () => {
  // CRC Handbook of Chemistry and Physics, "Concentrative properties of aqueous solutions", sucrose at 20 °C:
  // density 1.0381 g/mL at 10 %, 1.0810 at 20 %, 1.1270 at 30 %, 1.1764 at 40 % (by mass). SG 20/20 = density ÷ 0.998207.
  const table: [number, number][] = [
    [10, 1.0381],
    [20, 1.081],
    [30, 1.127],
    [40, 1.1764],
  ];

  it('converts °Bx to specific gravity as the CRC sucrose table', () => {
    for (const [brix, density] of table)
      expect(Math.abs(brixToSpecificGravity(brix) - density / 0.998207)).toBeLessThan(0.001);
  });

  it('converts specific gravity back to °Bx', () => {
    for (const [brix, density] of table)
      expect(Math.abs(specificGravityToBrix(density / 0.998207) - brix)).toBeLessThan(0.25);
    expect(specificGravityToBrix(1)).toBe(0);
  });

  it('gives grams of sugar per litre', () => {
    // CRC table: 10 % by mass at 1.0381 g/mL → 0.10 × 1038.1 g/L = 103.8 g/L.
    expect(brixToSugarGPerL(10)).toBeCloseTo(103.8, 0);
  });
});
