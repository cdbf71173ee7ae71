import { registerSW } from 'virtual:pwa-register'

let registered = false

/**
 * Caches the app shell in a service worker (see vite.config.ts) so the sizing workspace opens on
 * site without signal after one online visit. Called where it matters, the workspace, so office
 * screens do not download the whole client for nothing. Production builds only.
 */
export function keepAppShell() {
  if (registered || !import.meta.env.PROD || !('serviceWorker' in navigator)) return
  registered = true
  registerSW({ immediate: true })
}
