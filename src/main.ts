import '@fontsource/lato/400.css'
import '@fontsource/lato/700.css'
import 'primeicons/primeicons.css'
import './theme/base.css'
import { createApp } from 'vue'
import { createPinia } from 'pinia'
import PrimeVue from 'primevue/config'
import ToastService from 'primevue/toastservice'
import ConfirmationService from 'primevue/confirmationservice'
import App from './App.vue'
import { router } from './router'
import { QuellPreset } from './theme/preset'

createApp(App)
  .use(createPinia())
  .use(router)
  .use(PrimeVue, { theme: { preset: QuellPreset, options: { darkModeSelector: false } } })
  .use(ToastService)
  .use(ConfirmationService)
  .mount('#app')

// A page restored from the back-forward cache could show data of a user who has signed out
// since; load it afresh so the session is checked again.
window.addEventListener('pageshow', (e) => {
  if (e.persisted) window.location.reload()
})
