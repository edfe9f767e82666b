import "server-only";

/** The header that carries one request's id from the proxy (or a load balancer) to every log line. */
export const REQUEST_ID_HEADER = "x-request-id";

// Ids from outside are kept only when short and plain, so they cannot forge or break a log line.
const ACCEPTABLE_ID = /^[A-Za-z0-9._:-]{8,128}$/;

/** The id a proxy in front of us set, or a new one. */
export function requestIdFrom(headers: Headers): string {
  const given = headers.get(REQUEST_ID_HEADER);
  return given && ACCEPTABLE_ID.test(given) ? given : crypto.randomUUID();
}
