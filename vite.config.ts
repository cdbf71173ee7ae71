import { fileURLToPath, URL } from 'node:url'
import { defineConfig } from 'vite'
import vue from '@vitejs/plugin-vue'
import { VitePWA } from 'vite-plugin-pwa'

const apiPort = process.env.PORT ?? '4300'

export default defineConfig({
  plugins: [
    vue(),
    // The app shell (HTML, scripts, styles, fonts) is cached by a service worker at the first
    // online visit, so the workspace opens on site without signal; the API is never cached.
    VitePWA({
      injectRegister: null,
      registerType: 'autoUpdate',
      manifest: false,
      workbox: {
        // Chromium and every current browser take woff2; the older font formats are left out.
        globPatterns: ['**/*.{js,css,html,woff2,png}'],
        navigateFallback: '/index.html',
        navigateFallbackDenylist: [/^\/api\//],
        maximumFileSizeToCacheInBytes: 6 * 1024 * 1024,
        cleanupOutdatedCaches: true,
      },
    }),
  ],
  resolve: {
    alias: {
      '@': fileURLToPath(new URL('./src', import.meta.url)),
      '@shared': fileURLToPath(new URL('./shared', import.meta.url)),
    },
  },
  // The chart component's apexcharts entries must share one core: pre-bundle them together.
  optimizeDeps: {
    include: [
      'vue3-apexcharts/core',
      'apexcharts/core',
      'apexcharts/line',
      'apexcharts/features/legend',
      'apexcharts/features/annotations',
    ],
  },
  server: {
    host: '127.0.0.1',
    proxy: { '/api': `http://127.0.0.1:${apiPort}` },
  },
  build: {
    outDir: 'dist/client',
    emptyOutDir: true,
    chunkSizeWarningLimit: 900,
  },
})
