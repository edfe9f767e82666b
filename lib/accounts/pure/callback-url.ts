/**
 * Where to go after signing in: only a path on our own origin (ASVS v5.0.0 3.7.2, no open
 * redirect). The value is resolved the way a browser would (`new URL(value, appUrl)`), so a
 * backslash, a tab, an encoded slash or `//host` that a browser reads as another host is caught
 * by comparing origins, not by looking at the first characters. Anything else becomes "/".
 */
export function safeCallbackUrl(value: unknown, appUrl: string): string {
  const raw = Array.isArray(value) ? value[0] : value;
  if (typeof raw !== "string" || raw.length === 0 || raw.length > 2000) return "/";
  const base = new URL(appUrl);
  let resolved: URL;
  try {
    resolved = new URL(raw, base);
  } catch {
    return "/";
  }
  if (resolved.origin !== base.origin) return "/";
  // Our own absolute URL is fine; hand back only its path so a later check sees a plain path.
  const path = `${resolved.pathname}${resolved.search}${resolved.hash}`;
  return path.startsWith("/") && !path.startsWith("//") ? path : "/";
}
