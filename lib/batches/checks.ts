import { brixToSugarGPerL, specificGravityToBrix } from '@/lib/chemistry/brix';
import { type FindingLevel, PH_CAUTION_FROM, PH_LIMIT, ratingLevel } from '@/lib/chemistry/carbonation';
import { equilibriumAt, volumesToMol } from '@/lib/chemistry/pressure';
import type { ReadingKind } from '@/lib/schemas/batches';

/** What a batch knows at start, frozen with it, to judge its readings. */
export interface BatchFacts {
  liquidMl: number;
  headspaceMl: number;
  sealedTempC: number;
  ratingBar: number;
  /** CO2 a bottle holds in the recipe's worst case, volumes (residual and all of the sugar fermented). */
  worstTotalCo2Volumes: number;
  abvLimitPercent: number;
  warmDayTempC: number;
}

export interface ReadingCheck {
  level: FindingLevel;
  message: string;
  /** For a test-bottle pressure: the recipe's worst case at that temperature, bar gauge. */
  predictedGaugeBar?: number;
}

const r2 = (v: number) => Math.round(v * 100) / 100;

/** The recipe's worst-case gauge pressure at `tempC` for the batch's bottle and sugar. */
export function predictedGaugeBar(facts: BatchFacts, tempC: number): number {
  const container = { liquidMl: facts.liquidMl, headspaceMl: facts.headspaceMl, sealedTempC: facts.sealedTempC };
  return equilibriumAt(container, volumesToMol(facts.worstTotalCo2Volumes, facts.liquidMl), tempC).gaugeBar;
}

/**
 * A reading checked the moment it is entered, in plain words with what to do. The limits are the engine's: pH 4.2
 * (PH_LIMIT), the bottle's rating with the same 75 % caution (ratingLevel), the brewery's alcohol limit.
 */
export function checkReading(
  reading: { kind: ReadingKind; value: number; tempC?: number | null },
  facts: BatchFacts,
): ReadingCheck {
  const { value } = reading;
  switch (reading.kind) {
    case 'ph':
      if (value > PH_LIMIT)
        return {
          level: 'danger',
          message: `pH ${value} is above ${PH_LIMIT}: not acidic enough to be safe. Do not flavour; add starter and re-test.`,
        };
      if (value >= PH_CAUTION_FROM)
        return { level: 'caution', message: `pH ${value} is close to the ${PH_LIMIT} limit: re-test before going on.` };
      return { level: 'ok', message: `pH ${value} is at or below ${PH_LIMIT}.` };
    case 'brix':
      return {
        level: 'ok',
        message: `${value} °Bx is about ${r2(brixToSugarGPerL(value))} g of sugar per litre (as sucrose; fruit acids read as sugar too).`,
      };
    case 'specific-gravity': {
      const brix = specificGravityToBrix(value);
      return {
        level: 'ok',
        message: `SG ${value} is about ${r2(brix)} °Bx, ${r2(brixToSugarGPerL(brix))} g of sugar per litre (as sucrose).`,
      };
    }
    case 'temperature':
      if (value < 0)
        return {
          level: 'caution',
          message: `${value} °C is below freezing: ice can crack or uncap bottles. Move them somewhere above 0 °C.`,
        };
      if (value >= facts.warmDayTempC)
        return {
          level: 'caution',
          message: `${value} °C is as warm as the warmest the bottles should meet (${facts.warmDayTempC} °C): cool them.`,
        };
      return { level: 'ok', message: `${value} °C.` };
    case 'gauge-pressure': {
      const tempC = reading.tempC ?? facts.sealedTempC;
      const predicted = predictedGaugeBar(facts, tempC);
      const against = ratingLevel(value, facts.ratingBar);
      const base = { predictedGaugeBar: r2(predicted) };
      if (against === 'danger')
        return {
          ...base,
          level: 'danger',
          message: `${value} bar at ${tempC} °C is at or over the bottle's ${facts.ratingBar} bar rating: chill every bottle now, with eye protection, and tell the owner.`,
        };
      if (against === 'caution')
        return {
          ...base,
          level: 'caution',
          message: `${value} bar at ${tempC} °C is within 25 % of the bottle's ${facts.ratingBar} bar rating: chill the batch now.`,
        };
      if (value > predicted)
        return {
          ...base,
          level: 'caution',
          message: `${value} bar at ${tempC} °C is above the recipe's worst case of ${r2(predicted)} bar: fermenting more than planned. Chill and test another bottle.`,
        };
      return {
        ...base,
        level: 'ok',
        message: `${value} bar at ${tempC} °C is within the recipe's worst case of ${r2(predicted)} bar.`,
      };
    }
    case 'abv':
      if (value >= facts.abvLimitPercent)
        return {
          level: 'danger',
          message: `${value} % ABV is at or over the ${facts.abvLimitPercent} % limit: the batch is held. It cannot be sold as non-alcoholic.`,
        };
      if (value >= facts.abvLimitPercent * 0.8)
        return {
          level: 'caution',
          message: `${value} % ABV is within 20 % of the ${facts.abvLimitPercent} % limit: test again before release.`,
        };
      return { level: 'ok', message: `${value} % ABV is under the ${facts.abvLimitPercent} % limit.` };
  }
}
