/**
 * The one error type of Loamcast. Everything the app refuses on purpose is an AppError;
 * route handlers map it to `{"error": {"message", "field"}}` with its HTTP status.
 */
export type ErrorStatus = 400 | 401 | 403 | 404 | 409 | 413 | 415 | 422 | 429 | 503;

export class AppError extends Error {
  readonly status: ErrorStatus;
  readonly field?: string;
  readonly details?: unknown;

  constructor(status: ErrorStatus, message: string, field?: string, details?: unknown) {
    super(message);
    this.name = "AppError";
    this.status = status;
    this.field = field;
    this.details = details;
  }
}

export const notFound = (message = "Not found.") => new AppError(404, message);
export const unauthorized = (message = "Sign in first.") => new AppError(401, message);
export const conflict = (message: string, details?: unknown) => new AppError(409, message, undefined, details);
