import { defineStore } from 'pinia'
import { computed, ref } from 'vue'
import type { CurrentUser, Role, SignIn } from '@shared/schemas/auth'
import { authApi } from '@/api/auth'
import { isApiError } from '@/api/client'

export const useAuthStore = defineStore('auth', () => {
  const user = ref<CurrentUser | null>(null)
  const checked = ref(false)
  const role = computed<Role | null>(() => user.value?.role ?? null)

  /** Asks the server once per page load whether the cookie still holds a session. */
  async function restore() {
    if (checked.value) return
    try {
      user.value = (await authApi.me()).user
    } catch (e) {
      if (!isApiError(e) || e.status !== 401) throw e
      user.value = null
    } finally {
      checked.value = true
    }
  }

  async function signIn(credentials: SignIn) {
    user.value = (await authApi.signIn(credentials)).user
    checked.value = true
  }

  async function signOut() {
    await authApi.signOut()
    user.value = null
  }

  return { user, checked, role, restore, signIn, signOut }
})
