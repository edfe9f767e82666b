/**
 * Where to go after signing in: only a path on our own origin (ASVS v5.0.0 3.7.2, no open
 * redirect). The value is resolved the way a browser would (`new URL(value, appUrl)`), so a
 * backslash, a tab, an encoded slash or `//host` that a browser reads as another host is caught
 * by comparing origins, not by looking at the first characters.
 */
export function sameOriginPath(value: unknown, appUrl: string): string | null {
  const raw = Array.isArray(value) ? value[0] : value;
  if (typeof raw !== "string" || raw.length === 0 || raw.length > 2000) return null;
  // A path of ours, or an absolute http(s) URL (checked below); "%ZZ" or "trails" is neither.
  if (!raw.startsWith("/") && !/^https?:\/\//i.test(raw)) return null;
  const base = new URL(appUrl);
  let resolved: URL;
  try {
    resolved = new URL(raw, base);
  } catch {
    return null;
  }
  if (resolved.origin !== base.origin) return null;
  // Our own absolute URL is fine; hand back only its path so a later check sees a plain path.
  const path = `${resolved.pathname}${resolved.search}${resolved.hash}`;
  return path.startsWith("/") && !path.startsWith("//") ? path : null;
}

/** The same-origin path, or "/" for anything else. */
export const safeCallbackUrl = (value: unknown, appUrl: string): string => sameOriginPath(value, appUrl) ?? "/";
