import { CO2_G_PER_VOLUME, MOLAR_VOLUME_STP_L } from './constants';
import {
  abvPercent,
  EXPECTED_YIELD,
  type FermentableSugar,
  fermentationProducts,
  type YieldCase,
  yieldFactor,
} from './fermentation';
import {
  type Container,
  type Equilibrium,
  equilibriumAt,
  liquidFills,
  maxCo2MolForGauge,
  molToVolumes,
  volumesToMol,
} from './pressure';
import { residualVolumesAfterOpen } from './solubility';
import { SUGARS, type SugarType } from './sugars';

export type FindingLevel = 'ok' | 'caution' | 'danger';

export interface Finding {
  level: FindingLevel;
  code: string;
  message: string;
  /** The numbers behind the finding, with their units in the key names. */
  values?: Record<string, number>;
}

/** Sugar that an ingredient brings into the liquid, already resolved from the ingredient library. */
export interface IngredientSugar {
  name: string;
  /** Grams of sugars reaching the liquid in the expected case (grams × sugars per gram × share reaching the liquid). */
  sugarG: number;
  /** Grams reaching the liquid in the worst case (all of it when steeped); sugarG when absent. */
  worstSugarG?: number;
  /** Where the sugar figure comes from: measured sugars, available carbohydrate standing in for them, or nothing. */
  sugarBasis?: 'measured' | 'available-carbohydrate' | 'unknown';
  /** Share of those sugars that yeast can ferment (0–1). */
  fermentableShare: number;
  /** Grams of fat the ingredient brings (for the rancidity caution). */
  fatG: number;
  /** True when the solids stay in the bottle. */
  inBottle: boolean;
}

export interface CarbonationInput {
  liquidMl: number;
  headspaceMl: number;
  sugars: { type: SugarType; grams: number }[];
  ingredients: IngredientSugar[];
  /** CO2 already dissolved at sealing, volumes; or, when absent, estimated from lastOpenTempC. */
  residualCo2Volumes?: number | null;
  lastOpenTempC?: number | null;
  sealedTempC: number;
  temperaturesC: number[];
  maxWorkingPressureBar?: number | null;
  baseAbvPercent: number;
  yield: YieldCase;
  abvLimitPercent: number;
  /** Solids or purée left in the bottle even without library ingredients. */
  solidsInBottle?: boolean;
  /** pH of the base before flavouring, when known. */
  ph?: number | null;
  /** A missing pH is itself a caution (a version submitted for review must state it). */
  phRequired?: boolean;
  /**
   * The warmest the bottles may meet (the brewery's setting), °C. When it is hotter than every temperature asked,
   * it is checked too, as the last of the pressures, and the findings are judged there.
   */
  warmDayTempC?: number | null;
}

export interface CaseResult {
  co2: { residualVolumes: number; fromSugarVolumes: number; totalVolumes: number };
  alcohol: { addedAbvPercent: number; totalAbvPercent: number };
  pressures: (Equilibrium & { overRating: boolean })[];
}

/** One yield case in brief: gauge pressures in the order of the requested temperatures. */
export interface CaseSummary {
  co2: CaseResult['co2'];
  alcohol: CaseResult['alcohol'];
  gaugeBar: number[];
}

export interface CarbonationResult extends CaseResult {
  /** The warm-day temperature added after the asked ones (the last pressure), or null when none was added. */
  warmDayTempC: number | null;
  sugar: {
    fermentableG: number;
    fermentableGPerL: number;
    sweetOnlyG: number;
    fromIngredientsG: number;
    addedG: number;
  };
  /** Both cases side by side, in brief; the top-level co2, alcohol and pressures are those of the requested yield. */
  cases: { worst: CaseSummary; expected: CaseSummary };
  findings: Finding[];
  assumptions: { name: string; value: string; source: string }[];
}

/**
 * Temperatures the model is meant for, °C: the range Weiss (1974) fitted his solubility equation to (−1 to 40 °C),
 * kept above freezing. Outside it the numbers are extrapolated.
 */
export const MODEL_RANGE_C = { min: 0, max: 40 } as const;
/** The warmest the bottles may meet when a brewery has not said otherwise, °C (a closed car in summer; common practice, no source). */
export const DEFAULT_WARMEST_TEMP_C = 35;

