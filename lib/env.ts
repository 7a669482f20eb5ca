/**
 * Client settings. Only EXPO_PUBLIC_* variables reach the bundle (they are inlined at build time), so nothing
 * here may be a secret.
 */
export const env = {
  /** Where the API lives. Empty: the same origin that served the app (the normal case). */
  apiUrl: (process.env.EXPO_PUBLIC_API_URL ?? '').replace(/\/$/, ''),
};
