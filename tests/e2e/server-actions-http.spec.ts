import { readFileSync } from "node:fs";
import { expect, test, type APIRequestContext } from "@playwright/test";
import { callerContext } from "./api-callers";

/**
 * Server actions are reachable by a direct POST (a `Next-Action` header and the action's id), and
 * proxy.ts only looks for a session cookie's presence. This posts to each action the way an
 * attacker could, with a junk session cookie past the proxy, and checks that the action itself
 * refuses. Who may call each action, caller by caller, is proven in
 * tests/integration/proof/server-actions-matrix.test.ts; this file proves the same checks hold
 * over HTTP. It depends on two framework details, named here so they are easy to update:
 * the build's server-reference manifest (action id → exported name and page) and React's
 * reply encoding for `(prevState, formData)` (field "0" holds the arguments, "$K1" the form,
 * whose fields are sent first, as "_1_<name>").
 */
type ManifestEntry = { exportedName: string; workers: Record<string, unknown> };
const manifest = () => JSON.parse(readFileSync(".next/server/server-reference-manifest.json", "utf8")).node as Record<string, ManifestEntry>;

const SOME_ID = "00000000-0000-4000-8000-000000000000";
/** "app/(staff)/staff/[parkSlug]/morning-check/page" → "/staff/harrow-ridge/morning-check". */
const pagePath = (worker: string) =>
  worker.replace(/^app/, "").replace(/\/page$/, "").replace(/\/\([^)]+\)/g, "").replace("[parkSlug]", "harrow-ridge").replace("[noticeId]", SOME_ID).replace("[token]", "x") || "/";

/** Fields each action reads, valid enough to reach its permission check. */
const FIELDS: Record<string, Record<string, string>> = {
  inviteStaffAction: { parkSlug: "harrow-ridge", email: "someone@tests.loamcast.test", role: "manager" },
  saveEmbedOriginsAction: { parkSlug: "harrow-ridge", origins: "https://forged.example" },
  setParkStateAction: { parkSlug: "harrow-ridge", state: "closed", message: "Closed by a forged request", until: "" },
  clearParkStateAction: { parkSlug: "harrow-ridge" },
  noticeFormAction: { parkSlug: "harrow-ridge", kind: "closure", scope: "park", message: "Forged closure", intent: "send" },
  retryFailedAction: { noticeId: SOME_ID, parkSlug: "harrow-ridge" },
  updateUnitsAction: { pressure: "bar", mass: "lb", distance: "imperial" },
  saveSubscriptionAction: { parkSlug: "harrow-ridge", scope: "park", kinds: "closure" },
  removeSubscriptionAction: { subscriptionId: SOME_ID },
};
/** What a caller with no account gets from each action; the two public ones (sign-up, accepting an invitation) are left out. */
const ANONYMOUS: Record<string, number | "public"> = {
  signUpAction: "public",
  acceptInvitationAction: "public",
  inviteStaffAction: 401,
  saveEmbedOriginsAction: 401,
  setParkStateAction: 401,
  clearParkStateAction: 401,
  noticeFormAction: 401,
  retryFailedAction: 404, // the notice is looked up first; an unknown one is "not found" to everyone
  updateUnitsAction: 401,
  saveSubscriptionAction: 401,
  removeSubscriptionAction: 401,
};

async function postAction(context: APIRequestContext, id: string, page: string, fields: Record<string, string>, cookie?: string, extraHeaders: Record<string, string> = {}) {
  // The form's fields first and the arguments last, in the order React's client sends them: the
  // server resolves "$K1" when it reads field "0" and takes the fields that arrived before it.
  const multipart = new FormData();
  for (const [name, value] of Object.entries(fields)) multipart.append(`_1_${name}`, value);
  multipart.append("0", JSON.stringify([{ ok: false }, "$K1"]));
  const response = await context.post(page, { multipart, headers: { "Next-Action": id, Accept: "text/x-component", ...(cookie ? { cookie } : {}), ...extraHeaders }, maxRedirects: 0 });
  const text = await response.text();
  // The flight response holds the action's return value as one JSON line ("1:{...}").
  for (const line of text.split("\n")) {
    const json = /^[0-9a-f]+:(\{.*\})$/.exec(line)?.[1];
    const state = json ? (JSON.parse(json) as { ok?: boolean; status?: number }) : null;
    if (state && "ok" in state) return { http: response.status(), state };
  }
  return { http: response.status(), state: null, text: text.slice(0, 200) };
}