/** The temperatures to check: those asked, and the warm day when it is hotter than all of them. */
export function temperaturesToCheck(
  temperaturesC: number[],
  warmDayTempC: number | null | undefined,
): { temperaturesC: number[]; added: number | null } {
  if (warmDayTempC === undefined || warmDayTempC === null || temperaturesC.some((t) => t >= warmDayTempC))
    return { temperaturesC, added: null };
  return { temperaturesC: [...temperaturesC, warmDayTempC], added: warmDayTempC };
}

/** Temperatures the API accepts at all, °C: beyond these a drink is frozen solid or the bottle is on a stove. */
export const ACCEPTED_TEMP_C = { min: -5, max: 60 } as const;
/** Fermentable sugar above this, g/L, is far beyond bottle conditioning (common practice, no source: 4–12 g/L is usual). */
export const ABSURD_SUGAR_G_PER_L = 40;
/** From this share of the rating up, pressure is a caution. */
export const CAUTION_SHARE_OF_RATING = 0.75;

/**
 * A gauge pressure against a bottle's rating: at or over the rating danger, from 75 % of it caution. At a threshold
 * the worse level applies, as with alcohol at the limit.
 */
export function ratingLevel(gaugeBar: number, ratingBar: number): FindingLevel {
  if (gaugeBar >= ratingBar) return 'danger';
  if (gaugeBar >= ratingBar * CAUTION_SHARE_OF_RATING) return 'caution';
  return 'ok';
}

const round = (value: number, digits = 2) => Math.round(value * 10 ** digits) / 10 ** digits;
/** Six significant figures: far beyond what the model can claim, and answers stay small (a full float is 18 characters). */
const sig = (value: number) => (Number.isFinite(value) ? Number(value.toPrecision(6)) : value);

/** The fermentable sugar of a bottle (or a litre) as portions with their stoichiometry, with the totals by source. */
export function fermentableSugars(input: Pick<CarbonationInput, 'sugars' | 'ingredients'>, which: YieldCase) {
  const portions: FermentableSugar[] = [];
  let addedG = 0;
  let fromIngredientsG = 0;
  let sweetOnlyG = 0;
  for (const { type, grams } of input.sugars) {
    const info = SUGARS[type];
    const sugarG = grams * info.sugarFraction;
    addedG += sugarG * info.fermentableShare;
    sweetOnlyG += sugarG * (1 - info.fermentableShare);
    portions.push({ grams: sugarG * info.fermentableShare, molarMass: info.molarMass, co2PerMole: info.co2PerMole });
  }
  for (const ingredient of input.ingredients) {
    const sugarG = which === 'worst' ? (ingredient.worstSugarG ?? ingredient.sugarG) : ingredient.sugarG;
    const fermentable = sugarG * ingredient.fermentableShare;
    fromIngredientsG += fermentable;
    sweetOnlyG += sugarG - fermentable;
    // Mixed fruit sugars are counted with sucrose's yield per gram, the highest of the common sugars.
    portions.push({ grams: fermentable, molarMass: SUGARS.sucrose.molarMass, co2PerMole: SUGARS.sucrose.co2PerMole });
  }
  return { portions, addedG, fromIngredientsG, sweetOnlyG };
}

/** True when neither the residual CO2 nor the temperature the base was last open at is given. */
export function residualCo2Unknown(input: Pick<CarbonationInput, 'residualCo2Volumes' | 'lastOpenTempC'>): boolean {
  return (
    (input.residualCo2Volumes === undefined || input.residualCo2Volumes === null) &&
    (input.lastOpenTempC === undefined || input.lastOpenTempC === null)
  );
}

/**
 * Volumes of CO2 in the liquid when it is sealed: the given value, or saturation under 1 atm at the temperature it
 * was last open at. When neither is known it is never taken as zero: a fermented base holds CO2, and counting more of
 * it gives the higher pressure, so it is taken as saturated under 1 atm at the sealing temperature (and said so).
 */
export function residualVolumes(
  input: Pick<CarbonationInput, 'residualCo2Volumes' | 'lastOpenTempC' | 'sealedTempC'>,
): number {
  if (input.residualCo2Volumes !== undefined && input.residualCo2Volumes !== null) return input.residualCo2Volumes;
  if (input.lastOpenTempC !== undefined && input.lastOpenTempC !== null)
    return residualVolumesAfterOpen(input.lastOpenTempC);
  return residualVolumesAfterOpen(input.sealedTempC);
}

