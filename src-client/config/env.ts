/** Every VITE_* setting the client reads, in one place. */
export const clientConfig = {
  apiBase: import.meta.env.VITE_API_BASE ?? '/api',
  appName: 'Bandwright',
} as const;
