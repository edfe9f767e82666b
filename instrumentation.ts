import type { Instrumentation } from "next";

/** Runs once when a server process starts (Next.js instrumentation hook); Node-only checks live apart. */
export async function register() {
  if (process.env.NEXT_RUNTIME === "nodejs") await import("@/lib/server/startup-check");
}

/**
 * Next calls onRequestError for every error it could not answer itself (a page, layout, route
 * handler or server action that threw). One log line each, with the request id the proxy set and
 * the digest the error page shows the visitor, so a report from a rider can be found in the logs.
 */
export const onRequestError: Instrumentation.onRequestError = async (error, request, context) => {
  if (process.env.NEXT_RUNTIME !== "nodejs") return;
  const { logger } = await import("@/lib/server/logger");
  const { REQUEST_ID_HEADER } = await import("@/lib/server/request-id");
  const requestId = request.headers[REQUEST_ID_HEADER];
  logger.error(
    {
      err: error,
      digest: (error as { digest?: string }).digest,
      requestId: typeof requestId === "string" ? requestId : undefined,
      method: request.method,
      path: request.path.split("?")[0],
      route: context.routePath,
      routeType: context.routeType,
    },
    "unhandled error",
  );
};