/** The assumption shown with every answer whose residual CO2 was not given. */
export function residualAssumption(
  input: Pick<CarbonationInput, 'residualCo2Volumes' | 'lastOpenTempC' | 'sealedTempC'>,
): CarbonationResult['assumptions'] {
  if (!residualCo2Unknown(input)) return [];
  return [
    {
      name: 'Residual CO2 of the base (not given)',
      value: `Taken as ${round(residualVolumes(input), 2)} volumes, the most the base holds in open air at the sealing temperature, ${input.sealedTempC} °C. Enter a measured value, or the temperature the base was last open at, to replace it.`,
      source: 'taken high on purpose, so that pressure is not underestimated',
    },
  ];
}

function caseResult(
  input: CarbonationInput,
  container: Container,
  portions: FermentableSugar[],
  which: YieldCase,
): CaseResult {
  const residual = residualVolumes(input);
  const products = fermentationProducts(portions, yieldFactor(which));
  const totalMol = volumesToMol(residual, input.liquidMl) + products.co2Mol;
  const added = abvPercent(products.ethanolG, input.liquidMl);
  const rating = input.maxWorkingPressureBar ?? null;
  return {
    co2: {
      residualVolumes: sig(residual),
      fromSugarVolumes: sig(molToVolumes(products.co2Mol, input.liquidMl)),
      totalVolumes: sig(molToVolumes(totalMol, input.liquidMl)),
    },
    alcohol: { addedAbvPercent: sig(added), totalAbvPercent: sig(input.baseAbvPercent + added) },
    pressures: input.temperaturesC.map((tempC) => {
      const eq = equilibriumAt(container, totalMol, tempC);
      return {
        tempC,
        co2PartialAtm: sig(eq.co2PartialAtm),
        gaugeBar: sig(eq.gaugeBar),
        gaugePsi: sig(eq.gaugePsi),
        dissolvedVolumes: sig(eq.dissolvedVolumes),
        headspaceMl: sig(eq.headspaceMl),
        liquidFills: eq.liquidFills,
        overRating: eq.liquidFills || (rating !== null && ratingLevel(eq.gaugeBar, rating) === 'danger'),
      };
    }),
  };
}

function pressureFindings(worst: CaseResult, rating: number | null): Finding[] {
  // Judged at the hottest temperature asked about, in the worst case.
  if (worst.pressures.length === 0) return [];
  const hottest = worst.pressures.reduce((a, b) => (b.tempC > a.tempC ? b : a));
  const at = `${round(hottest.gaugeBar, 2)} bar (${round(hottest.gaugePsi, 0)} psi) gauge at ${hottest.tempC} °C`;
  const values = { tempC: hottest.tempC, gaugeBar: round(hottest.gaugeBar, 3), gaugePsi: round(hottest.gaugePsi, 1) };
  if (rating === null) {
    return [
      {
        level: 'caution',
        code: 'no-rating',
        message: `Worst case ${at}. No bottle rating was given to compare it with: choose a bottle format.`,
        values,
      },
    ];
  }
  const withRating = { ...values, ratingBar: rating };
  const level = ratingLevel(hottest.gaugeBar, rating);
  if (level === 'danger') {
    return [
      {
        level: 'danger',
        code: 'pressure-over-rating',
        message: `Worst case ${at} is at or over the bottle's ${rating} bar rating. Use less sugar, stronger bottles, or keep them colder.`,
        values: withRating,
      },
    ];
  }
  if (level === 'caution') {
    return [
      {
        level: 'caution',
        code: 'pressure-near-rating',
        message: `Worst case ${at} is within 25 % of the bottle's ${rating} bar rating.`,
        values: withRating,
      },
    ];
  }
  return [
    {
      level: 'ok',
      code: 'pressure-within-rating',
      message: `Worst case ${at} stays well within the bottle's ${rating} bar rating.`,
      values: withRating,
    },
  ];
}

/**
 * A danger when the liquid, expanding as it warms, would fill the bottle at a temperature checked: with no gas space
 * left, the liquid presses on the glass directly and the pressure rises far beyond what the gases alone would give.
 */
