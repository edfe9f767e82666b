import "server-only";
import { env } from "@/lib/server/env";
import { clientAddressFrom } from "@/lib/shared/client-address";

type HeaderBag = Headers | Record<string, string | string[] | undefined> | undefined;

/** The caller's address for throttles and the audit log, never the left-most (client-written) entry. */
export function clientAddress(headers: HeaderBag): string {
  const raw = headers instanceof Headers ? headers.get("x-forwarded-for") : headers?.["x-forwarded-for"];
  const value = Array.isArray(raw) ? raw.join(",") : raw;
  return clientAddressFrom(value, env().TRUSTED_PROXY_HOPS);
}
