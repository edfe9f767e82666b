import { CALLERS, CALLER_EMAIL, type Caller } from "./api-callers";
import { bikeFields, gpxFile, MatrixFixtures, OTHER_PARK, PARK, setupBody, unique } from "./authorization-matrix-fixtures";
import type { Method } from "../inventory";

/**
 * Every route handler method × every caller, with the answer each must get. Adding a route under
 * app/api means adding its row here: tests/e2e/authorization-matrix.spec.ts reads the routes from
 * app/ and fails for a method without a row (and for a row whose route is gone).
 *
 * "2xx" accepts any success; otherwise the exact status. Rows run in this order, callers in
 * CALLERS order; `call` builds the request for one caller (fresh objects where a call uses one up).
 */
export type Expect = number | "2xx";
export type Expectations = Record<Caller, Expect>;
type FilePart = { name: string; mimeType: string; buffer: Buffer };
export type Call = { path: string; data?: unknown; multipart?: Record<string, string | FilePart>; form?: Record<string, string> };
export type MatrixRow = {
  method: Method;
  route: string;
  variant?: string;
  expect: Expectations;
  call: (fx: MatrixFixtures, caller: Caller) => Call | Promise<Call>;
  /** Keeps what an allowed call created, so it is removed at the end. */
  made?: (fx: MatrixFixtures, caller: Caller, body: any) => void; // eslint-disable-line @typescript-eslint/no-explicit-any
  /** Why this state-changing route does not check the Origin (it is then left out of the cross-site check). */
  crossSiteExempt?: string;
};

const everyone = (status: Expect) => Object.fromEntries(CALLERS.map((c) => [c, status])) as Expectations;
/** Any signed-in caller, on their own things. */
const signedIn = (ok: Expect): Expectations => ({ ...everyone(ok), anonymous: 401 });
/** rider@'s own object: everyone else gets 404, exactly as for a missing id (admins too: it is private). */
const ownerOnly = (ok: Expect): Expectations => ({ ...everyone(404), anonymous: 401, rider: ok });
/** Rangers and managers of the park, and admins. */
const parkStaff = (ok: Expect): Expectations => ({ anonymous: 401, rider: 403, otherRider: 403, parkRanger: ok, otherParkRanger: 403, manager: ok, admin: ok });
const parkManagers = (ok: Expect): Expectations => ({ ...parkStaff(ok), parkRanger: 403 });
const adminOnly = (ok: Expect): Expectations => ({ ...everyone(403), anonymous: 401, admin: ok });
/** An archived trail: its park's staff still see it; to anyone else it does not exist. */
const archivedTrail = (ok: Expect): Expectations => ({ ...everyone(404), parkRanger: ok, manager: ok, admin: ok });

const NOTICE = (fx: MatrixFixtures) => ({ kind: "advisory", trailIds: [fx.trailId], message: "Matrix check: an advisory for the matrix trail." });
const DAY = 86_400_000;
const FORGED_TOKEN = "forged.forged.forged.forged";

