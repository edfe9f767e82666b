import { ZodError } from "zod";
import { AppError } from "@/lib/errors";

/** What every form's server action returns to `useActionState`. */
export type FormState = { ok: boolean; message?: string; fieldErrors?: Record<string, string> };
export const initialFormState: FormState = { ok: false };

/** Turns a refusal into per-field messages; anything unexpected becomes a generic message. */
export function formError(error: unknown): FormState {
  if (error instanceof AppError) {
    return { ok: false, message: error.message, fieldErrors: error.field ? { [error.field]: error.message } : undefined };
  }
  if (error instanceof ZodError) {
    const fieldErrors: Record<string, string> = {};
    for (const issue of error.issues) fieldErrors[issue.path.join(".") || "form"] ??= issue.message;
    return { ok: false, message: "Check the highlighted fields.", fieldErrors };
  }
  console.error("[action] unexpected error:", error);
  return { ok: false, message: "Something went wrong on our side. Nothing was saved." };
}