export function fillFindings(container: Container, temperaturesC: number[]): Finding[] {
  const fills = liquidFills(container, temperaturesC);
  if (!fills) return [];
  const leastMl = Math.ceil(fills.leastHeadspaceMl);
  return [
    {
      level: 'danger',
      code: 'liquid-fills-bottle',
      message: `${fills.tempC > container.sealedTempC ? `At ${round(fills.tempC, 1)} °C the warmed liquid fills the bottle` : 'The liquid fills the bottle'}: with no gas space left the glass takes the liquid's full force. Leave at least ${leastMl} mL of headspace (more is safer), or fill less.`,
      values: { tempC: round(fills.tempC, 2), leastHeadspaceMl: leastMl, headspaceMl: container.headspaceMl },
    },
  ];
}

function alcoholFindings(worst: CaseResult, expected: CaseResult, limit: number): Finding[] {
  const total = worst.alcohol.totalAbvPercent;
  const values = {
    worstTotalAbvPercent: round(total, 3),
    expectedTotalAbvPercent: round(expected.alcohol.totalAbvPercent, 3),
    limitAbvPercent: limit,
  };
  const text = `${round(total, 2)} % ABV in the worst case`;
  // US rules (27 CFR 7.1, and 27 CFR 1.10 and 26 U.S.C. 5052 for beer: "0.5 percent or more"): at the limit is over it.
  if (total >= limit)
    return [
      {
        level: 'danger',
        code: 'alcohol-over-limit',
        message: `${text}: at or over the ${limit} % ABV limit for non-alcoholic drinks.`,
        values,
      },
    ];
  if (total >= limit * 0.8)
    return [
      {
        level: 'caution',
        code: 'alcohol-near-limit',
        message: `${text}: within 20 % of the ${limit} % ABV limit.`,
        values,
      },
    ];
  return [{ level: 'ok', code: 'alcohol-within-limit', message: `${text}, under the ${limit} % ABV limit.`, values }];
}

function inputFindings(input: CarbonationInput, fermentableGPerL: number): Finding[] {
  const findings: Finding[] = [];
  const temps = [
    ...input.temperaturesC,
    input.sealedTempC,
    ...(input.lastOpenTempC != null ? [input.lastOpenTempC] : []),
  ];
  const outside = temps.filter((t) => t < MODEL_RANGE_C.min || t > MODEL_RANGE_C.max);
  const freezing = temps.filter((t) => t < 0);
  if (freezing.length > 0) {
    findings.push({
      level: 'caution',
      code: 'freezing',
      // Common practice, no source: water expands by about 9 % as it freezes and can crack a full bottle.
      message: `${freezing.map((t) => `${t} °C`).join(', ')} is below freezing: ice expands and can crack or uncap a bottle. Keep bottles above 0 °C.`,
      values: { minC: Math.min(...freezing) },
    });
  }
  if (outside.length > 0) {
    findings.push({
      level: 'caution',
      code: 'temperature-out-of-range',
      message: `${outside.map((t) => `${t} °C`).join(', ')} is outside the ${MODEL_RANGE_C.min}–${MODEL_RANGE_C.max} °C the model is meant for: treat those numbers as rough.`,
      values: { minC: Math.min(...outside), maxC: Math.max(...outside) },
    });
  }
  if (fermentableGPerL > ABSURD_SUGAR_G_PER_L) {
    findings.push({
      level: 'caution',
      code: 'sugar-out-of-range',
      message: `${round(fermentableGPerL, 1)} g/L of fermentable sugar is far more than bottle conditioning uses (usually 4–12 g/L). Check the amounts.`,
      values: { fermentableGPerL: round(fermentableGPerL, 2) },
    });
  }
  if (input.solidsInBottle || input.ingredients.some((i) => i.inBottle)) {
    findings.push({
      level: 'caution',
      code: 'solids-in-bottle',
      message:
        'Fruit, purée or other solids stay in the bottle: fermentation and pressure keep rising as long as sugar remains. Rely on the worst case, chill on time and check a test bottle.',
    });
  }
  // Steeped or in the bottle alike: fat reaches the liquid either way.
  const fatty = input.ingredients.filter((i) => i.fatG > 0.5);
  if (fatty.length > 0) {
    findings.push({
      level: 'caution',
      code: 'fatty-ingredients',
      // Common practice, no source: fats go rancid in a wet acidic drink and flatten foam.
      message: `${fatty.map((i) => i.name).join(', ')} bring${fatty.length === 1 ? 's' : ''} fat: expect rancid off-flavours over time and poorer foam.`,
      values: {
        fatG: round(
          fatty.reduce((sum, i) => sum + i.fatG, 0),
          2,
        ),
      },
    });
  }
  return findings;
}

