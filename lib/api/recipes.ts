import { keepPreviousData, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';

import type { NutritionAnswer } from '@/lib/nutrition/panel';
import type { RecipeCard } from '@/lib/recipes/card';
import type { Change } from '@/lib/recipes/diff';
import type { RecipeEvaluation } from '@/lib/recipes/evaluate';
import type { ScaledRecipe } from '@/lib/recipes/scaling';
import type { LabValuesInput } from '@/lib/schemas/nutrition';
import type {
  CreateRecipeInput,
  RecipeContent,
  SaveRecipeInput,
  ScaleRequest,
  TastingInput,
} from '@/lib/schemas/recipes';
import type { ApproveInput, ReturnInput, SubmitInput, WithdrawInput } from '@/lib/schemas/reviews';

import { api } from './client';
import { staleTimes } from './query-client';
import type { RecipeDetail, RecipeSummary, ReviewTimeline, TastingEntry, VersionEntry } from './types';

export type { RecipeDetail, RecipeSummary, ReviewTimeline, TastingEntry, VersionEntry };

export type { Change, NutritionAnswer, RecipeEvaluation, ScaledRecipe };

export const recipeKeys = {
  all: ['recipes'] as const,
  list: (q: string, status: string) => ['recipes', 'list', q, status] as const,
  one: (id: number, version?: number) => ['recipes', 'one', id, version ?? 'current'] as const,
  review: (id: number) => ['recipes', 'review', id] as const,
  versions: (id: number) => ['recipes', 'versions', id] as const,
  diff: (id: number, from: number, to: number) => ['recipes', 'diff', id, from, to] as const,
  tastings: (id: number) => ['recipes', 'tastings', id] as const,
  evaluate: (content: RecipeContent | undefined) => ['recipes', 'evaluate', content] as const,
  scale: (id: number, request: ScaleRequest | undefined) => ['recipes', 'scale', id, request] as const,
  card: (id: number, query: string) => ['recipes', 'card', id, query] as const,
  nutrition: (id: number, query: string) => ['recipes', 'nutrition', id, query] as const,
};

/** The query string of a card: version, batch and units, as the card and card.pdf routes read it. */
export function cardQuery(input: {
  version?: number | string | null;
  kind: string;
  value: number | string;
  units: string;
}): string {
  return new URLSearchParams({
    kind: input.kind,
    value: String(input.value),
    units: input.units,
    ...(input.version ? { version: String(input.version) } : {}),
  }).toString();
}

/** The printed card (or batch sheet) of a version at a batch size; undefined query: not asked yet. */
export function useCardQuery(id: number, query: string | undefined) {
  return useQuery({
    queryKey: recipeKeys.card(id, query ?? ''),
    enabled: query !== undefined,
    staleTime: staleTimes.list,
    queryFn: ({ signal }) => api.get<RecipeCard>(`/recipes/${id}/card?${query}`, signal),
  });
}

export function useRecipesQuery(q: string, status: 'draft' | 'archived' | 'approved' | 'all') {
  return useQuery({
    queryKey: recipeKeys.list(q, status),
    staleTime: staleTimes.list,
    placeholderData: keepPreviousData,
    queryFn: ({ signal }) =>
      api.get<RecipeSummary[]>(`/recipes?${new URLSearchParams({ q, status }).toString()}`, signal),
  });
}

export function useRecipeQuery(id: number, version?: number | null) {
  return useQuery({
    queryKey: recipeKeys.one(id, version ?? undefined),
    enabled: Number.isInteger(id) && version !== null,
    staleTime: staleTimes.list,
    queryFn: ({ signal }) => api.get<RecipeDetail>(`/recipes/${id}${version ? `?version=${version}` : ''}`, signal),
  });
}

export function useReviewQuery(id: number) {
  return useQuery({
    queryKey: recipeKeys.review(id),
    staleTime: staleTimes.list,
    queryFn: ({ signal }) => api.get<ReviewTimeline>(`/recipes/${id}/review`, signal),
  });
}

export function useRecipeVersionsQuery(id: number) {
  return useQuery({
    queryKey: recipeKeys.versions(id),
    staleTime: staleTimes.list,
    queryFn: ({ signal }) => api.get<VersionEntry[]>(`/recipes/${id}/versions`, signal),
  });
}

export function useRecipeDiffQuery(id: number, from: number | null, to: number) {
  return useQuery({
    queryKey: recipeKeys.diff(id, from ?? 0, to),
    enabled: from !== null && from !== to,
    staleTime: staleTimes.static,
    queryFn: ({ signal }) => api.get<Change[]>(`/recipes/${id}/diff?from=${from}&to=${to}`, signal),
  });
}

export function useTastingsQuery(id: number) {
  return useQuery({
    queryKey: recipeKeys.tastings(id),
    staleTime: staleTimes.list,
    queryFn: ({ signal }) => api.get<TastingEntry[]>(`/recipes/${id}/tastings`, signal),
  });
}

/** The numbers of the recipe being edited; the previous answer stays while the next loads. */
export function useRecipeEvaluationQuery(content: RecipeContent | undefined) {
  return useQuery({
    queryKey: recipeKeys.evaluate(content),
    enabled: content !== undefined,
    staleTime: staleTimes.static,
    placeholderData: keepPreviousData,
    queryFn: () => api.post<RecipeEvaluation>('/recipes/evaluate', { content }),
  });
}

export function useScaleQuery(id: number, request: ScaleRequest | undefined) {
  return useQuery({
    queryKey: recipeKeys.scale(id, request),
    enabled: request !== undefined,
    staleTime: staleTimes.list,
    placeholderData: keepPreviousData,
    queryFn: () => api.post<ScaledRecipe & { version: number; bottleName: string }>(`/recipes/${id}/scale`, request),
  });
}

function useRecipeMutation<T, R>(mutationFn: (input: T) => Promise<R>) {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn, onSuccess: () => queryClient.invalidateQueries({ queryKey: recipeKeys.all }) });
}

