import "server-only";
import { getActor } from "@/lib/server/auth/actor";
import type { Actor } from "@/lib/server/auth/permissions";
import { AppError } from "@/lib/shared/errors";
import { env } from "@/lib/server/env";
import { errorResponse } from "./errors";
import { AuditEvent } from "@/models";

type Context<P> = { params: Promise<P> };
export type HandlerArgs<P> = { request: Request; params: P; actor: Actor | null };

const SAFE_METHODS = new Set(["GET", "HEAD", "OPTIONS"]);

/**
 * Route handlers have no CSRF protection of their own (ASVS v5.0.0 3.5.1–3.5.3):
 * a state-changing request from a browser must come from our own origin.
 * Requests without browser headers (scripts, curl) carry no ambient cookies to abuse.
 */
export function assertSameOrigin(request: Request) {
  if (SAFE_METHODS.has(request.method)) return;
  const site = request.headers.get("sec-fetch-site");
  if (site && site !== "same-origin" && site !== "none") throw new AppError(403, "Cross-site request refused.");
  const origin = request.headers.get("origin");
  if (origin) {
    const allowed = new Set([new URL(env().APP_URL).origin, new URL(request.url).origin]);
    const host = request.headers.get("host");
    if (host) allowed.add(`${new URL(request.url).protocol}//${host}`);
    if (!allowed.has(origin)) throw new AppError(403, "Cross-site request refused.");
  }
}

/**
 * Wraps a route handler: resolves params, loads the caller fresh from the database,
 * checks the origin of state changes and maps every error to the one JSON shape.
 */
export function handler<P = Record<string, never>>(fn: (args: HandlerArgs<P>) => Promise<Response>) {
  return async (request: Request, context: Context<P>): Promise<Response> => {
    let actor: Actor | null = null;
    try {
      assertSameOrigin(request);
      const params = context?.params ? await context.params : ({} as P);
      actor = await getActor();
      return await fn({ request, params, actor });
    } catch (error) {
      if (error instanceof AppError && error.status === 403) await recordRefusal(request, actor, error.message);
      return errorResponse(error);
    }
  };
}

/** A refused authorisation or cross-site request goes to the audit log (ASVS v5.0.0 16.3.2); logging never changes the answer. */
async function recordRefusal(request: Request, actor: Actor | null, reason: string) {
  try {
    const data = { method: request.method, path: new URL(request.url).pathname.slice(0, 200), reason };
    await AuditEvent.create({ parkId: null, actorId: actor?.id ?? null, action: "auth.refused", subjectType: "request", subjectId: null, data });
  } catch (error) {
    console.error("[audit] refusal not recorded:", (error as Error).message);
  }
}

/** Reads a JSON body, refusing anything that is not JSON or too large. */
export async function readJson(request: Request, maxBytes = 1_000_000): Promise<unknown> {
  const type = request.headers.get("content-type") ?? "";
  if (!type.includes("application/json")) throw new AppError(415, "Send the body as application/json.");
  const text = await request.text();
  if (text.length > maxBytes) throw new AppError(413, `The body is larger than ${maxBytes} bytes.`);
  let value: unknown;
  try {
    value = JSON.parse(text);
  } catch {
    throw new AppError(400, "The request body is not valid JSON.");
  }
  const where = pathOfNul(value);
  if (where !== null) throw new AppError(400, "Text may not contain the NUL character (\\u0000).", where || undefined);
  return value;
}

/**
 * Where a U+0000 hides in a parsed body (a key or a string), or null. PostgreSQL cannot store it
 * in text or jsonb, so it is refused here for every JSON route at once. Iterative: a deeply
 * nested body cannot exhaust the stack.
 */
function pathOfNul(root: unknown): string | null {
  const stack: { value: unknown; path: string }[] = [{ value: root, path: "" }];
  while (stack.length > 0) {
    const { value, path } = stack.pop()!;
    if (typeof value === "string") {
      if (value.includes("\u0000")) return path;
    } else if (value !== null && typeof value === "object") {
      for (const [key, child] of Object.entries(value)) {
        if (key.includes("\u0000")) return path;
        stack.push({ value: child, path: path ? `${path}.${key}` : key });
      }
    }
  }
  return null;
}
