import { registerSW } from 'virtual:pwa-register'

let registered = false

/**
 * Caches the app shell in a service worker (see vite.config.ts) so the sizing workspace opens on
 * site without signal after one online visit. Called where it matters, the workspace, so office
 * screens do not download the whole client for nothing. Under `vite dev` the plugin's register
 * module does nothing, so no check of the mode is needed (a build made with NODE_ENV=test, as the
 * browser tests do, must register too).
 */
export function keepAppShell() {
  if (registered || !('serviceWorker' in navigator)) return
  registered = true
  registerSW({ immediate: true })
}
