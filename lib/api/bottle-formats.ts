import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';

import type { BottleFormatInput } from '@/lib/schemas/bottle-formats';

import { api } from './client';
import { staleTimes } from './query-client';
import type { BottleFormat } from './types';

export type { BottleFormat };

export const bottleFormatKeys = {
  all: ['bottle-formats'] as const,
  list: (archived: boolean) => ['bottle-formats', { archived }] as const,
};

export function useBottleFormatsQuery(includeArchived = false) {
  return useQuery({
    queryKey: bottleFormatKeys.list(includeArchived),
    staleTime: staleTimes.list,
    queryFn: ({ signal }) =>
      api.get<BottleFormat[]>(`/bottle-formats${includeArchived ? '?archived=true' : ''}`, signal),
  });
}

function useFormatMutation<T>(mutationFn: (input: T) => Promise<BottleFormat>) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: bottleFormatKeys.all }),
  });
}

export const useCreateBottleFormatMutation = () =>
  useFormatMutation((input: BottleFormatInput) => api.post<BottleFormat>('/bottle-formats', input));
export const useUpdateBottleFormatMutation = () =>
  useFormatMutation(({ id, input }: { id: number; input: BottleFormatInput }) =>
    api.put<BottleFormat>(`/bottle-formats/${id}`, input),
  );
export const useArchiveBottleFormatMutation = () =>
  useFormatMutation(({ id, archived }: { id: number; archived: boolean }) =>
    api.post<BottleFormat>(`/bottle-formats/${id}/${archived ? 'archive' : 'restore'}`),
  );