/**
 * The acidity limit for kombucha that public-health guidance uses: pH 4.2 or below keeps pathogens from growing
 * (FDA Food Code 2022, the kombucha variances under 3-502.11 as state health departments apply them; from memory).
 */
export const PH_LIMIT = 4.2;
/** From here up to the limit, a caution: little margin left (common practice, no source). */
export const PH_CAUTION_FROM = 4.0;

function phFindings(input: Pick<CarbonationInput, 'ph' | 'phRequired'>): Finding[] {
  if (input.ph === undefined || input.ph === null) {
    return input.phRequired
      ? [
          {
            level: 'caution',
            code: 'ph-missing',
            message: `No pH is given for the base. Measure it: a base must be at pH ${PH_LIMIT} or below before it is flavoured.`,
          },
        ]
      : [];
  }
  const values = { ph: input.ph, limitPh: PH_LIMIT };
  if (input.ph > PH_LIMIT) {
    return [
      {
        level: 'danger',
        code: 'ph-over-limit',
        message: `pH ${input.ph} is above ${PH_LIMIT}: the base is not acidic enough to be safe. Do not flavour it; add starter and test again.`,
        values,
      },
    ];
  }
  if (input.ph >= PH_CAUTION_FROM) {
    return [
      {
        level: 'caution',
        code: 'ph-near-limit',
        message: `pH ${input.ph} is close to the ${PH_LIMIT} limit: test again before flavouring.`,
        values,
      },
    ];
  }
  return [{ level: 'ok', code: 'ph-within-limit', message: `pH ${input.ph} is at or below ${PH_LIMIT}.`, values }];
}

/** Lines whose sugar is estimated or unknown: never counted as zero without saying so. */
function sugarBasisFindings(ingredients: IngredientSugar[]): Finding[] {
  const findings: Finding[] = [];
  const estimated = ingredients.filter((i) => i.sugarBasis === 'available-carbohydrate').map((i) => i.name);
  const unknown = ingredients.filter((i) => i.sugarBasis === 'unknown').map((i) => i.name);
  if (estimated.length > 0) {
    findings.push({
      level: 'caution',
      code: 'sugar-estimated',
      message: `${[...new Set(estimated)].join(', ')}: sugars not measured, so the worst case counts all available carbohydrate (carbohydrate minus fibre) as sugar. Enter the sugars from the label or the supplier for a closer figure.`,
    });
  }
  if (unknown.length > 0) {
    findings.push({
      level: 'danger',
      code: 'sugar-unknown',
      message: `${[...new Set(unknown)].join(', ')}: no sugar or carbohydrate value, so its sugar cannot be counted. Enter one from the label or the supplier's sheet before sealing anything.`,
    });
  }
  return findings;
}

