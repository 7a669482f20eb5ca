import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { render as rntlRender, type RenderOptions } from '@testing-library/react-native';
import type { ReactElement, ReactNode } from 'react';

/** Renders inside a fresh query cache that never retries, so every test starts clean. */
export function render(ui: ReactElement, options?: RenderOptions) {
  const client = new QueryClient({ defaultOptions: { queries: { retry: false }, mutations: { retry: false } } });
  const Wrapper = ({ children }: { children: ReactNode }) => (
    <QueryClientProvider client={client}>{children}</QueryClientProvider>
  );
  return { client, ...rntlRender(ui, { wrapper: Wrapper, ...options }) };
}

export * from '@testing-library/react-native';
