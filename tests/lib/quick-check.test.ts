import {
  convertQuickCheckValues,
  initialQuickCheckValues,
  toCarbonationRequest,
  toPrimingRequest,
} from '@/lib/quick-check';

describe('the Quick check form as an API request', () => {
  it('turns the metric defaults into a valid request', () => {
    const { request, errors } = toCarbonationRequest(initialQuickCheckValues('metric'), 'metric');
    expect(errors).toEqual({});
    expect(request).toMatchObject({
      liquidMl: 750,
      headspaceMl: 30,
      temperaturesC: [22, 4, 35],
      sugars: [{ type: 'sucrose', grams: 3 }],
      lastOpenTempC: 22,
    });
  });

  it('converts US inputs to SI: 16 US fl oz, 95 °F and 87 psi (NIST SP 811: 1 fl oz = 29.5735 mL, 1 psi = 6.894757 kPa)', () => {
    const values = { ...initialQuickCheckValues('us'), liquid: '16', highestTemp: '95', bottleFormatId: '' };
    const { request } = toCarbonationRequest(values, 'us');
    expect(request!.liquidMl).toBeCloseTo(473.176, 2);
    expect(request!.temperaturesC[2]).toBeCloseTo(35, 6);
    // 87 × 6.894757 kPa = 599.84 kPa = 5.998 bar.
    expect(request!.maxWorkingPressureBar).toBeCloseTo(5.998, 2);
  });

  it('names the form field that is wrong', () => {
    const { request, errors } = toCarbonationRequest(
      { ...initialQuickCheckValues('metric'), liquid: 'lots', coldTemp: '' },
      'metric',
    );
    expect(request).toBeUndefined();
    expect(errors.liquid).toBe('Liquid per container must be a number.');
    expect(errors.coldTemp).toBeDefined();
  });

  it('accepts a comma as the decimal mark', () => {
    const { request } = toCarbonationRequest(
      { ...initialQuickCheckValues('metric'), sugars: [{ type: 'honey', grams: '2,5' }] },
      'metric',
    );
    expect(request!.sugars[0].grams).toBe(2.5);
  });

  it('asks the priming question from the same values', () => {
    const { request } = toPrimingRequest(initialQuickCheckValues('metric'), 'metric');
    expect(request).toMatchObject({ targetVolumes: 2, sugarType: 'sucrose', highestTempC: 35 });
  });

  it('converts what was typed when the units change, and back', () => {
    const metric = initialQuickCheckValues('metric');
    const us = convertQuickCheckValues(metric, 'metric', 'us');
    expect(us.highestTemp).toBe('95');
    // 750 mL ÷ 29.5735 mL per US fl oz = 25.36 fl oz (NIST SP 811).
    expect(us.liquid).toBe('25.36');
    expect(convertQuickCheckValues(us, 'us', 'metric').highestTemp).toBe('35');
  });
});
