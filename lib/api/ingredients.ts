import { keepPreviousData, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';

import type { Category } from '@/lib/ingredients';
import type { DisplayNameInput, HouseIngredientInput } from '@/lib/schemas/ingredients';

import { api } from './client';
import { staleTimes } from './query-client';
import type { Attachment, Ingredient, IngredientChangeEntry, IngredientPage } from './types';

export type { Attachment, Ingredient, IngredientChangeEntry, IngredientPage };

export interface IngredientQuery {
  q: string;
  category: Category | '';
  page: number;
  pageSize?: number;
  archived?: boolean;
}

export const ingredientKeys = {
  all: ['ingredients'] as const,
  search: (query: IngredientQuery) => ['ingredients', 'search', query] as const,
  one: (id: number) => ['ingredients', 'one', id] as const,
  changes: (id: number) => ['ingredients', 'changes', id] as const,
};

export function useIngredientSearchQuery(query: IngredientQuery) {
  const params = new URLSearchParams({
    q: query.q,
    category: query.category,
    page: String(query.page),
    pageSize: String(query.pageSize ?? 25),
    archived: String(query.archived ?? false),
  });
  return useQuery({
    queryKey: ingredientKeys.search(query),
    staleTime: staleTimes.list,
    placeholderData: keepPreviousData,
    queryFn: ({ signal }) => api.get<IngredientPage>(`/ingredients?${params.toString()}`, signal),
  });
}

export function useIngredientQuery(id: number) {
  return useQuery({
    queryKey: ingredientKeys.one(id),
    enabled: Number.isInteger(id),
    staleTime: staleTimes.list,
    queryFn: ({ signal }) => api.get<Ingredient>(`/ingredients/${id}`, signal),
  });
}

export function useIngredientChangesQuery(id: number, enabled: boolean) {
  return useQuery({
    queryKey: ingredientKeys.changes(id),
    enabled,
    staleTime: staleTimes.list,
    queryFn: ({ signal }) => api.get<IngredientChangeEntry[]>(`/ingredients/${id}/changes`, signal),
  });
}

function useIngredientMutation<T>(mutationFn: (input: T) => Promise<Ingredient>) {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn, onSuccess: () => queryClient.invalidateQueries({ queryKey: ingredientKeys.all }) });
}

export const useCreateIngredientMutation = () =>
  useIngredientMutation((input: HouseIngredientInput) => api.post<Ingredient>('/ingredients', input));
export const useUpdateIngredientMutation = () =>
  useIngredientMutation(({ id, input }: { id: number; input: HouseIngredientInput }) =>
    api.put<Ingredient>(`/ingredients/${id}`, input),
  );
export const useCopyIngredientMutation = () =>
  useIngredientMutation(({ id, name }: { id: number; name: string }) =>
    api.post<Ingredient>(`/ingredients/${id}/copy`, { name }),
  );
export const useArchiveIngredientMutation = () =>
  useIngredientMutation(({ id, archived }: { id: number; archived: boolean }) =>
    api.post<Ingredient>(`/ingredients/${id}/${archived ? 'archive' : 'restore'}`),
  );

export function useAttachmentsQuery(ingredientId: number, enabled: boolean) {
  return useQuery({
    queryKey: ['ingredients', 'attachments', ingredientId],
    enabled,
    staleTime: staleTimes.list,
    queryFn: ({ signal }) => api.get<Attachment[]>(`/ingredients/${ingredientId}/attachments`, signal),
  });
}

export function useUploadAttachmentMutation(ingredientId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ file, name }: { file: Blob; name: string }) =>
      api.upload<Attachment>(`/ingredients/${ingredientId}/attachments`, file, name),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: ['ingredients', 'attachments', ingredientId] }),
  });
}

/** Deletes an attached file (owners and developers); the file itself goes too. */
export function useDeleteAttachmentMutation(ingredientId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (attachmentId: number) => api.delete<void>(`/attachments/${attachmentId}`),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: ['ingredients', 'attachments', ingredientId] }),
  });
}

/** Sets the brewery's short name for a dataset ingredient; recipes, cards and batches read it at once. */
export function useDisplayNameMutation(id: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: DisplayNameInput) => api.put<Ingredient>(`/ingredients/${id}/display-name`, input),
    // Names appear in recipes, cards and batches as well as the library.
    onSuccess: () => queryClient.invalidateQueries(),
  });
}
