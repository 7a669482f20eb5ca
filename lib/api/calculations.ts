import { keepPreviousData, useQuery } from '@tanstack/react-query';

import type { BrixRequest, CarbonationRequest, PrimingRequest } from '@/lib/schemas/calculations';

import { api } from './client';
import { staleTimes } from './query-client';
import type { BottleFormatRef, BrixAnswer, CarbonationAnswer, PrimingAnswer } from './types';

export type { BottleFormatRef, BrixAnswer, CarbonationAnswer, PrimingAnswer };

export const calculationKeys = {
  carbonation: (request: CarbonationRequest | undefined) => ['calculations', 'carbonation', request] as const,
  priming: (request: PrimingRequest | undefined) => ['calculations', 'priming', request] as const,
  brix: (request: BrixRequest | undefined) => ['calculations', 'brix', request] as const,
};

/**
 * Calculations are pure functions of their request, so each request is its own cache entry; the previous answer
 * stays on screen while the next one loads.
 */
export function useCarbonationQuery(request: CarbonationRequest | undefined) {
  return useQuery({
    queryKey: calculationKeys.carbonation(request),
    enabled: request !== undefined,
    staleTime: staleTimes.static,
    placeholderData: keepPreviousData,
    queryFn: () => api.post<CarbonationAnswer>('/calculations/carbonation', request),
  });
}

export function usePrimingQuery(request: PrimingRequest | undefined) {
  return useQuery({
    queryKey: calculationKeys.priming(request),
    enabled: request !== undefined,
    staleTime: staleTimes.static,
    placeholderData: keepPreviousData,
    queryFn: () => api.post<PrimingAnswer>('/calculations/priming', request),
  });
}

export function useBrixQuery(request: BrixRequest | undefined) {
  return useQuery({
    queryKey: calculationKeys.brix(request),
    enabled: request !== undefined,
    staleTime: staleTimes.static,
    placeholderData: keepPreviousData,
    queryFn: () => api.post<BrixAnswer>('/calculations/brix', request),
  });
}
