import { inject, provide, reactive, type InjectionKey } from 'vue';
import { ApiRequestError } from '../api/client';

/**
 * Field messages from the API's 400/409 answers, ready for a-form-item's
 * validate-status and help; anything without a field becomes the form's own message.
 */
export function useFormErrors() {
  const state = reactive<{ fields: Record<string, string>; message: string | null }>({ fields: {}, message: null });

  function take(error: unknown) {
    state.fields = {};
    state.message = null;
    if (error instanceof ApiRequestError) {
      state.fields = { ...error.fields };
      if (!Object.keys(error.fields).some((k) => k !== '_') || error.status >= 500 || error.status === 0) {
        state.message = error.message;
      }
    } else {
      state.message = 'Something went wrong. Try again.';
    }
  }

  function clear() {
    state.fields = {};
    state.message = null;
  }

  const status = (field: string) => (state.fields[field] ? 'error' : undefined);
  const help = (field: string) => state.fields[field];

  return { state, take, clear, status, help };
}

export type FormErrors = ReturnType<typeof useFormErrors>;
const formErrorsKey: InjectionKey<FormErrors> = Symbol('form-errors');

/** Gives a form's fields (FormField) the errors of the form they sit in. */
export function provideFormErrors(errors: FormErrors): void {
  provide(formErrorsKey, errors);
}

/** The errors of the form this field sits in; a field outside a form shows none. */
export function injectFormErrors(): FormErrors {
  return inject(formErrorsKey, () => useFormErrors(), true);
}
