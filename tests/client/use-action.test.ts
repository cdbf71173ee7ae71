import { describe, expect, it, vi } from 'vitest'
import { defineComponent, h } from 'vue'
import { mount } from '@vue/test-utils'
import { createPinia } from 'pinia'
import { createMemoryHistory, createRouter } from 'vue-router'
import PrimeVue from 'primevue/config'
import ToastService from 'primevue/toastservice'
import { ApiError } from '../../src/api/client'
import { useAction, useLoad } from '../../src/composables/useAction'
import { provideFormErrors, type FormErrors } from '../../src/forms/form-errors'

/** Runs `setup` inside a component with the app's plugins and hands back what it returns. */
function withApp<T>(setup: () => T) {
  let out: T | undefined
  const router = createRouter({
    history: createMemoryHistory(),
    routes: [
      { path: '/', component: { render: () => null } },
      { path: '/sign-in', name: 'sign-in', component: { render: () => null } },
    ],
  })
  mount(
    defineComponent({
      setup() {
        out = setup()
        return () => h('div')
      },
    }),
    { global: { plugins: [createPinia(), router, PrimeVue, ToastService] } },
  )
  return { value: out as T, router }
}

describe('the one way to run what a button asks the server for', () => {
  it('sends one request for a double tap and is pending until it answers', async () => {
    let calls = 0
    let release = () => {}
    const { value: action } = withApp(() =>
      useAction(async () => {
        calls++
        await new Promise<void>((r) => (release = r))
        return 'saved'
      }),
    )
    const first = action.run()
    const second = action.run()
    expect(action.pending.value).toBe(true)
    release()
    expect(await first).toBe('saved')
    expect(await second).toBeUndefined()
    expect(calls).toBe(1)
    expect(action.pending.value).toBe(false)
  })

  it('puts a 400 beside its fields in people’s words, without the raw path', async () => {
    let form: FormErrors | undefined
    const { value: action } = withApp(() => {
      form = provideFormErrors()
      return useAction(
        async () => {
          throw new ApiError(400, 'invalid-input', 'Email: not an e-mail address', [
            { path: 'body.email', message: 'Invalid email address' },
          ])
        },
        { form },
      )
    })
    await action.run()
    expect(form!.errors.value).toEqual({ email: 'not an e-mail address' })
    expect(action.error.value).toBe('Check the values marked in red.')
  })

  it('goes to the sign-in page, and back afterwards, when the session has lapsed', async () => {
    const { value: action, router } = withApp(() =>
      useAction(async () => {
        throw new ApiError(401, 'not-signed-in', 'Sign in to continue.')
      }),
    )
    await router.push('/?x=1')
    await action.run()
    expect(router.currentRoute.value.name).toBe('sign-in')
    expect(router.currentRoute.value.query.next).toBe('/?x=1')
  })

  it('keeps only the latest answer when a list is reloaded while an earlier load is running', async () => {
    const answers: ((v: string) => void)[] = []
    const { value: load } = withApp(() =>
      useAction(() => new Promise<string>((r) => answers.push(r)), { latest: true }),
    )
    const older = load.run()
    const newer = load.run()
    expect(answers).toHaveLength(2)
    answers[1]!('sites matching "bridge"')
    answers[0]!('all sites')
    expect(await newer).toBe('sites matching "bridge"')
    expect(await older).toBeUndefined()
    expect(load.pending.value).toBe(false)
  })

  it('shows a failed load as an error instead of an empty list', async () => {
    const { value: load } = withApp(() =>
      useLoad(
        async (): Promise<string[]> => {
          throw new ApiError(503, 'database-unavailable', 'The database is not answering.')
        },
        ['kept from before'],
        'Could not load sites',
      ),
    )
    await load.load()
    expect(load.data.value).toEqual(['kept from before'])
    expect(load.error.value).toBe('The database is not answering.')
  })

  it('stays pending for the settle time after an answer, so a double tap moves once', async () => {
    vi.useFakeTimers()
    try {
      let calls = 0
      const { value: move } = withApp(() => useAction(async () => void calls++, { settleMs: 600 }))
      await move.run()
      await move.run()
      expect(calls).toBe(1)
      await vi.advanceTimersByTimeAsync(600)
      await move.run()
      expect(calls).toBe(2)
    } finally {
      vi.useRealTimers()
    }
  })
})
