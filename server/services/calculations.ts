import { Op } from 'sequelize';

import type { CarbonationAnswer, PrimingAnswer } from '@/lib/api/types';
import { brixToSpecificGravity, brixToSugarGPerL, READING_CAUTION, specificGravityToBrix } from '@/lib/chemistry/brix';
import { computeCarbonation, computePriming, type IngredientSugar } from '@/lib/chemistry/carbonation';
import { ingredientContribution } from '@/lib/recipes/ingredient-sugar';
import type { BrixRequest, CarbonationRequest, PrimingRequest } from '@/lib/schemas/calculations';
import { Ingredient } from '@/server/db';
import { badRequest } from '@/server/errors';

import { cachedAbvLimit, cachedBottleFormat, cachedRatingShare, cachedWarmestTemp } from './brewery-cache';
import type { AuthContext } from './sessions';

interface ResolvedContainer {
  liquidMl: number;
  headspaceMl: number;
  maxWorkingPressureBar: number | null;
  bottleFormat: { id: number; name: string; maxWorkingPressureBar: number; pressureSource: string } | null;
}

/**
 * The container a question is about: a bottle format of the brewery (its rating, and its headspace unless the
 * request gives one), or the numbers given directly.
 */
async function resolveContainer(
  auth: AuthContext,
  input: CarbonationRequest | PrimingRequest,
): Promise<ResolvedContainer> {
  if (input.bottleFormatId) {
    const format = await cachedBottleFormat(auth.organisationId, input.bottleFormatId);
    if (!format)
      throw badRequest('No such bottle format in your brewery.', {
        bottleFormatId: 'No such bottle format in your brewery.',
      });
    return {
      liquidMl: input.liquidMl,
      headspaceMl: input.headspaceMl ?? format.headspaceMl,
      maxWorkingPressureBar: input.maxWorkingPressureBar ?? format.maxWorkingPressureBar,
      bottleFormat: {
        id: format.id,
        name: format.name,
        maxWorkingPressureBar: format.maxWorkingPressureBar,
        pressureSource: format.pressureSource,
      },
    };
  }
  // The schema asks for a headspace when no format gives one; this keeps the service safe on its own.
  if (input.headspaceMl === undefined || input.headspaceMl === null)
    throw badRequest('Enter the headspace.', {
      headspaceMl: 'Enter the headspace in mL, or choose a bottle format that gives it.',
    });
  return {
    liquidMl: input.liquidMl,
    headspaceMl: input.headspaceMl,
    maxWorkingPressureBar: input.maxWorkingPressureBar ?? null,
    bottleFormat: null,
  };
}

async function abvLimit(auth: AuthContext, given: number | null | undefined): Promise<number> {
  return given ?? (await cachedAbvLimit(auth.organisationId));
}

/**
 * The sugar and fat each ingredient line brings (`ingredientContribution`, shared with recipes and the card). Only
 * the dataset and the brewery's own house ingredients may be used (archived ones too: old recipes still name them).
 */
async function resolveIngredients(
  auth: AuthContext,
  lines: CarbonationRequest['ingredients'],
): Promise<IngredientSugar[]> {
  if (lines.length === 0) return [];
  const rows = await Ingredient.findAll({
    where: {
      id: lines.map((l) => l.ingredientId),
      [Op.or]: [{ organisationId: null }, { organisationId: auth.organisationId }],
    },
  });
  const byId = new Map(rows.map((r) => [r.id, r]));
  const missing = lines.map((l, i) => [l, i] as const).filter(([l]) => !byId.has(l.ingredientId));
  if (missing.length > 0) {
    throw badRequest(
      'Some ingredients are not in your library.',
      Object.fromEntries(
        missing.map(([, i]) => [`ingredients[${i}].ingredientId`, 'No such ingredient in your library.']),
      ),
    );
  }
  return lines.map((line) => {
    const ingredient = byId.get(line.ingredientId)!;
    return ingredientContribution(ingredient, line.grams, {
      inBottle: line.inBottle,
      extractionShare: line.extractionPct / 100,
    });
  });
}

export async function carbonation(auth: AuthContext, input: CarbonationRequest): Promise<CarbonationAnswer> {
  const container = await resolveContainer(auth, input);
  const result = computeCarbonation({
    ...input,
    ...container,
    ingredients: await resolveIngredients(auth, input.ingredients),
    abvLimitPercent: await abvLimit(auth, input.abvLimitPercent),
    warmDayTempC: await cachedWarmestTemp(auth.organisationId),
  });
  return { ...result, bottleFormat: container.bottleFormat };
}

export async function priming(auth: AuthContext, input: PrimingRequest): Promise<PrimingAnswer> {
  const container = await resolveContainer(auth, input);
  if (input.sugarType === 'lactose') {
    throw badRequest('Lactose does not ferment, so it cannot carbonate a drink.', {
      sugarType: 'Choose a sugar yeast can ferment.',
    });
  }
  const result = computePriming({
    ...input,
    ...container,
    abvLimitPercent: await abvLimit(auth, input.abvLimitPercent),
    warmDayTempC: await cachedWarmestTemp(auth.organisationId),
    ratingShare: await cachedRatingShare(auth.organisationId),
  });
  return { ...result, bottleFormat: container.bottleFormat };
}

export function brix(input: BrixRequest): {
  brix: number;
  specificGravity: number;
  sugarGPerL: number;
  caution: string;
} {
  const value = input.brix ?? specificGravityToBrix(input.specificGravity!);
  return {
    brix: value,
    specificGravity: brixToSpecificGravity(value),
    sugarGPerL: brixToSugarGPerL(value),
    caution: READING_CAUTION,
  };
}
