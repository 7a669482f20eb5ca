import { useEffect, useState } from 'react';

/**
 * The value, once it has stopped changing for `delayMs` (so typing does not send a request per key). Values are
 * compared by content, so an object rebuilt on every render with the same fields does not restart the wait.
 */
export function useDebouncedValue<T>(value: T, delayMs = 300): T {
  const [settled, setSettled] = useState(value);
  const key = JSON.stringify(value);
  useEffect(() => {
    const timer = setTimeout(() => setSettled(value), delayMs);
    return () => clearTimeout(timer);
    // Keyed by content: the value of the render where the content last changed is the one to settle on.
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [key, delayMs]);
  return settled;
}
