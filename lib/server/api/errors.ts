import "server-only";
import { ZodError } from "zod";
import { isDatabaseUnavailable } from "@/lib/shared/db-errors";
import { AppError } from "@/lib/shared/errors";
import { loggerFor } from "@/lib/server/logger";
import { apiSecurityHeaders } from "@/lib/server/security-headers";

export type ErrorBody = { error: { message: string; field?: string; details?: unknown } };

/**
 * One mapping from anything thrown to one JSON error shape (ASVS 16.5.1: generic text for the unexpected).
 * Routes that skip handler() pass their request, so the log line still carries its id. The API
 * security headers are on every error, for the routes proxy.ts does not run for.
 */
export function errorResponse(error: unknown, request?: Request): Response {
  const response = errorAnswer(error, request);
  for (const [name, value] of Object.entries(apiSecurityHeaders())) if (!response.headers.has(name)) response.headers.set(name, value);
  return response;
}

function errorAnswer(error: unknown, request?: Request): Response {
  if (error instanceof AppError) {
    const body: ErrorBody = { error: { message: error.message, field: error.field, details: error.details } };
    return Response.json(body, { status: error.status });
  }
  if (error instanceof ZodError) {
    const issue = error.issues[0];
    const field = issue?.path.join(".") || undefined;
    return Response.json({ error: { message: issue?.message ?? "Invalid input.", field } } satisfies ErrorBody, { status: 400 });
  }
  if (error instanceof SyntaxError) {
    return Response.json({ error: { message: "The request body is not valid JSON." } } satisfies ErrorBody, { status: 400 });
  }
  if (isDatabaseUnavailable(error)) {
    loggerFor(request).error({ reason: (error as Error).message, source: "api" }, "database unavailable");
    return Response.json({ error: { message: "The service is briefly unavailable. Try again in a moment." } } satisfies ErrorBody, { status: 503, headers: { "retry-after": "5" } });
  }
  loggerFor(request).error({ err: error, source: "api" }, "unexpected error");
  return Response.json({ error: { message: "Something went wrong on our side." } } satisfies ErrorBody, { status: 500 });
}
