import { existsSync, mkdirSync } from "node:fs";
import { request, type APIRequestContext } from "@playwright/test";
import { DEMO_PASSWORD } from "./helpers";

/**
 * The callers of the authorization matrix, each an API request context signed in through
 * next-auth's own credentials endpoint (CSRF token first, as a browser would). The session
 * cookies are saved per caller and reused by later specs while they still work.
 */
export const CALLERS = ["anonymous", "rider", "otherRider", "parkRanger", "otherParkRanger", "manager", "admin"] as const;
export type Caller = (typeof CALLERS)[number];

export const CALLER_EMAIL: Record<Exclude<Caller, "anonymous">, string> = {
  rider: "rider@demo.loamcast.test",
  otherRider: "rider2@demo.loamcast.test",
  parkRanger: "ranger@demo.loamcast.test",
  otherParkRanger: "ranger@cinder.loamcast.test",
  manager: "manager@demo.loamcast.test",
  admin: "admin@demo.loamcast.test",
};

const STATE_DIR = ".local/test-results/auth-state";

async function sessionEmail(context: APIRequestContext): Promise<string | null> {
  const response = await context.get("/api/auth/session");
  if (!response.ok()) return null;
  const session = (await response.json()) as { user?: { email?: string } };
  return session.user?.email ?? null;
}

/** Signs in with e-mail and password through /api/auth/callback/credentials; throws if it did not work. */
export async function signInContext(baseURL: string, email: string, password = DEMO_PASSWORD): Promise<APIRequestContext> {
  const context = await request.newContext({ baseURL });
  const { csrfToken } = (await (await context.get("/api/auth/csrf")).json()) as { csrfToken: string };
  await context.post("/api/auth/callback/credentials", { form: { csrfToken, email, password, json: "true" }, maxRedirects: 0 });
  const signedInAs = await sessionEmail(context);
  if (signedInAs !== email) {
    await context.dispose();
    throw new Error(`Could not sign in as ${email}`);
  }
  return context;
}

/** One caller's context: anonymous (no cookies), or signed in, reusing a saved session when it still works. */
export async function callerContext(baseURL: string, caller: Caller): Promise<APIRequestContext> {
  if (caller === "anonymous") return request.newContext({ baseURL });
  const email = CALLER_EMAIL[caller];
  const file = `${STATE_DIR}/${caller}.json`;
  if (existsSync(file)) {
    const saved = await request.newContext({ baseURL, storageState: file });
    // The cookie must name this account, and the account behind it must still exist (a fresh database has new ids).
    if ((await sessionEmail(saved)) === email && (await saved.get("/api/me/subscriptions")).ok()) return saved;
    await saved.dispose();
  }
  const context = await signInContext(baseURL, email);
  mkdirSync(STATE_DIR, { recursive: true });
  await context.storageState({ path: file });
  return context;
}

export async function allCallers(baseURL: string): Promise<Record<Caller, APIRequestContext>> {
  const entries = [];
  for (const caller of CALLERS) entries.push([caller, await callerContext(baseURL, caller)] as const);
  return Object.fromEntries(entries) as Record<Caller, APIRequestContext>;
}
