import "server-only";
import { ZodError } from "zod";
import { isDatabaseUnavailable } from "@/lib/shared/db-errors";
import { AppError } from "@/lib/shared/errors";
import type { FormState } from "@/lib/shared/form-state";
import { requestLogger } from "./logger";

/**
 * What a server action answers when it refuses or fails: per-field messages for a refusal,
 * a generic message (and a log line with the request id) for anything unexpected.
 */
export async function formError(error: unknown, form?: FormData): Promise<FormState> {
  return { ...(await describeError(error)), values: form ? echoValues(form) : undefined };
}

/** Non-secret fields are sent back so a refused form keeps what the user typed. */
function echoValues(form: FormData): Record<string, string> {
  const values: Record<string, string> = {};
  for (const [key, value] of form.entries()) {
    if (typeof value === "string" && !/password|token|^\$/i.test(key)) values[key] = value.slice(0, 2000);
  }
  return values;
}

async function describeError(error: unknown): Promise<FormState> {
  if (error instanceof AppError) {
    return { ok: false, status: error.status, message: error.message, fieldErrors: error.field ? { [error.field]: error.message } : undefined };
  }
  if (error instanceof ZodError) {
    const fieldErrors: Record<string, string> = {};
    for (const issue of error.issues) fieldErrors[issue.path.join(".") || "form"] ??= issue.message;
    return { ok: false, status: 400, message: "Check the highlighted fields.", fieldErrors };
  }
  const log = await requestLogger();
  if (isDatabaseUnavailable(error)) {
    log.error({ reason: (error as Error).message, source: "action" }, "database unavailable");
    return { ok: false, message: "The service is briefly unavailable. Nothing was saved; try again in a moment." };
  }
  log.error({ err: error, source: "action" }, "unexpected error");
  return { ok: false, status: 500, message: "Something went wrong on our side. Nothing was saved." };
}