export const useCreateRecipeMutation = () =>
  useRecipeMutation((input: CreateRecipeInput) => api.post<RecipeDetail>('/recipes', input));
export const useSaveRecipeMutation = (id: number) =>
  useRecipeMutation((input: SaveRecipeInput) => api.put<RecipeDetail>(`/recipes/${id}`, input));
export const useRestoreVersionMutation = (id: number) =>
  useRecipeMutation((version: number) => api.post<RecipeDetail>(`/recipes/${id}/restore`, { version }));
export const useDuplicateRecipeMutation = (id: number) =>
  useRecipeMutation(() => api.post<RecipeDetail>(`/recipes/${id}/duplicate`));
export const useArchiveRecipeMutation = (id: number) =>
  useRecipeMutation((archived: boolean) =>
    api.post<RecipeSummary>(`/recipes/${id}/${archived ? 'archive' : 'restore-archived'}`),
  );
export const useAddTastingMutation = (id: number) =>
  useRecipeMutation((input: TastingInput) => api.post<TastingEntry[]>(`/recipes/${id}/tastings`, input));

export const useSubmitMutation = (id: number) =>
  useRecipeMutation((input: SubmitInput) => api.post<ReviewTimeline>(`/recipes/${id}/submit`, input));
export const useApproveMutation = (id: number) =>
  useRecipeMutation((input: ApproveInput) => api.post<ReviewTimeline>(`/recipes/${id}/approve`, input));
export const useReturnMutation = (id: number) =>
  useRecipeMutation((input: ReturnInput) => api.post<ReviewTimeline>(`/recipes/${id}/return`, input));
export const useWithdrawMutation = (id: number) =>
  useRecipeMutation((input: WithdrawInput) => api.post<ReviewTimeline>(`/recipes/${id}/withdraw`, input));

/** The query string of a nutrition panel: a version (the newest when left out) and a serving other than the rule's. */
export function nutritionQuery(input: { version?: number | null; servingMl?: number | null; basis?: string }): string {
  return new URLSearchParams({
    ...(input.version ? { version: String(input.version) } : {}),
    ...(input.servingMl ? { servingMl: String(input.servingMl) } : {}),
    ...(input.basis ? { basis: input.basis } : {}),
  }).toString();
}

/** Where a panel file downloads from: `pdf`, `png` or `csv`. */
export const nutritionFileUrl = (id: number, ext: 'pdf' | 'png' | 'csv', query: string) =>
  `/api/recipes/${id}/nutrition.${ext}${query ? `?${query}` : ''}`;

/** The nutrition panel and allergen statement of a version. */
export function useNutritionQuery(id: number, version?: number | null, servingMl?: number | null) {
  const query = nutritionQuery({ version, servingMl });
  return useQuery({
    queryKey: recipeKeys.nutrition(id, query),
    staleTime: staleTimes.list,
    placeholderData: keepPreviousData,
    queryFn: ({ signal }) => api.get<NutritionAnswer>(`/recipes/${id}/nutrition${query ? `?${query}` : ''}`, signal),
  });
}

/** An owner's lab values for a version; the panel follows. */
export const useSaveLabValuesMutation = (id: number) =>
  useRecipeMutation((input: LabValuesInput) => api.put<NutritionAnswer>(`/recipes/${id}/nutrition/lab`, input));
