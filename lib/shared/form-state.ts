/**
 * What every form's server action returns to `useActionState`; `status` is the HTTP status a
 * route would have answered. Actions build it with `formError` (lib/server/form-error.ts).
 */
export type FormState = { ok: boolean; status?: number; message?: string; fieldErrors?: Record<string, string>; values?: Record<string, string> };
export const initialFormState: FormState = { ok: false };
