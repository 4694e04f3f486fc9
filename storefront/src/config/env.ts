/** Build-time settings. The API is always reached on this origin under /api (Vite proxies it). */
export const env = {
  apiBasePath: '/api',
} as const;
