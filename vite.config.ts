import { fileURLToPath, URL } from 'node:url'
import { defineConfig } from 'vite'
import vue from '@vitejs/plugin-vue'

const apiPort = process.env.PORT ?? '4300'

export default defineConfig({
  plugins: [vue()],
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
