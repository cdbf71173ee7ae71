import { defineStore } from 'pinia'
import { computed, ref } from 'vue'
import type { CurrentUser, Role, SignIn } from '@shared/schemas/auth'
import { authApi } from '@/api/auth'
import { isApiError } from '@/api/client'

/**
 * Who signed in on this device, kept so the app shell opens without signal on site. It is a
 * convenience for the screen only: the server checks the session cookie on every request.
 */
const KNOWN_USER = 'quellnode.user'

function remembered(): CurrentUser | null {
  try {
    const raw = localStorage.getItem(KNOWN_USER)
    return raw ? (JSON.parse(raw) as CurrentUser) : null
  } catch {
    return null
  }
}

function remember(user: CurrentUser | null) {
  try {
    if (user) localStorage.setItem(KNOWN_USER, JSON.stringify(user))
    else localStorage.removeItem(KNOWN_USER)
  } catch {
    // storage blocked: offline opening is not possible, nothing else changes
  }
}

export const useAuthStore = defineStore('auth', () => {
  const user = ref<CurrentUser | null>(null)
  const checked = ref(false)
  const role = computed<Role | null>(() => user.value?.role ?? null)

  function set(u: CurrentUser | null) {
    user.value = u
    remember(u)
  }

  /**
   * Asks the server once per page load whether the cookie still holds a session; without a
   * connection, the user last signed in on this device is assumed until the server answers.
   */
  async function restore() {
    if (checked.value) return
    try {
      set((await authApi.me()).user)
    } catch (e) {
      if (isApiError(e) && e.code === 'offline') user.value = remembered()
      else if (!isApiError(e) || e.status !== 401) throw e
      else set(null)
    } finally {
      checked.value = true
    }
  }

  async function signIn(credentials: SignIn) {
    set((await authApi.signIn(credentials)).user)
    checked.value = true
  }

  /** The session has ended (signed out, or the server no longer knows it). */
  function forget() {
    set(null)
  }

  async function signOut() {
    try {
      await authApi.signOut()
    } finally {
      forget()
    }
  }

  return { user, checked, role, restore, signIn, signOut, forget }
})
