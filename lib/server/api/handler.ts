import "server-only";
import { getActor } from "@/lib/server/auth/actor";
import type { Actor } from "@/lib/server/auth/permissions";
import { AppError } from "@/lib/shared/errors";
import { isCrossOriginWrite } from "@/lib/shared/same-origin";
import { env } from "@/lib/server/env";
import { logger, withRequestId } from "@/lib/server/logger";
import { requestIdFrom } from "@/lib/server/request-id";
import { errorResponse } from "@/lib/server/api/errors";
import { recordAudit } from "@/lib/audit/record";

type Context<P> = { params: Promise<P> };
export type HandlerArgs<P> = { request: Request; params: P; actor: Actor | null };

/** Route handlers have no CSRF protection of their own: the shared origin rule (lib/shared/same-origin.ts). */
export function assertSameOrigin(request: Request) {
  if (isCrossOriginWrite(request, env().APP_URL)) throw new AppError(403, "Cross-site request refused.");
}

/**
 * Wraps a route handler: resolves params, loads the caller fresh from the database,
 * checks the origin of state changes and maps every error to the one JSON shape. Every line
 * logged meanwhile carries the request id (the proxy's x-request-id, or a new one).
 */
export function handler<P = Record<string, never>>(fn: (args: HandlerArgs<P>) => Promise<Response>) {
  const run = async (request: Request, context: Context<P>): Promise<Response> => {
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
  return (request: Request, context: Context<P>) => withRequestId(requestIdFrom(request.headers), () => run(request, context));
}

/** A refused authorisation or cross-site request goes to the audit log (ASVS v5.0.0 16.3.2); logging never changes the answer. */
async function recordRefusal(request: Request, actor: Actor | null, reason: string) {
  try {
    const data = { method: request.method, path: new URL(request.url).pathname.slice(0, 200), reason };
    await recordAudit({ parkId: null, actorId: actor?.id ?? null, action: "auth.refused", subjectType: "request", subjectId: null, data });
  } catch (error) {
    logger.error({ err: error }, "audit: refusal not recorded");
  }
}
