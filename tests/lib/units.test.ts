import { barToPsi, convertUnit, cToF, flOzToMl, fToC, gallonsToLitres, gramsToOunces } from '@/lib/units';

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
