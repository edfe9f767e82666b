import { afterAll, beforeAll, describe, expect, it, vi } from "vitest";
import { Op } from "sequelize";
import { loadActor } from "@/lib/server/auth/actor";
import { hashToken, newToken } from "@/lib/server/auth/tokens";
import { initialFormState, type FormState } from "@/lib/shared/form-state";
import { sendNotice } from "@/lib/notices/send-notice";
import { saveSubscription } from "@/lib/notices/subscriptions";
import { AuditEvent, Invitation, Notice, NoticeDelivery, Park, ParkMembership, ParkState, Subscription, User, sequelize } from "@/models";
import { serverActions } from "../../inventory";
import { addStaff, createPark, createUser, uniqueEmail } from "../helpers";

/**
 * Server actions × callers (OWASP ASVS v5.0.0 8.2.1, 8.2.2). Each exported action of every
 * 'use server' file is called as it is, with the real database and permission checks; only the
 * session lookup is replaced, by the Actor loaded from the database for each caller (as getActor does
 * after next-auth has read the cookie). A refused call must change nothing in the database.
 */
const session = vi.hoisted(() => ({ userId: null as string | null }));
vi.mock("@/lib/server/auth/actor", async (importOriginal) => {
  const actual = await importOriginal<typeof import("@/lib/server/auth/actor")>();
  return { ...actual, getActor: async () => (session.userId ? actual.loadActor(session.userId) : null) };
});
vi.mock("next/cache", () => ({ revalidatePath: vi.fn(), revalidateTag: vi.fn() }));
// The request's headers (the sign-up throttle reads the caller's address): a new documentation-range address per call.
vi.mock("next/headers", () => ({ headers: async () => new Headers({ "x-forwarded-for": `192.0.2.${Math.floor(Math.random() * 254) + 1}` }) }));
// Next's redirect() ends an action by throwing; so does this stand-in, with the target.
class Redirected extends Error {}
vi.mock("next/navigation", () => ({ redirect: (url: string) => { throw new Redirected(url); } }));

const actions = {
  ...(await import("@/lib/accounts/actions")),
  ...(await import("@/lib/conditions/actions")),
  ...(await import("@/lib/notices/notice-actions")),
  ...(await import("@/lib/accounts/units-actions")),
  ...(await import("@/lib/notices/subscription-actions")),
  ...(await import("@/lib/reach/embed-actions")),
};
type ActionName = keyof typeof actions;

const CALLERS = ["anonymous", "rider", "otherRider", "parkRanger", "otherParkRanger", "manager", "admin"] as const;
type Caller = (typeof CALLERS)[number];
/** "ok" is a success state or a redirect to the next page; a number is the refusal's status. */
type Outcome = "ok" | number;
type World = { park: Park; otherPark: Park; users: Record<Exclude<Caller, "anonymous">, string>; noticeId: string };
type Row = { action: ActionName; variant?: string; expect: Record<Caller, Outcome>; form: (w: World, caller: Caller) => Promise<Record<string, string | string[]>> };

const everyone = (o: Outcome) => Object.fromEntries(CALLERS.map((c) => [c, o])) as Record<Caller, Outcome>;
const signedIn = (): Record<Caller, Outcome> => ({ ...everyone("ok"), anonymous: 401 });
const parkStaff = (): Record<Caller, Outcome> => ({ anonymous: 401, rider: 403, otherRider: 403, parkRanger: "ok", otherParkRanger: 403, manager: "ok", admin: "ok" });
const PASSWORD = "switchback-dawn-patrol-8";

async function openInvitation(w: World): Promise<string> {
  const token = newToken();
  await Invitation.create({ parkId: w.park.id, email: uniqueEmail("invited"), role: "ranger", tokenHash: hashToken(token), invitedBy: w.users.manager, expiresAt: new Date(Date.now() + 86_400_000), acceptedAt: null });
  return token;
}

const ROWS: Row[] = [
  { action: "signUpAction", expect: everyone("ok"), form: async () => ({ name: "Action Newcomer", email: uniqueEmail("signup"), password: PASSWORD }) },
  { action: "acceptInvitationAction", expect: everyone("ok"), form: async (w) => ({ token: await openInvitation(w), name: "Invited Ranger", password: PASSWORD }) },
  { action: "acceptInvitationAction", variant: "forged token", expect: everyone(400), form: async () => ({ token: newToken(), name: "Nobody", password: PASSWORD }) },
  { action: "inviteStaffAction", expect: { ...parkStaff(), parkRanger: 403 }, form: async (w) => ({ parkSlug: w.park.slug, email: uniqueEmail("invitee"), role: "ranger" }) },
  { action: "saveEmbedOriginsAction", expect: { ...parkStaff(), parkRanger: 403 }, form: async (w) => ({ parkSlug: w.park.slug, origins: "https://www.pine-hollow.example" }) },
  { action: "setParkStateAction", expect: parkStaff(), form: async (w) => ({ parkSlug: w.park.slug, state: "advisory", message: "Action matrix check", until: "" }) },
  { action: "clearParkStateAction", expect: parkStaff(), form: async (w) => ({ parkSlug: w.park.slug }) },
  { action: "noticeFormAction", variant: "preview", expect: parkStaff(), form: async (w) => ({ parkSlug: w.park.slug, kind: "advisory", scope: "park", message: "Action matrix check", intent: "preview" }) },
  { action: "noticeFormAction", variant: "send", expect: parkStaff(), form: async (w) => ({ parkSlug: w.park.slug, kind: "advisory", scope: "park", message: "Action matrix check", intent: "send" }) },
  { action: "retryFailedAction", expect: parkStaff(), form: async (w) => ({ noticeId: w.noticeId, parkSlug: w.park.slug }) },
  { action: "updateUnitsAction", expect: signedIn(), form: async () => ({ pressure: "bar", mass: "lb", distance: "imperial" }) },
  { action: "saveSubscriptionAction", expect: signedIn(), form: async (w) => ({ parkSlug: w.park.slug, scope: "park", kinds: ["closure", "advisory"] }) },
  {
    action: "removeSubscriptionAction",
    // Someone else's subscription reads like a missing one.
    expect: { ...everyone(404), anonymous: 401, rider: "ok" },
    form: async (w) => {
      const rider = await loadActor(w.users.rider);
      const { subscription } = await saveSubscription(rider, { parkSlug: w.otherPark.slug, kinds: ["closure"] });
      return { subscriptionId: subscription.id };
    },
  },
];

