import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { render as rntlRender, type RenderOptions } from '@testing-library/react-native';
import type { ReactElement, ReactNode } from 'react';

/** Renders inside a fresh query cache that never retries, so every test starts clean. */
export function render(ui: ReactElement, options?: RenderOptions) {
  // No garbage-collection timers (gcTime: Infinity): a test's queries must not keep Jest running after it ends.
  const client = new QueryClient({
    defaultOptions: { queries: { retry: false, gcTime: Infinity }, mutations: { retry: false, gcTime: Infinity } },
  });
  const Wrapper = ({ children }: { children: ReactNode }) => (
    <QueryClientProvider client={client}>{children}</QueryClientProvider>
  );
  return { client, ...rntlRender(ui, { wrapper: Wrapper, ...options }) };
}

export * from '@testing-library/react-native';
