/**
 * The client's address from an X-Forwarded-For chain whose right-most entry is the socket peer
 * (scripts/serve.mjs appends it). Every entry left of the trusted hops was written by someone we
 * do not trust, so the answer is the right-most entry past `trustedHops` proxies (ASVS v5.0.0
 * 6.1.1: throttles keyed on an address the client cannot choose). With 0 hops it is the peer.
 */
export function clientAddressFrom(forwardedFor: string | null | undefined, trustedHops: number): string {
  const chain = (forwardedFor ?? "")
    .split(",")
    .map((entry) => entry.trim())
    .filter(Boolean);
  if (chain.length === 0) return "unknown";
  const index = Math.max(0, chain.length - 1 - Math.max(0, Math.floor(trustedHops)));
  return chain[index].slice(0, 64);
}
