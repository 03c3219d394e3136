import { defineConfig } from 'vite';
import react from '@vitejs/plugin-react';
import tailwindcss from '@tailwindcss/vite';
import { compression } from 'vite-plugin-compression2';
import { fileURLToPath } from 'node:url';

const here = (path: string) => fileURLToPath(new URL(path, import.meta.url));

/** Shared Vite settings for the two apps; in development each proxies /api to the server on API_PORT (3000). */
export function appConfig(app: 'storefront' | 'admin', port: number) {
  const apiTarget = `http://127.0.0.1:${process.env.API_PORT ?? 3000}`;
  return defineConfig({
    root: here(`./${app}`),
    base: app === 'admin' ? '/admin/' : '/',
    // Gzip and brotli copies of each text file beside it, which the server sends to browsers that accept them.
    plugins: [react(), tailwindcss(), compression({ algorithms: ['gzip', 'brotliCompress'] })],
    resolve: {
      alias: {
        '@server': here('./server/src'),
        '@ui': here('./ui/src'),
        [app === 'admin' ? '@admin' : '@store']: here(`./${app}/src`),
      },
    },
    build: { outDir: here(`./dist/${app}`), emptyOutDir: true, chunkSizeWarningLimit: 700, manifest: true },
    server: {
      port,
      strictPort: true,
      host: '127.0.0.1',
      proxy: { '/api': { target: apiTarget, changeOrigin: false } },
    },
    preview: { port, strictPort: true, host: '127.0.0.1' },
  });
}