/** How the numbers are worked out, in plain words for the floor; the references stay in `source`. */
const ASSUMPTIONS: CarbonationResult['assumptions'] = [
  {
    name: 'CO2 in the liquid',
    value: 'Colder liquid holds more of its CO2, so less of it presses on the cap; warm liquid lets it out.',
    source: 'Weiss (1974), Marine Chemistry 2:203–215: CO2 solubility in water',
  },
  {
    name: 'The gas space',
    value:
      'The space under the cap holds CO2, the air sealed in with it and water vapour, and all of them press on the cap. Oxygen the yeast uses up is still counted, so the pressure errs high.',
    source:
      'Weiss (1970), Deep-Sea Research 17:721–735: nitrogen, oxygen and argon solubility; Buck (1981): water vapour',
  },
  {
    name: 'Warm liquid',
    value:
      'Warm liquid takes more room and squeezes the gas space. The glass is taken not to stretch, so the pressure errs high.',
    source: 'Tanaka et al. (2001), Metrologia 38:301–309: density of water',
  },
  {
    name: 'Sugar to CO2 and alcohol',
    value: 'Yeast turns each gram of sugar into about half a gram of CO2 and half a gram of alcohol.',
    source: 'Gay-Lussac: the equation of alcoholic fermentation',
  },
  // Pasteur's figure, from memory.
  {
    name: 'Expected and worst case',
    value: `The expected case takes ${EXPECTED_YIELD * 100} % of that (some sugar feeds the yeast itself); the worst case, which the findings judge, takes all of it.`,
    source: 'Pasteur: a typical yield, not measured here',
  },
  {
    name: 'Volumes of CO2',
    value: `One volume is ${round(CO2_G_PER_VOLUME, 2)} g of CO2 in each litre of liquid.`,
    source: `CODATA 2018: ${round(MOLAR_VOLUME_STP_L, 3)} L per mole of gas at 0 °C and 1 atm`,
  },
  {
    name: 'Alcohol by volume',
    value: 'Alcohol is weighed and turned into a share of the volume (0.789 g per mL).',
    source: 'CRC Handbook: density of ethanol at 20 °C',
  },
  {
    name: 'Base left open',
    value: 'A base left open holds as much CO2 as it can at that temperature in open air.',
    source: 'common practice, no source',
  },
  {
    name: 'Steeped ingredients',
    value: 'The expected case takes the share of sugar you say reaches the liquid; the worst case takes all of it.',
    source: 'taken high on purpose',
  },
  {
    name: 'Starch',
    value:
      'Starch (in baked goods) is not counted when the sugars are known: kombucha yeasts break down little of it. When the sugars are not known, all the carbohydrate counts.',
    // From memory.
    source: 'the microbiology of kombucha cultures (Brettanomyces and Zygosaccharomyces yeasts have little amylase)',
  },
];

/** Sugar, CO2, pressure at each temperature and alcohol for one sealed container, worst and expected cases. */
export function computeCarbonation(asked: CarbonationInput): CarbonationResult {
  const checked = temperaturesToCheck(asked.temperaturesC, asked.warmDayTempC);
  const input = { ...asked, temperaturesC: checked.temperaturesC };
  const container: Container = {
    liquidMl: input.liquidMl,
    headspaceMl: input.headspaceMl,
    sealedTempC: input.sealedTempC,
  };
  const worstSugars = fermentableSugars(input, 'worst');
  const expectedSugars = fermentableSugars(input, 'expected');
  const { addedG, fromIngredientsG, sweetOnlyG } = input.yield === 'worst' ? worstSugars : expectedSugars;
  const fermentableG = addedG + fromIngredientsG;
  const fermentableGPerL = (fermentableG / input.liquidMl) * 1000;
  const worst = caseResult(input, container, worstSugars.portions, 'worst');
  const expected = caseResult(input, container, expectedSugars.portions, 'expected');
  const chosen = input.yield === 'worst' ? worst : expected;
  const brief = (c: CaseResult): CaseSummary => ({
    co2: c.co2,
    alcohol: c.alcohol,
    gaugeBar: c.pressures.map((p) => p.gaugeBar),
  });
  return {
    sugar: {
      fermentableG: sig(fermentableG),
      fermentableGPerL: sig(fermentableGPerL),
      sweetOnlyG: sig(sweetOnlyG),
      fromIngredientsG: sig(fromIngredientsG),
      addedG: sig(addedG),
    },
    ...chosen,
    cases: { worst: brief(worst), expected: brief(expected) },
    warmDayTempC: checked.added,
    findings: [
      ...fillFindings(container, [input.sealedTempC, ...input.temperaturesC]),
      ...pressureFindings(worst, input.maxWorkingPressureBar ?? null),
      ...alcoholFindings(worst, expected, input.abvLimitPercent),
      ...inputFindings(input, ((worstSugars.addedG + worstSugars.fromIngredientsG) / input.liquidMl) * 1000),
      ...sugarBasisFindings(input.ingredients),
      ...phFindings(input),
    ],
    assumptions: [...residualAssumption(input), ...ASSUMPTIONS],
  };
}

export interface PrimingInput {
  liquidMl: number;
  headspaceMl: number;
  targetVolumes: number;
  residualCo2Volumes?: number | null;
  lastOpenTempC?: number | null;
  sugarType: SugarType;
  sealedTempC: number;
  highestTempC: number;
  maxWorkingPressureBar?: number | null;
  baseAbvPercent: number;
  abvLimitPercent: number;
  yield: YieldCase;
  /** The brewery's warmest temperature, °C: the most sugar is judged at the hotter of it and highestTempC. */
  warmDayTempC?: number | null;
  /** Share of the bottle's rating the most sugar may reach at the warm check (the brewery's margin; 0.8 by default). */
  ratingShare?: number;
}

