/** Runs once when a server process starts (Next.js instrumentation hook); Node-only checks live apart. */
export async function register() {
  if (process.env.NEXT_RUNTIME === "nodejs") await import("@/lib/server/startup-check");
}
