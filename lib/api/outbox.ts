import { useQuery } from '@tanstack/react-query';

import { api } from './client';
import type { OutboxMessage } from './types';

export const outboxKeys = {
  all: ['outbox'] as const,
};

export function useOutboxQuery() {
  return useQuery({
    queryKey: outboxKeys.all,
    staleTime: 0,
    queryFn: ({ signal }) => api.get<{ messages: OutboxMessage[]; open: boolean }>('/outbox', signal),
  });
}
