/// <reference types="vitest/config" />
import { defineConfig } from 'vite';
import react from '@vitejs/plugin-react';
import { VitePWA } from 'vite-plugin-pwa';

export default defineConfig({
  plugins: [
    react(),
    // Installable and offline after one visit: the service worker precaches the whole built app
    // (scripts, the model worker, styles, icons). Updates are offered, never forced mid-work
    // (registerType 'prompt'; the page decides when to reload).
    VitePWA({
      registerType: 'prompt',
      injectRegister: false,
      manifest: {
        name: 'Firnline — glacier flowline modeller',
        short_name: 'Firnline',
        description: 'Glacier flowline modelling in the browser, offline.',
        start_url: './',
        display: 'standalone',
        background_color: '#ffffff',
        theme_color: '#0b5394',
        icons: [{ src: 'icon.svg', sizes: 'any', type: 'image/svg+xml', purpose: 'any' }],
      },
      workbox: { globPatterns: ['**/*.{js,css,html,svg,png,webmanifest}'], navigateFallback: 'index.html' },
    }),
  ],
  base: './',
  build: { outDir: 'dist/app', sourcemap: true },
  server: { port: 5173, strictPort: false },
  test: {
    include: ['test/**/*.test.ts', 'test/**/*.test.tsx'],
    exclude: ['test/e2e/**', 'node_modules/**'],
    environment: 'node',
    testTimeout: 60_000,
    // Separate processes, not threads: a crashing test worker cannot take the run down (seen once with threads).
    pool: 'forks',
  },
});