/** The most sugar keeps this share of the bottle's rating at the warm check unless a brewery says otherwise (common practice, no source). */
export const DEFAULT_RATING_SHARE = 0.8;

export interface PrimingResult {
  /** Where the most sugar and the worst pressure were judged: the hotter of highestTempC and the warm day, °C. */
  checkedTempC: number;
  /** Grams of the sugar product (as weighed) per container, and per litre. */
  sugarG: number;
  sugarGPerL: number;
  residualVolumes: number;
  addedAbvPercent: number;
  totalAbvPercent: number;
  /**
   * The most of this sugar that is safe: worst case at the warm check within the rating share (80 % of the rating)
   * and the alcohol below the limit. Null when no rating is known.
   */
  maxSafeSugarG: number | null;
  /** The share of the rating the most sugar may reach at the warm check (the brewery's margin), 0–1. */
  ratingShare: number;
  /** What the helpers fill: the sugar for the target, or the most that is safe when the target is beyond it. */
  safeSugarG: number;
  /** False when the target cannot be reached within the rating share or the alcohol limit. */
  targetReachable: boolean;
  /** What stops the target, when it cannot be reached. */
  limitedBy: 'pressure' | 'alcohol' | null;
  /** Worst-case gauge pressure at highestTempC with sugarG. */
  worstGaugeBarAtHighest: number;
  /**
   * Where this sugar crosses into each band at the warm check, grams per container: caution from 75 % of the rating,
   * danger from the rating itself (null without a rating), and the alcohol limit.
   */
  bands: { cautionFromG: number | null; dangerFromG: number | null; alcoholLimitG: number };
  findings: Finding[];
  /** What was taken for inputs that were not given (the residual CO2 of the base). */
  assumptions: CarbonationResult['assumptions'];
}

