/** Build-time settings. The API is always reached on this origin under /api (Vite proxies it). */
export const env = {
  apiBasePath: '/api',
  storefrontUrl: import.meta.env.VITE_STOREFRONT_URL || 'http://localhost:5173',
} as const;
