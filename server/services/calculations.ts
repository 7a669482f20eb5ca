import { brixToSpecificGravity, brixToSugarGPerL, READING_CAUTION, specificGravityToBrix } from '../../lib/chemistry/brix';
import { computeCarbonation, computePriming, type CarbonationResult, type PrimingResult } from '../../lib/chemistry/carbonation';
import type { BrixRequest, CarbonationRequest, PrimingRequest } from '../../lib/schemas/calculations';
import { badRequest } from '../errors';
import { cachedAbvLimit, cachedBottleFormat } from './brewery-cache';
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
async function resolveContainer(auth: AuthContext, input: CarbonationRequest | PrimingRequest, headspaceGiven: boolean): Promise<ResolvedContainer> {
  if (input.bottleFormatId) {
    const format = await cachedBottleFormat(auth.organisationId, input.bottleFormatId);
    if (!format) throw badRequest('No such bottle format in your brewery.', { bottleFormatId: 'No such bottle format in your brewery.' });
    return {
      liquidMl: input.liquidMl,
      headspaceMl: headspaceGiven ? input.headspaceMl : format.headspaceMl,
      maxWorkingPressureBar: input.maxWorkingPressureBar ?? format.maxWorkingPressureBar,
      bottleFormat: { id: format.id, name: format.name, maxWorkingPressureBar: format.maxWorkingPressureBar, pressureSource: format.pressureSource },
    };
  }
  return { liquidMl: input.liquidMl, headspaceMl: input.headspaceMl, maxWorkingPressureBar: input.maxWorkingPressureBar ?? null, bottleFormat: null };
}

async function abvLimit(auth: AuthContext, given: number | null | undefined): Promise<number> {
  return given ?? (await cachedAbvLimit(auth.organisationId));
}

export async function carbonation(auth: AuthContext, input: CarbonationRequest, headspaceGiven: boolean): Promise<CarbonationResult & { bottleFormat: ResolvedContainer['bottleFormat'] }> {
  if (input.ingredients.length > 0) {
    // The ingredient library is not part of this release yet; say so rather than ignore the sugar they bring.
    const fields = Object.fromEntries(input.ingredients.map((_, i) => [`ingredients[${i}].ingredientId`, 'No such ingredient in your library.']));
    throw badRequest('Ingredients from the library cannot be used yet: enter their sugar as added sugar.', fields);
  }
  const container = await resolveContainer(auth, input, headspaceGiven);
  const result = computeCarbonation({
    ...input,
    ...container,
    ingredients: [],
    abvLimitPercent: await abvLimit(auth, input.abvLimitPercent),
  });
  return { ...result, bottleFormat: container.bottleFormat };
}

export async function priming(auth: AuthContext, input: PrimingRequest, headspaceGiven: boolean): Promise<PrimingResult & { bottleFormat: ResolvedContainer['bottleFormat'] }> {
  const container = await resolveContainer(auth, input, headspaceGiven);
  if (input.sugarType === 'lactose') {
    throw badRequest('Lactose does not ferment, so it cannot carbonate a drink.', { sugarType: 'Choose a sugar yeast can ferment.' });
  }
  const result = computePriming({ ...input, ...container, abvLimitPercent: await abvLimit(auth, input.abvLimitPercent) });
  return { ...result, bottleFormat: container.bottleFormat };
}

export function brix(input: BrixRequest): { brix: number; specificGravity: number; sugarGPerL: number; caution: string } {
  const value = input.brix ?? specificGravityToBrix(input.specificGravity!);
  return { brix: value, specificGravity: brixToSpecificGravity(value), sugarGPerL: brixToSugarGPerL(value), caution: READING_CAUTION };
}
