import { ZodError } from "zod";
import { isDatabaseUnavailable } from "@/lib/shared/db-errors";
import { AppError } from "@/lib/shared/errors";

/** What every form's server action returns to `useActionState`; `status` is the HTTP status a route would have answered. */
export type FormState = { ok: boolean; status?: number; message?: string; fieldErrors?: Record<string, string>; values?: Record<string, string> };
export const initialFormState: FormState = { ok: false };

/** Turns a refusal into per-field messages; anything unexpected becomes a generic message. */
export function formError(error: unknown, form?: FormData): FormState {
  return { ...describeError(error), values: form ? echoValues(form) : undefined };
}

/** Non-secret fields are sent back so a refused form keeps what the user typed. */
function echoValues(form: FormData): Record<string, string> {
  const values: Record<string, string> = {};
  for (const [key, value] of form.entries()) {
    if (typeof value === "string" && !/password|token|^\$/i.test(key)) values[key] = value.slice(0, 2000);
  }
  return values;
}

function describeError(error: unknown): FormState {
  if (error instanceof AppError) {
    return { ok: false, status: error.status, message: error.message, fieldErrors: error.field ? { [error.field]: error.message } : undefined };
  }
  if (error instanceof ZodError) {
    const fieldErrors: Record<string, string> = {};
    for (const issue of error.issues) fieldErrors[issue.path.join(".") || "form"] ??= issue.message;
    return { ok: false, status: 400, message: "Check the highlighted fields.", fieldErrors };
  }
  if (isDatabaseUnavailable(error)) {
    console.error("[action] database unavailable:", (error as Error).message);
    return { ok: false, message: "The service is briefly unavailable. Nothing was saved; try again in a moment." };
  }
  console.error("[action] unexpected error:", error);
  return { ok: false, status: 500, message: "Something went wrong on our side. Nothing was saved." };
}