function formData(fields: Record<string, string | string[]>): FormData {
  const form = new FormData();
  for (const [key, value] of Object.entries(fields)) for (const v of [value].flat()) form.append(key, v);
  return form;
}

async function outcome(name: ActionName, form: FormData): Promise<{ outcome: Outcome; state?: FormState }> {
  const action = actions[name] as (prev: FormState, form: FormData) => Promise<FormState>;
  try {
    const state = await action(initialFormState, form);
    return { outcome: state.ok ? "ok" : (state.status ?? 500), state };
  } catch (error) {
    if (error instanceof Redirected) return { outcome: "ok" };
    throw error;
  }
}

/** What any of these actions could change: rows, open park states, delivery states, units, subscription edits. */
async function databaseState(w: World) {
  const count = async (model: { count: (o?: object) => Promise<number> }, where = {}) => model.count({ where });
  return {
    users: await count(User),
    memberships: await count(ParkMembership),
    invitations: await count(Invitation),
    accepted: await count(Invitation, { acceptedAt: { [Op.ne]: null } }),
    audit: await count(AuditEvent),
    notices: await count(Notice),
    openStates: await count(ParkState, { clearedAt: null }),
    queued: await count(NoticeDelivery, { state: "queued" }),
    subscriptions: (await Subscription.findAll({ attributes: ["id", "kinds", "updatedAt"], order: [["id", "ASC"]] })).map((s) => JSON.stringify(s.toJSON())),
    embedOrigins: (await Park.findAll({ where: { id: [w.park.id, w.otherPark.id] }, attributes: ["id", "embedOrigins"], order: [["id", "ASC"]] })).map((p) => JSON.stringify(p.embedOrigins)),
    units: (await User.findAll({ where: { id: Object.values(w.users) }, attributes: ["id", "units"], order: [["id", "ASC"]] })).map((u) => JSON.stringify(u.units)),
  };
}

let world: World;
beforeAll(async () => {
  const park = await createPark();
  const otherPark = await createPark();
  const user = async (role: "rider" | "admin" = "rider") => (await createUser({ role })).id;
  const users = { rider: await user(), otherRider: await user(), parkRanger: await user(), otherParkRanger: await user(), manager: await user(), admin: await user("admin") };
  await addStaff(park.id, users.parkRanger, "ranger");
  await addStaff(park.id, users.manager, "manager");
  await addStaff(otherPark.id, users.otherParkRanger, "ranger");
  const notice = await sendNotice(await loadActor(users.manager), park.id, { kind: "advisory", message: "A notice to retry" });
  world = { park, otherPark, users, noticeId: notice.id };
});

afterAll(async () => {
  session.userId = null;
  if (world) await Park.destroy({ where: { id: [world.park.id, world.otherPark.id] } });
  await sequelize.close();
});

describe("server actions × callers", () => {
  it("has a row for every exported action of every 'use server' file, and none for an action that is gone", () => {
    const inSource = serverActions().map((a) => a.name);
    const inMatrix = new Set(ROWS.map((r) => r.action));
    expect(inSource.length).toBeGreaterThanOrEqual(10);
    expect(inSource.filter((name) => !inMatrix.has(name as ActionName))).toEqual([]);
    expect([...inMatrix].filter((name) => !inSource.includes(name))).toEqual([]);
    expect(Object.keys(actions).sort()).toEqual([...inSource].sort());
  });

  it("every action answers each caller as the matrix says, and a refused call writes nothing", async () => {
    const mismatches: string[] = [];
    for (const row of ROWS) {
      for (const caller of CALLERS) {
        const form = formData(await row.form(world, caller));
        session.userId = caller === "anonymous" ? null : world.users[caller];
        const before = await databaseState(world);
        const result = await outcome(row.action, form);
        const after = await databaseState(world);
        session.userId = null;
        const name = `${row.action}${row.variant ? ` (${row.variant})` : ""} as ${caller}`;
        if (result.outcome !== row.expect[caller]) mismatches.push(`${name}: expected ${row.expect[caller]}, got ${result.outcome} ${result.state?.message ?? ""}`);
        if (result.outcome !== "ok" && JSON.stringify(after) !== JSON.stringify(before)) mismatches.push(`${name}: refused, yet the database changed`);
      }
    }
    expect(mismatches).toEqual([]);
  });
});
