import { QueryClient } from '@tanstack/react-query';

import { ApiError } from './client';

/** How long fetched data counts as fresh, shared by every query module. */
export const staleTimes = {
  session: 5 * 60_000,
  // Lists show what is cached at once and refresh in the background every time a screen opens.
  list: 0,
  static: 10 * 60_000,
} as const;

export function createQueryClient(): QueryClient {
  return new QueryClient({
    defaultOptions: {
      queries: {
        // Never retry what the server refused on purpose (4xx); retry network trouble twice.
        retry: (failures, error) =>
          !(error instanceof ApiError && error.status >= 400 && error.status < 500) && failures < 2,
        refetchOnWindowFocus: false,
      },
    },
  });
}
