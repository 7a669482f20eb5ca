import { keepPreviousData, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';

import type {
  BatchListQuery,
  DecisionInput,
  DeviationInput,
  IngredientLotInput,
  ReadingInput,
  StartBatchInput,
} from '@/lib/schemas/batches';

import { api } from './client';
import { staleTimes } from './query-client';
import type {
  Attachment,
  BatchDetail,
  BatchDeviationEntry,
  BatchIngredientLotEntry,
  BatchPage,
  BatchReadingEntry,
  BatchSummary,
  TraceHit,
} from './types';

export type { BatchDetail, BatchPage, BatchReadingEntry, BatchSummary, TraceHit };

export const batchKeys = {
  all: ['batches'] as const,
  list: (query: Partial<BatchListQuery>) => ['batches', 'list', query] as const,
  detail: (id: number) => ['batches', 'detail', id] as const,
  trace: (lot: string) => ['batches', 'trace', lot] as const,
  lot: (lotCode: string) => ['batches', 'lot', lotCode] as const,
};

const queryString = (query: Record<string, string | number | undefined>) =>
  new URLSearchParams(
    Object.entries(query)
      .filter(([, v]) => v !== undefined && v !== '')
      .map(([k, v]) => [k, String(v)]),
  ).toString();

export function useBatchesQuery(query: Partial<BatchListQuery>) {
  return useQuery({
    queryKey: batchKeys.list(query),
    staleTime: staleTimes.list,
    placeholderData: keepPreviousData,
    queryFn: ({ signal }) => api.get<BatchPage>(`/batches?${queryString(query)}`, signal),
  });
}

export function useBatchQuery(id: number) {
  return useQuery({
    queryKey: batchKeys.detail(id),
    staleTime: staleTimes.list,
    queryFn: ({ signal }) => api.get<BatchDetail>(`/batches/${id}`, signal),
  });
}

export function useBatchByLotQuery(lotCode: string) {
  return useQuery({
    queryKey: batchKeys.lot(lotCode),
    queryFn: ({ signal }) => api.get<BatchSummary>(`/batches/lot/${encodeURIComponent(lotCode)}`, signal),
  });
}

export function useTraceQuery(supplierLot: string) {
  return useQuery({
    queryKey: batchKeys.trace(supplierLot),
    enabled: supplierLot.trim().length > 0,
    queryFn: ({ signal }) => api.get<TraceHit[]>(`/batches/trace?${queryString({ supplierLot })}`, signal),
  });
}

export function useStartBatchMutation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: StartBatchInput) => api.post<BatchDetail>('/batches', input),
    onSuccess: (batch) => {
      queryClient.setQueryData(batchKeys.detail(batch.id), batch);
      return queryClient.invalidateQueries({ queryKey: ['batches', 'list'] });
    },
  });
}

/** Every record on a batch changes the batch: refetch it (and the lists, whose states may move). */
function useBatchWrite<I, O>(id: number, write: (input: I) => Promise<O>) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: write,
    onSuccess: async (result) => {
      if (result && typeof result === 'object' && 'lotCode' in result)
        queryClient.setQueryData(batchKeys.detail(id), result);
      else await queryClient.invalidateQueries({ queryKey: batchKeys.detail(id) });
      await queryClient.invalidateQueries({ queryKey: ['batches', 'list'] });
    },
  });
}

export const useAddReadingMutation = (id: number) =>
  useBatchWrite(id, (input: ReadingInput) => api.post<BatchReadingEntry>(`/batches/${id}/readings`, input));
export const useLabReportMutation = (id: number) =>
  useBatchWrite(id, ({ readingId, file, name }: { readingId: number; file: Blob; name: string }) =>
    api.upload<Attachment>(`/batches/${id}/readings/${readingId}/report`, file, name),
  );
export const useSignOffStepMutation = (id: number) =>
  useBatchWrite(id, ({ step, note }: { step: number; note: string }) =>
    api.post<BatchDetail>(`/batches/${id}/steps/${step}`, { note }),
  );
export const useAddLotMutation = (id: number) =>
  useBatchWrite(id, (input: IngredientLotInput) =>
    api.post<BatchIngredientLotEntry>(`/batches/${id}/ingredient-lots`, input),
  );
export const useAddDeviationMutation = (id: number) =>
  useBatchWrite(id, (input: DeviationInput) => api.post<BatchDeviationEntry>(`/batches/${id}/deviations`, input));
export const useDecideMutation = (id: number) =>
  useBatchWrite(id, (input: DecisionInput) => api.post<BatchDetail>(`/batches/${id}/release`, input));

/** The record PDF's address (the browser opens it with the session cookie). */
export const batchRecordUrl = (id: number) => `/api/batches/${id}/record.pdf`;
