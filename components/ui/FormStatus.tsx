import { ApiError } from '@/lib/api/client';

import { Banner } from './Banner';

/** The form-level message after a failed submit: the server's own words, or a plain fallback. */
export function FormStatus({ error }: { error: unknown }) {
  if (!error) return null;
  const message = error instanceof ApiError || error instanceof Error ? error.message : 'Something went wrong.';
  return <Banner tone="danger">{message}</Banner>;
}