test("every server action refuses a direct POST from a caller with a junk session cookie", async ({ baseURL }) => {
  const context = await callerContext(baseURL!, "anonymous");
  const entries = Object.entries(manifest());
  expect(entries.map(([, e]) => e.exportedName).sort()).toEqual(Object.keys(ANONYMOUS).sort());
  const boardBefore = await (await context.get("/api/parks/harrow-ridge/board")).json();
  for (const [id, entry] of entries) {
    const expected = ANONYMOUS[entry.exportedName];
    if (expected === "public") continue;
    const page = pagePath(Object.keys(entry.workers)[0]);
    const result = await postAction(context, id, page, FIELDS[entry.exportedName], "next-auth.session-token=not-a-real-session");
    expect(result.state, `${entry.exportedName} at ${page}: ${JSON.stringify(result)}`).toMatchObject({ ok: false, status: expected });
  }
  const boardAfter = await (await context.get("/api/parks/harrow-ridge/board")).json();
  expect(boardAfter.parkState).toEqual(boardBefore.parkState);
  await context.dispose();
});

test("a rider posting the staff's park-state action directly is refused, and the board is unchanged", async ({ baseURL }) => {
  const rider = await callerContext(baseURL!, "rider");
  const [id] = Object.entries(manifest()).find(([, e]) => e.exportedName === "setParkStateAction")!;
  const parkState = async () => (await (await rider.get("/api/parks/harrow-ridge/board")).json()).parkState;
  const before = await parkState();
  const result = await postAction(rider, id, "/staff/harrow-ridge/morning-check", FIELDS.setParkStateAction);
  expect(result.state).toMatchObject({ ok: false, status: 403 });
  expect(await parkState()).toEqual(before);
  // The same request shape works for an action the rider may use, so the refusal above is the check, not the encoding.
  const [unitsId] = Object.entries(manifest()).find(([, e]) => e.exportedName === "updateUnitsAction")!;
  expect((await postAction(rider, unitsId, "/me", { pressure: "psi", mass: "kg", distance: "metric" })).state).toMatchObject({ ok: true });
  await rider.dispose();
});

// OWASP ASVS v5.0.0 3.5.1–3.5.3 (cross-site request forgery): a server action posted with a
// foreign Origin is refused with 403 by proxy.ts before it runs. Next.js 16 would abort it too,
// but answer 500 (action-handler.js); the proxy makes the answer say what happened.
test("a server action posted with a foreign Origin gets 403 and changes nothing; our own Origin works", async ({ baseURL }) => {
  const rider = await callerContext(baseURL!, "rider");
  const [id] = Object.entries(manifest()).find(([, e]) => e.exportedName === "updateUnitsAction")!;
  const units = async () => ((await (await rider.get("/api/me/export")).json()) as { account: { units: unknown } }).account.units;
  const before = JSON.stringify(await units());
  expect(before).toContain("psi");
  const forged = await postAction(rider, id, "/me", { pressure: "bar", mass: "lb", distance: "imperial" }, undefined, { Origin: "https://forged.example" });
  expect(forged.http).toBe(403);
  expect(forged.state).toBeNull();
  // A form posted without JavaScript carries no Next-Action header: refused the same way.
  const plain = await rider.post("/me", { form: { pressure: "bar" }, headers: { Origin: "https://forged.example" }, maxRedirects: 0 });
  expect(plain.status()).toBe(403);
  expect(JSON.stringify(await units())).toBe(before);
  const own = await postAction(rider, id, "/me", { pressure: "psi", mass: "kg", distance: "metric" }, undefined, { Origin: new URL(baseURL!).origin });
  expect(own.state).toMatchObject({ ok: true });
  await rider.dispose();
});