/** Sugar for a target carbonation, the alcohol it brings, and the most sugar the bottle's rating allows. */
export function computePriming(asked: PrimingInput): PrimingResult {
  const checkedTempC = Math.max(asked.highestTempC, asked.warmDayTempC ?? -Infinity);
  const input = { ...asked, highestTempC: checkedTempC };
  const info = SUGARS[input.sugarType];
  const residual = residualVolumes(input);
  const container: Container = {
    liquidMl: input.liquidMl,
    headspaceMl: input.headspaceMl,
    sealedTempC: input.sealedTempC,
  };
  // Grams of the product that make one mole of CO2 at the chosen yield.
  const gramsPerCo2Mol = info.molarMass / info.co2PerMole / (info.sugarFraction * info.fermentableShare);
  const neededMol = volumesToMol(Math.max(0, input.targetVolumes - residual), input.liquidMl);
  const sugarG = (neededMol * gramsPerCo2Mol) / yieldFactor(input.yield);
  const portion: FermentableSugar = {
    grams: sugarG * info.sugarFraction * info.fermentableShare,
    molarMass: info.molarMass,
    co2PerMole: info.co2PerMole,
  };
  const added = abvPercent(fermentationProducts([portion], yieldFactor(input.yield)).ethanolG, input.liquidMl);
  const worstMol = volumesToMol(residual, input.liquidMl) + fermentationProducts([portion], 1).co2Mol;
  const worstGauge = equilibriumAt(container, worstMol, input.highestTempC).gaugeBar;
  const rating = input.maxWorkingPressureBar ?? null;
  const share = input.ratingShare ?? DEFAULT_RATING_SHARE;
  const pressureCapG =
    rating === null
      ? Infinity
      : Math.max(
          0,
          (maxCo2MolForGauge(container, rating * share, input.highestTempC) - volumesToMol(residual, input.liquidMl)) *
            gramsPerCo2Mol,
        );
  // The alcohol is linear in the sugar: stay a hair below the limit, since at the limit is over it.
  // Judged at the theoretical yield (the worst case), whatever case is shown.
  const abvPerGram = abvPercent(
    fermentationProducts(
      [{ grams: info.sugarFraction * info.fermentableShare, molarMass: info.molarMass, co2PerMole: info.co2PerMole }],
      1,
    ).ethanolG,
    input.liquidMl,
  );
  const alcoholCapG = Math.max(0, ((input.abvLimitPercent - input.baseAbvPercent) / abvPerGram) * 0.999);
  const maxSafeSugarG = rating === null ? null : Math.min(pressureCapG, alcoholCapG);
  // The same sum as the cap, at the caution line and at the rating: where the bands of this bottle begin.
  const sugarForGauge = (gaugeBar: number) =>
    Math.max(
      0,
      (maxCo2MolForGauge(container, gaugeBar, input.highestTempC) - volumesToMol(residual, input.liquidMl)) *
        gramsPerCo2Mol,
    );
  const bands = {
    cautionFromG: rating === null ? null : sugarForGauge(rating * CAUTION_SHARE_OF_RATING),
    dangerFromG: rating === null ? null : sugarForGauge(rating),
    alcoholLimitG: Math.max(0, (input.abvLimitPercent - input.baseAbvPercent) / abvPerGram),
  };
  const limitedBy: PrimingResult['limitedBy'] =
    sugarG <= Math.min(pressureCapG, alcoholCapG) ? null : alcoholCapG < pressureCapG ? 'alcohol' : 'pressure';
  const safeSugarG = Math.min(sugarG, pressureCapG, alcoholCapG);

  const findings: Finding[] = [...fillFindings(container, [input.sealedTempC, input.highestTempC])];
  if (residual >= input.targetVolumes) {
    findings.push({
      level: 'ok',
      code: 'already-at-target',
      message: `The liquid already holds ${round(residual)} volumes: no sugar is needed for ${input.targetVolumes}.`,
    });
  }
  if (maxSafeSugarG !== null && rating !== null) {
    const values = {
      sugarG: round(sugarG, 2),
      maxSafeSugarG: round(maxSafeSugarG, 2),
      ratingBar: rating,
      highestTempC: input.highestTempC,
      ratingShare: share,
    };
    if (limitedBy !== null) {
      const why =
        limitedBy === 'pressure'
          ? `within ${round(share * 100, 0)} % of the bottle's ${rating} bar rating at ${input.highestTempC} °C in the worst case`
          : `below the ${input.abvLimitPercent} % ABV limit`;
      findings.push({
        level: 'danger',
        code: limitedBy === 'pressure' ? 'target-over-rating' : 'target-over-alcohol-limit',
        message: `${input.targetVolumes} volumes cannot be reached ${why}: it would take ${round(sugarG, 2)} g. The most that is safe is ${round(safeSugarG, 2)} g.`,
        values,
      });
    } else if (ratingLevel(worstGauge, rating) !== 'ok') {
      findings.push({
        level: 'caution',
        code: 'pressure-near-rating',
        message: `Worst case ${round(worstGauge)} bar at ${input.highestTempC} °C is within 25 % of the ${rating} bar rating.`,
        values,
      });
    } else {
      findings.push({
        level: 'ok',
        code: 'pressure-within-rating',
        message: `Up to ${round(maxSafeSugarG, 1)} g stays within the ${rating} bar rating at ${input.highestTempC} °C in the worst case.`,
        values,
      });
    }
  } else {
    findings.push({
      level: 'caution',
      code: 'no-rating',
      message: 'No bottle rating was given: choose a bottle format to see the most sugar it can take.',
    });
  }
  const total = input.baseAbvPercent + added;
  if (total >= input.abvLimitPercent) {
    findings.push({
      level: 'danger',
      code: 'alcohol-over-limit',
      message: `This sugar brings the drink to ${round(total)} % ABV, at or over the ${input.abvLimitPercent} % limit.`,
      values: { totalAbvPercent: round(total, 3) },
    });
  } else if (total >= input.abvLimitPercent * 0.8) {
    findings.push({
      level: 'caution',
      code: 'alcohol-near-limit',
      message: `This sugar brings the drink to ${round(total)} % ABV, within 20 % of the ${input.abvLimitPercent} % limit.`,
      values: { totalAbvPercent: round(total, 3) },
    });
  }
  return {
    checkedTempC,
    bands,
    ratingShare: share,
    safeSugarG,
    targetReachable: limitedBy === null,
    limitedBy,
    sugarG,
    sugarGPerL: (sugarG / input.liquidMl) * 1000,
    residualVolumes: residual,
    addedAbvPercent: added,
    totalAbvPercent: total,
    maxSafeSugarG,
    worstGaugeBarAtHighest: worstGauge,
    findings,
    assumptions: residualAssumption(input),
  };
}
