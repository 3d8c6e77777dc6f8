import { defineConfig } from 'vitest/config';
import react from '@vitejs/plugin-react';

export default defineConfig({
  root: 'src-client',
  plugins: [react()],
  build: { outDir: '../dist/client', emptyOutDir: true, chunkSizeWarningLimit: 2000 },
  server: { proxy: { '/api/': 'http://127.0.0.1:3000' } },
  test: { environment: 'jsdom', include: ['**/*.test.tsx', '**/*.test.ts'], setupFiles: ['./test-setup.ts'] },
});