export const MATRIX: MatrixRow[] = [
  // Public reads.
  { method: "GET", route: "/api/health", expect: everyone(200), call: () => ({ path: "/api/health" }) },
  { method: "GET", route: "/api/parks", expect: everyone(200), call: () => ({ path: "/api/parks" }) },
  { method: "GET", route: "/api/parks/[parkSlug]", expect: everyone(200), call: () => ({ path: `/api/parks/${PARK}` }) },
  { method: "GET", route: "/api/parks/[parkSlug]/board", expect: everyone(200), call: () => ({ path: `/api/parks/${PARK}/board` }) },
  { method: "GET", route: "/api/parks/[parkSlug]/trails", expect: everyone(200), call: () => ({ path: `/api/parks/${PARK}/trails` }) },
  { method: "GET", route: "/api/parks/[parkSlug]/trails.geojson", expect: everyone(200), call: () => ({ path: `/api/parks/${PARK}/trails.geojson` }) },
  { method: "GET", route: "/api/parks/[parkSlug]/trail-labels.geojson", expect: everyone(200), call: () => ({ path: `/api/parks/${PARK}/trail-labels.geojson` }) },
  { method: "GET", route: "/api/parks/[parkSlug]/features.geojson", expect: everyone(200), call: () => ({ path: `/api/parks/${PARK}/features.geojson` }) },
  { method: "GET", route: "/api/parks/[parkSlug]/hazards.geojson", expect: everyone(200), call: () => ({ path: `/api/parks/${PARK}/hazards.geojson` }) },
  { method: "GET", route: "/api/parks/[parkSlug]/park-layers.geojson", expect: everyone(200), call: () => ({ path: `/api/parks/${PARK}/park-layers.geojson` }) },
  { method: "GET", route: "/api/parks/[parkSlug]/map-style.json", expect: everyone(200), call: () => ({ path: `/api/parks/${PARK}/map-style.json` }) },
  { method: "GET", route: "/embed/parks/[parkSlug]", expect: everyone(200), call: () => ({ path: `/embed/parks/${PARK}` }) },
  { method: "GET", route: "/api/parks/[parkSlug]/preview.png", expect: everyone(200), call: () => ({ path: `/api/parks/${PARK}/preview.png` }) },
  { method: "GET", route: "/parks/[parkSlug]/manifest.webmanifest", expect: everyone(200), call: () => ({ path: `/parks/${PARK}/manifest.webmanifest` }) },
  { method: "GET", route: "/serwist/[path]", expect: everyone(200), call: () => ({ path: "/serwist/sw.js" }) },
  { method: "GET", route: "/api/parks/[parkSlug]/closures.ics", expect: everyone(200), call: () => ({ path: `/api/parks/${PARK}/closures.ics` }) },
  { method: "GET", route: "/api/parks/[parkSlug]/status.json", expect: everyone(200), call: () => ({ path: `/api/parks/${PARK}/status.json` }) },
  {
    method: "OPTIONS",
    route: "/api/parks/[parkSlug]/status.json",
    expect: everyone(204),
    call: () => ({ path: `/api/parks/${PARK}/status.json` }),
    crossSiteExempt: "a CORS preflight for a public read: it changes nothing and answers every origin by design",
  },
  { method: "GET", route: "/api/photos/[id]", expect: everyone(200), call: (fx) => ({ path: `/api/photos/${fx.photoId}?size=thumb` }) },
  { method: "GET", route: "/api/trails/[id]", expect: everyone(200), call: (fx) => ({ path: `/api/trails/${fx.demoTrailId}` }) },
  { method: "GET", route: "/api/trails/[id]", variant: "archived", expect: archivedTrail(200), call: (fx) => ({ path: `/api/trails/${fx.archivedTrailId}` }) },
  { method: "GET", route: "/api/trails/[id]/download", expect: everyone(200), call: (fx) => ({ path: `/api/trails/${fx.demoTrailId}/download?format=gpx` }) },
  { method: "GET", route: "/api/trails/[id]/download", variant: "archived", expect: archivedTrail(200), call: (fx) => ({ path: `/api/trails/${fx.archivedTrailId}/download` }) },
  { method: "GET", route: "/api/trails/[id]/reports", expect: everyone(200), call: (fx) => ({ path: `/api/trails/${fx.demoTrailId}/reports` }) },
  { method: "GET", route: "/api/trails/[id]/reports", variant: "every revision", expect: parkStaff(200), call: (fx) => ({ path: `/api/trails/${fx.demoTrailId}/reports?revisions=all` }) },
  { method: "POST", route: "/api/pressure", expect: everyone(200), call: () => ({ path: "/api/pressure", data: { ...bikeFields, today: { parkSlug: PARK } } }) },
  { method: "POST", route: "/api/pressure", variant: "rider@'s saved setup", expect: ownerOnly(200), call: (fx) => ({ path: "/api/pressure", data: { setupId: fx.setupId } }) },

  // Accounts and next-auth's own endpoints.
  { method: "POST", route: "/api/account", expect: everyone(202), call: (_fx, c) => ({ path: "/api/account", data: { name: "Matrix Newcomer", email: `${unique(`matrix-${c}`)}@tests.loamcast.test`, password: "switchback-dawn-patrol-8" } }) },
  // Links from account mails: a forged token changes nothing, whoever sends it.
  { method: "POST", route: "/api/account/prove-address", variant: "forged token", expect: everyone(400), call: () => ({ path: "/api/account/prove-address", data: { token: FORGED_TOKEN } }) },
  { method: "POST", route: "/api/account/prove-address/resend", expect: everyone(202), call: (_fx, c) => ({ path: "/api/account/prove-address/resend", data: { email: `${unique(`resend-${c}`)}@tests.loamcast.test` } }) },
  { method: "POST", route: "/api/account/password-reset", expect: everyone(202), call: (_fx, c) => ({ path: "/api/account/password-reset", data: { email: `${unique(`reset-${c}`)}@tests.loamcast.test` } }) },
  { method: "POST", route: "/api/account/password-reset/confirm", variant: "forged token", expect: everyone(400), call: () => ({ path: "/api/account/password-reset/confirm", data: { token: FORGED_TOKEN, password: "switchback-dawn-patrol-8" } }) },
  { method: "POST", route: "/api/account/email/confirm", variant: "forged token", expect: everyone(400), call: () => ({ path: "/api/account/email/confirm", data: { token: FORGED_TOKEN } }) },
  // The caller's own account. The demo callers must survive the walk, so each change is sent with a
  // wrong password (400 after the sign-in check); the successes are in tests/e2e/account.spec.ts.
  { method: "GET", route: "/api/me/export", expect: signedIn(200), call: () => ({ path: "/api/me/export" }) },
  { method: "POST", route: "/api/me/password", variant: "wrong current password", expect: signedIn(400), call: () => ({ path: "/api/me/password", data: { currentPassword: "not-the-password", newPassword: "switchback-dawn-patrol-8" } }) },
  { method: "POST", route: "/api/me/email", variant: "wrong password", expect: signedIn(400), call: (_fx, c) => ({ path: "/api/me/email", data: { newEmail: `${unique(`moved-${c}`)}@tests.loamcast.test`, password: "not-the-password" } }) },
  { method: "POST", route: "/api/me/sign-out-everywhere", variant: "wrong password", expect: signedIn(400), call: () => ({ path: "/api/me/sign-out-everywhere", data: { password: "not-the-password" } }) },
  { method: "DELETE", route: "/api/me", variant: "wrong password", expect: signedIn(400), call: () => ({ path: "/api/me", data: { password: "not-the-password" } }) },
  { method: "GET", route: "/api/auth/[...nextauth]", expect: everyone(200), call: () => ({ path: "/api/auth/session" }) },
  {
    method: "POST",
    route: "/api/auth/[...nextauth]",
    variant: "sign-in without the CSRF token",
    expect: everyone(302),
    call: () => ({ path: "/api/auth/callback/credentials", form: { email: CALLER_EMAIL.rider, password: "ridgeline-demo-7" } }),
    crossSiteExempt: "next-auth's endpoints check their own double-submit CSRF token (the row above shows a POST without it refused)",
  },
  { method: "GET", route: "/api/dev/mail", expect: adminOnly(200), call: () => ({ path: "/api/dev/mail" }) },

  // Signed links: the token is the authority, a session adds nothing.
  { method: "GET", route: "/api/subscriptions/confirm", expect: everyone(200), call: (fx) => ({ path: `/api/subscriptions/confirm?token=${encodeURIComponent(fx.confirmToken)}` }) },
  { method: "GET", route: "/api/unsubscribe", variant: "forged token", expect: everyone(400), call: () => ({ path: `/api/unsubscribe?token=${FORGED_TOKEN}` }) },
  {
    method: "POST",
    route: "/api/unsubscribe",
    variant: "forged token",
    expect: everyone(400),
    call: () => ({ path: `/api/unsubscribe?token=${FORGED_TOKEN}`, form: { "List-Unsubscribe": "One-Click" } }),
    crossSiteExempt: "RFC 8058 one-click unsubscribe is posted by mail providers from their own servers; the signed token is the authority",
  },

  // A rider's own things.
  { method: "GET", route: "/api/me/setups", expect: signedIn(200), call: () => ({ path: "/api/me/setups" }) },
  { method: "POST", route: "/api/me/setups", expect: signedIn(201), call: () => ({ path: "/api/me/setups", data: setupBody("Matrix own setup") }), made: (fx, c, body) => fx.trackOwn("setup", c, body.setup.id) },
  { method: "GET", route: "/api/me/setups/[setupId]", expect: ownerOnly(200), call: (fx) => ({ path: `/api/me/setups/${fx.setupId}` }) },
  {
    method: "PATCH",
    route: "/api/me/setups/[setupId]",
    expect: ownerOnly(200),
    call: async (fx) => {
      const setup = await fx.freshSetup();
      return { path: `/api/me/setups/${setup.id}`, data: { lockVersion: setup.lockVersion, name: "Matrix setup, renamed" } };
    },
  },
  { method: "DELETE", route: "/api/me/setups/[setupId]", expect: ownerOnly(204), call: async (fx) => ({ path: `/api/me/setups/${(await fx.freshSetup()).id}` }) },
  { method: "GET", route: "/api/me/ride-logs", expect: signedIn(200), call: () => ({ path: "/api/me/ride-logs" }) },
  { method: "POST", route: "/api/me/ride-logs", expect: ownerOnly(201), call: (fx) => ({ path: "/api/me/ride-logs", data: fx.rideLogBody() }) },
  { method: "POST", route: "/api/me/ride-logs/[rideLogId]/apply", expect: ownerOnly(200), call: async (fx) => ({ path: `/api/me/ride-logs/${await fx.freshRideLog()}/apply` }) },
  { method: "GET", route: "/api/me/subscriptions", expect: signedIn(200), call: () => ({ path: "/api/me/subscriptions" }) },
  {
    method: "POST",
    route: "/api/me/subscriptions",
    expect: signedIn("2xx"),
    call: () => ({ path: "/api/me/subscriptions", data: { parkSlug: OTHER_PARK, trailIds: null, kinds: ["advisory"] } }),
    made: (fx, c, body) => fx.trackOwn("subscription", c, body.subscription.id),
  },
  { method: "DELETE", route: "/api/me/subscriptions/[subscriptionId]", expect: ownerOnly(204), call: async (fx) => ({ path: `/api/me/subscriptions/${await fx.freshSubscription()}` }) },
  { method: "GET", route: "/api/me/push-subscriptions", expect: signedIn(200), call: () => ({ path: "/api/me/push-subscriptions" }) },
  {
    method: "POST",
    route: "/api/me/push-subscriptions",
    expect: signedIn(201),
    call: (fx) => ({ path: "/api/me/push-subscriptions", data: fx.pushSubscriptionBody() }),
    made: (fx, c, body) => fx.trackOwn("pushSubscription", c, body.subscription.id),
  },
  { method: "DELETE", route: "/api/me/push-subscriptions/[pushSubscriptionId]", expect: ownerOnly(204), call: async (fx) => ({ path: `/api/me/push-subscriptions/${await fx.freshPushSubscription()}` }) },

  // Trails: staff of the park write.
  { method: "POST", route: "/api/parks/[parkSlug]/trails/preview", expect: parkStaff(200), call: () => ({ path: `/api/parks/${PARK}/trails/preview`, multipart: { file: gpxFile() } }) },
  {
    method: "POST",
    route: "/api/parks/[parkSlug]/trails",
    expect: parkStaff(201),
    call: (_fx, c) => ({ path: `/api/parks/${PARK}/trails`, multipart: { file: gpxFile(), name: `Matrix upload by ${c}` } }),
    made: (fx, _c, body) => fx.track("trail", body.trail.id),
  },
  {
    method: "PATCH",
    route: "/api/trails/[id]",
    expect: parkStaff(200),
    call: async (fx, c) => ({ path: `/api/trails/${fx.trailId}`, data: { name: `Matrix trail edited by ${c}`, lockVersion: await fx.trailLockVersion() } }),
  },
  { method: "DELETE", route: "/api/trails/[id]", expect: parkStaff(200), call: async (fx) => ({ path: `/api/trails/${await fx.freshTrail()}` }) },
  { method: "POST", route: "/api/trails/[id]/line", expect: parkStaff(200), call: (fx) => ({ path: `/api/trails/${fx.trailId}/line`, multipart: { file: gpxFile() } }) },
  {
    method: "POST",
    route: "/api/trails/[id]/features",
    expect: parkStaff(201),
    call: (fx) => ({ path: `/api/trails/${fx.trailId}/features`, data: { kind: "jump", size: "small", distanceAlongM: 60 } }),
    made: (fx, _c, body) => fx.track("feature", body.feature.id),
  },
  { method: "PATCH", route: "/api/trail-features/[id]", expect: parkStaff(200), call: async (fx) => ({ path: `/api/trail-features/${(await fx.freshFeature()).id}`, data: { kind: "drop" } }) },
  {
    method: "PATCH",
    route: "/api/trail-features/[id]/position",
    expect: parkStaff(200),
    call: async (fx) => {
      const feature = await fx.freshFeature();
      return { path: `/api/trail-features/${feature.id}/position`, data: { lon: feature.lon, lat: feature.lat } };
    },
  },
  { method: "DELETE", route: "/api/trail-features/[id]", expect: parkStaff(204), call: async (fx) => ({ path: `/api/trail-features/${(await fx.freshFeature()).id}` }) },

  // Conditions: reports, check, park-wide state, hazards.
  { method: "POST", route: "/api/trails/[id]/reports", expect: parkStaff(201), call: async (fx) => ({ path: `/api/trails/${fx.trailId}/reports`, data: { status: "open", baseRevision: await fx.currentRevision() } }) },
  {
    method: "POST",
    route: "/api/parks/[parkSlug]/morning-check",
    expect: parkStaff(201),
    call: async (fx) => ({ path: `/api/parks/${PARK}/morning-check`, data: { entries: [{ trailId: fx.trailId, baseRevision: await fx.currentRevision(), report: { status: "open" } }] } }),
  },
  {
    method: "POST",
    route: "/api/parks/[parkSlug]/state",
    expect: parkStaff(201),
    // Starts the day after tomorrow, so the board other tests read is never affected; cleared below and at the end.
    call: () => ({ path: `/api/parks/${PARK}/state`, data: { state: "advisory", message: "Matrix check", startsAt: new Date(Date.now() + 2 * DAY).toISOString(), endsAt: new Date(Date.now() + 2 * DAY + 3_600_000).toISOString() } }),
  },
  { method: "DELETE", route: "/api/parks/[parkSlug]/state", expect: parkStaff(200), call: () => ({ path: `/api/parks/${PARK}/state` }) },
  { method: "GET", route: "/api/parks/[parkSlug]/reports.csv", expect: parkStaff(200), call: () => ({ path: `/api/parks/${PARK}/reports.csv` }) },
  {
    method: "POST",
    route: "/api/parks/[parkSlug]/hazards",
    expect: parkStaff(201),
    call: (fx) => ({ path: `/api/parks/${PARK}/hazards`, multipart: { kind: "machinery", note: "Matrix check", lon: String(fx.center.lon), lat: String(fx.center.lat) } }),
    made: (fx, _c, body) => fx.track("hazard", body.hazard.id),
  },
  {
    method: "POST",
    route: "/api/trails/[id]/hazards",
    expect: parkStaff(201),
    call: (fx) => ({ path: `/api/trails/${fx.trailId}/hazards`, multipart: { kind: "washout", note: "Matrix check", distanceAlongM: "30" } }),
    made: (fx, _c, body) => fx.track("hazard", body.hazard.id),
  },
  {
    method: "PATCH",
    route: "/api/hazards/[id]",
    expect: parkStaff(200),
    call: async (fx) => {
      const hazard = await fx.freshHazard();
      return { path: `/api/hazards/${hazard.id}`, data: { lockVersion: hazard.lockVersion, note: "Matrix check, edited" } };
    },
  },
  {
    method: "PATCH",
    route: "/api/hazards/[id]/position",
    expect: parkStaff(200),
    call: async (fx) => {
      const hazard = await fx.freshHazard();
      return { path: `/api/hazards/${hazard.id}/position`, data: { lon: hazard.lon + 0.0001, lat: hazard.lat, lockVersion: hazard.lockVersion } };
    },
  },

  // Staff and notices.
  { method: "POST", route: "/api/parks/[parkSlug]/invitations", expect: parkManagers(201), call: (_fx, c) => ({ path: `/api/parks/${PARK}/invitations`, data: { email: `${unique(`invitee-${c}`)}@tests.loamcast.test`, role: "ranger" } }) },
  { method: "GET", route: "/api/parks/[parkSlug]/staff", expect: parkStaff(200), call: () => ({ path: `/api/parks/${PARK}/staff` }) },
  // A no-op role change (the ranger stays ranger); the success of a real change is in tests/integration/parks.
  { method: "PATCH", route: "/api/parks/[parkSlug]/staff/[userId]", expect: parkManagers(200), call: async (fx) => ({ path: `/api/parks/${PARK}/staff/${await fx.memberId("parkRanger")}`, data: { role: "ranger" } }) },
  // Callers who may remove someone remove a member made for them; the others aim at the park's ranger.
  {
    method: "DELETE",
    route: "/api/parks/[parkSlug]/staff/[userId]",
    expect: parkManagers(204),
    call: async (fx, c) => ({ path: `/api/parks/${PARK}/staff/${c === "manager" || c === "admin" ? await fx.freshMember() : await fx.memberId("parkRanger")}` }),
  },
  { method: "DELETE", route: "/api/parks/[parkSlug]/invitations/[invitationId]", expect: parkManagers(204), call: async (fx) => ({ path: `/api/parks/${PARK}/invitations/${await fx.freshInvitation()}` }) },
  { method: "POST", route: "/api/parks/[parkSlug]/invitations/[invitationId]/resend", expect: parkManagers(200), call: async (fx) => ({ path: `/api/parks/${PARK}/invitations/${await fx.freshInvitation()}/resend` }) },

  // The park itself: admins create parks, managers change settings and ground.
  {
    method: "POST",
    route: "/api/parks",
    expect: adminOnly(201),
    call: () => ({ path: "/api/parks", data: { name: "Matrix park", slug: unique("matrix-park").slice(0, 60), timeZone: "Europe/Zurich", location: { lon: 8.5, lat: 46.8 }, baseElevationM: 900, summitElevationM: 1800, managerEmail: `${unique("matrix-manager")}@tests.loamcast.test` } }),
  },
  { method: "PATCH", route: "/api/parks/[parkSlug]", expect: parkManagers(200), call: async (fx) => ({ path: `/api/parks/${PARK}`, data: { lockVersion: await fx.parkLockVersion() } }) },
  // Clearing the landmarks, then putting the same shapes back (in this order).
  { method: "DELETE", route: "/api/parks/[parkSlug]/layers/[layer]", expect: parkManagers(204), call: () => ({ path: `/api/parks/${PARK}/layers/landmarks` }) },
  { method: "PUT", route: "/api/parks/[parkSlug]/layers/[layer]", expect: parkManagers(200), call: (fx) => ({ path: `/api/parks/${PARK}/layers/landmarks`, multipart: { file: fx.landmarksFile() } }) },
  { method: "POST", route: "/api/parks/[parkSlug]/notices/preview", expect: parkStaff(200), call: (fx) => ({ path: `/api/parks/${PARK}/notices/preview`, data: NOTICE(fx) }) },
  { method: "POST", route: "/api/parks/[parkSlug]/notices", expect: parkStaff(202), call: (fx) => ({ path: `/api/parks/${PARK}/notices`, data: NOTICE(fx) }) },
  { method: "GET", route: "/api/parks/[parkSlug]/notices", expect: parkStaff(200), call: () => ({ path: `/api/parks/${PARK}/notices` }) },
  { method: "GET", route: "/api/notices/[noticeId]", expect: parkStaff(200), call: (fx) => ({ path: `/api/notices/${fx.noticeId}` }) },
  { method: "POST", route: "/api/notices/[noticeId]/retry", expect: parkStaff(200), call: (fx) => ({ path: `/api/notices/${fx.noticeId}/retry` }) },
];
