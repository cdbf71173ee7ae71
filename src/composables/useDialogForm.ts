import { ref, watch, type Ref } from 'vue'
import type { ZodType } from 'zod'
import { provideFormErrors } from '@/forms/form-errors'
import { useAction, type ActionOptions } from './useAction'

export interface DialogFormOptions<F, B> {
  /** the dialog's visibility: each time it opens the form starts from `fill()` */
  visible: Ref<boolean>
  /** the values the form starts from (a blank record or a copy of the one being changed) */
  fill: () => F
  /** the shared schema the request body must pass before it is sent */
  schema: ZodType<B>
  /** the request body from the form's values; the form itself when left out */
  body?: (form: F) => unknown
  /** sends the checked body */
  submit: (body: B) => Promise<void>
  /** names of fields for the error summary, by path */
  labels?: Record<string, string>
  failure?: ActionOptions['failure']
}

/** A dialog's visibility and what submitting its form runs, as BaseFormDialog takes them. */
export interface DialogBinding {
  visible: Ref<boolean>
  show: (open: boolean) => unknown
  action: { run: () => unknown; error: Ref<string>; pending: Ref<boolean> }
}

/**
 * A form in a dialog: fresh values and no old messages each time it opens, the shared schema
 * checked before anything is sent, and a 400's messages put beside the fields.
 */
export function useDialogForm<F, B>(options: DialogFormOptions<F, B>) {
  const errors = provideFormErrors(options.labels)
  const form = ref(options.fill()) as Ref<F>
  watch(options.visible, (open) => {
    if (!open) return
    form.value = options.fill()
    errors.clear()
  })
  const save = useAction(
    async () => {
      errors.clear()
      const body = options.body ? options.body(form.value) : form.value
      if (!errors.check(options.schema, body)) return
      await options.submit(body)
    },
    { form: errors, failure: options.failure },
  )
  /** what BaseFormDialog shows and runs */
  const dialog: DialogBinding = {
    visible: options.visible,
    show: (open: boolean) => (options.visible.value = open),
    action: save,
  }
  return { form, errors, save, dialog }
}
