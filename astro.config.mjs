// @ts-check
import { defineConfig, envField } from 'astro/config';
import node from '@astrojs/node';
import react from '@astrojs/react';
import tailwindcss from '@tailwindcss/vite';

export default defineConfig({
  output: 'server',
  // Tests build into their own folder so a running `npm start` keeps its dist/.
  outDir: process.env.ASTRO_OUT_DIR || './dist',
  adapter: node({ mode: 'standalone' }),
  integrations: [react()],
  server: { port: 4321, host: '127.0.0.1' },
  // Without this Astro ignores the Host header: Astro.url loses the port and same-site POSTs get 403.
  security: { allowedDomains: [{ hostname: 'localhost' }, { hostname: '127.0.0.1' }] },
  env: {
    schema: {
      DATA_DIR: envField.string({ context: 'server', access: 'public', default: './data' }),
    },
  },
  vite: {
    plugins: [tailwindcss()],
    // Heavy server-only libraries are never bundled for the browser.
    ssr: { external: ['@electric-sql/pglite'] },
  },
});
