import { barToPsi, convertUnit, cToF, flOzToMl, fToC, gallonsToLitres, gramsToOunces, inUnits } from '@/lib/units';

// NIST Special Publication 811 (2008), Appendix B: 1 US fl oz = 29.573 53 mL; 1 US gal = 3.785 412 L;
// 1 oz (avoirdupois) = 28.349 52 g; 1 psi = 6.894 757 kPa; 1 bar = 100 kPa; t/°F = 1.8·t/°C + 32.
const close = (actual: number, expected: number, relative = 1e-6) =>
  expect(Math.abs(actual / expected - 1)).toBeLessThan(relative);

describe('unit conversions against NIST definitions', () => {
  it('converts volumes', () => {
    close(flOzToMl(1), 29.5735295625);
    close(gallonsToLitres(1), 3.785411784);
    close(flOzToMl(16), 473.176473);
  });

  it('converts mass', () => {
    close(1 / gramsToOunces(1), 28.349523125);
  });

  it('converts pressure', () => {
    close(barToPsi(1), 100 / 6.894757293168);
    close(convertUnit(1, 'psi', 'kPa'), 6.894757293168);
  });

  it('converts temperature', () => {
    expect(cToF(0)).toBeCloseTo(32, 10);
    expect(cToF(35)).toBeCloseTo(95, 10);
    expect(fToC(212)).toBeCloseTo(100, 10);
  });
});

describe('inUnits: engine messages in US units', () => {
  it('converts temperatures, ranges, pressures and small volumes by the NIST factors above', () => {
    // 35 °C × 1.8 + 32 = 95 °F; 8.74 bar × 100 ÷ 6.894757 = 126.8 psi → 127; 3 bar → 43.5 → 44 psi.
    expect(inUnits("Worst case 8.74 bar (127 psi) gauge at 35 °C is at or over the bottle's 3 bar rating.", 'us')).toBe(
      "Worst case 127 psi (8.74 bar) gauge at 95 °F is at or over the bottle's 44 psi (3.00 bar) rating.",
    );
    // 0–40 °C → 32–104 °F; 2 mL ÷ 29.57353 = 0.068 → 0.07 US fl oz.
    expect(inUnits('outside the 0–40 °C the model is meant for. Leave at least 2 mL of headspace', 'us')).toBe(
      'outside the 32–104 °F the model is meant for. Leave at least 0.07 US fl oz (2 mL) of headspace',
    );
    expect(inUnits('At 31.5 °C, 3 bar', 'metric')).toBe('At 31.5 °C, 3 bar');
  });
});
