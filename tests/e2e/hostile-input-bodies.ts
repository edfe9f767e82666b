import { expect } from "@playwright/test";
import { setupBody } from "./authorization-matrix-fixtures";
import type { HostileCase, Targets } from "./hostile-input-types";

/**
 * Hostile JSON bodies, form fields, path and query parameters. Each is sent by a caller who may
 * use the route, so the refusal is about the input alone.
 */
const SETUPS = () => "/api/me/setups";
const REPORTS = (t: Targets) => `/api/trails/${t.trailId}/reports`;
const TRAIL = (t: Targets) => `/api/trails/${t.trailId}`;
const NOT_A_UUID = "0123456789abcdef0123456789abcdef0123"; // 36 characters of hex: looks like an id, is not one
const FAKE_UUIDS = (n: number) => Array.from({ length: n }, (_, i) => `00000000-0000-4000-8000-${String(i).padStart(12, "0")}`);
const valid = setupBody("Hostile check");
const notice = { kind: "advisory", trailIds: null, message: "Hostile input check" };
// A browser's push subscription with its endpoint replaced: the worker would POST to it. The key is
// the right size but no point of P-256 (0x04 then 64 bytes of 0xFF).
const pushKeys = { p256dh: Buffer.concat([Buffer.from([4]), Buffer.alloc(64, 0xff)]).toString("base64url"), auth: "A".repeat(22) };
const pushBody = (endpoint: string, keys: Record<string, string> = pushKeys) => ({ parkSlug: "harrow-ridge", trailIds: null, kinds: ["closure"], subscription: { endpoint, keys } });
const hazardFields = { kind: "other", lon: "-121.94", lat: "47.3" };
/** A FormData keeps a field named "__proto__" (an object literal would set the prototype instead). */
function formOf(fields: Record<string, string>): FormData {
  const form = new FormData();
  for (const key of Object.keys(fields)) form.append(key, fields[key]);
  return form;
}
const newPark = () => ({ name: "Hostile park", slug: `hostile-${Date.now().toString(36)}`, timeZone: "Europe/Zurich", location: { lon: 8.5, lat: 46.8 }, baseElevationM: 900, summitElevationM: 1800, managerEmail: "hostile-manager@tests.loamcast.test" });
const rideLog = (t: Targets, extra: Record<string, unknown>) => ({ setupId: t.setupId, riddenOn: "2026-11-01", frontKpa: 140, rearKpa: 160, symptoms: { front: ["fine"], rear: ["fine"] }, ...extra });

export const BODY_CASES: HostileCase[] = [
  // Malformed bodies and content types.
  { name: "malformed JSON", as: "parkRanger", method: "POST", path: REPORTS, raw: { body: '{"status":"open",', type: "application/json" }, expect: 400 },
  { name: "JSON sent as text/plain", as: "parkRanger", method: "POST", path: REPORTS, raw: { body: '{"status":"open"}', type: "text/plain" }, expect: 415 },
  { name: "a form sent to a JSON route", as: "rider", method: "POST", path: SETUPS, multipart: () => ({ name: "Form bike" }), expect: 415 },
  { name: "a JSON array instead of an object", as: "rider", method: "POST", path: SETUPS, json: () => [valid], expect: 400 },
  { name: "JSON nested 5,000 levels deep", as: "rider", method: "POST", path: SETUPS, raw: { body: `${"[".repeat(5000)}${"]".repeat(5000)}`, type: "application/json" }, expect: 400 },

  // Mass assignment: fields the caller may not set are refused, never silently taken.
  { name: "mass assignment: userId on a new setup", as: "rider", method: "POST", path: SETUPS, json: () => ({ ...valid, userId: "00000000-0000-4000-8000-000000000001" }), expect: 400 },
  { name: "mass assignment: siteRole on a setup edit", as: "rider", method: "PATCH", path: (t) => `/api/me/setups/${t.setupId}`, json: () => ({ lockVersion: 0, siteRole: "admin" }), expect: 400 },
  { name: "mass assignment: parkId on a trail edit", as: "parkRanger", method: "PATCH", path: TRAIL, json: (t) => ({ lockVersion: t.trailLockVersion, name: "Moved", parkId: "00000000-0000-4000-8000-000000000002" }), expect: 400 },
  { name: "mass assignment: createdBy and recipientCount on a notice", as: "manager", method: "POST", path: () => "/api/parks/harrow-ridge/notices", json: () => ({ ...notice, createdBy: "00000000-0000-4000-8000-000000000003", recipientCount: 0 }), expect: 400 },
  { name: "mass assignment: parkId on a hazard edit", as: "parkRanger", method: "PATCH", path: (t) => `/api/hazards/${t.hazardId}`, json: (t) => ({ lockVersion: t.hazardLockVersion, resolved: true, parkId: "00000000-0000-4000-8000-000000000004" }), expect: 400 },
  { name: "prototype pollution: a __proto__ key", as: "rider", method: "POST", path: SETUPS, raw: { body: JSON.stringify(valid).replace(/^\{/, '{"__proto__":{"siteRole":"admin"},'), type: "application/json" }, expect: 400 },
  { name: "prototype pollution: constructor.prototype", as: "parkRanger", method: "POST", path: REPORTS, raw: { body: '{"status":"open","constructor":{"prototype":{"siteRole":"admin"}}}', type: "application/json" }, expect: 400 },
  { name: "prototype pollution: a __proto__ form field", as: "parkRanger", method: "POST", path: () => "/api/parks/harrow-ridge/hazards", multipart: () => formOf({ ...hazardFields, ["__proto__"]: "x" }), expect: 400 },

  // Another park's trail, named through a route of one's own park.
  { name: "another park's trail in a hazard pin", as: "otherParkRanger", method: "POST", path: () => "/api/parks/cinder-hollow/hazards", multipart: (t) => ({ kind: "other", trailId: t.demoTrailId, distanceAlongM: "10" }), expect: 422, field: "trailId" },
  { name: "another park's trail in a notice", as: "otherParkRanger", method: "POST", path: () => "/api/parks/cinder-hollow/notices", json: (t) => ({ ...notice, trailIds: [t.demoTrailId] }), expect: 422, field: "trailIds" },
  { name: "another park's trail in a check", as: "otherParkRanger", method: "POST", path: () => "/api/parks/cinder-hollow/morning-check", json: (t) => ({ entries: [{ trailId: t.demoTrailId, report: { status: "closed", reason: "Taken over" } }] }), expect: 400, field: "trailId" },
  { name: "another park's trail in a ride log", as: "rider", method: "POST", path: () => "/api/me/ride-logs", json: (t) => rideLog(t, { parkSlug: "cinder-hollow", trailIds: [t.demoTrailId] }), expect: 422, field: "trailIds" },

  // Numbers out of range.
  { name: "a negative rider mass", as: "rider", method: "POST", path: SETUPS, json: () => ({ ...valid, riderMassKg: -80 }), expect: 400, field: "riderMassKg" },
  { name: "a tyre maximum of 10,000 psi", as: "rider", method: "POST", path: SETUPS, json: () => ({ ...valid, front: { ...valid.front, maxKpa: 68_948 } }), expect: 400, field: "front.maxKpa" },
  { name: "\"Infinity\" as a string", as: "rider", method: "POST", path: SETUPS, json: () => ({ ...valid, bikeMassKg: "Infinity" }), expect: 400, field: "bikeMassKg" },
  { name: "1e309 (Infinity once parsed)", as: "rider", method: "POST", path: SETUPS, raw: { body: JSON.stringify({ ...valid, riderMassKg: 0 }).replace('"riderMassKg":0', '"riderMassKg":1e309'), type: "application/json" }, expect: 400, field: "riderMassKg" },
  { name: "\"NaN\" as a pressure", as: "rider", method: "POST", path: () => "/api/me/ride-logs", json: (t) => rideLog(t, { frontKpa: "NaN" }), expect: 400, field: "frontKpa" },
  { name: "a report revision of 1e308", as: "parkRanger", method: "POST", path: REPORTS, json: () => ({ status: "open", baseRevision: 1e308 }), expect: 400, field: "baseRevision" },
  { name: "a negative lockVersion", as: "parkRanger", method: "PATCH", path: TRAIL, json: () => ({ name: "Edited", lockVersion: -1 }), expect: 400, field: "lockVersion" },

  // Long strings and Unicode tricks.
  { name: "a 100,000-character setup name", as: "rider", method: "POST", path: SETUPS, json: () => ({ ...valid, name: "x".repeat(100_000) }), expect: 413 },
  { name: "a 100,000-character hazard note", as: "parkRanger", method: "POST", path: () => "/api/parks/harrow-ridge/hazards", multipart: () => ({ ...hazardFields, note: "x".repeat(100_000) }), expect: 400, field: "note" },
  { name: "a right-to-left override in a setup name", as: "rider", method: "POST", path: SETUPS, json: () => ({ ...valid, name: "Trail bike \u202Egpj.exe" }), expect: 400, field: "name" },
  { name: "a name of zero-width spaces only", as: "rider", method: "POST", path: SETUPS, json: () => ({ ...valid, name: "\u200B\u200B\u200B" }), expect: 400, field: "name" },
  { name: "a NUL byte in a trail name (was a 500)", as: "parkRanger", method: "PATCH", path: TRAIL, json: (t) => ({ name: "Lower\u0000Loop", lockVersion: t.trailLockVersion }), expect: 400, field: "name" },
  { name: "a NUL byte in a ride note", as: "rider", method: "POST", path: () => "/api/me/ride-logs", json: (t) => rideLog(t, { note: "felt\u0000fine" }), expect: 400, field: "note" },
  { name: "a NUL byte in a report note", as: "parkRanger", method: "POST", path: REPORTS, json: () => ({ status: "open", note: "dry\u0000" }), expect: 400, field: "note" },
  { name: "CR/LF and a header in a trail name", as: "parkRanger", method: "PATCH", path: TRAIL, json: (t) => ({ name: "Loop\r\nBcc: all@evil.example", lockVersion: t.trailLockVersion }), expect: 400, field: "name" },
  {
    name: "CR/LF in a notice message stays in the body; the subject is ours",
    as: "manager",
    method: "POST",
    path: () => "/api/parks/harrow-ridge/notices/preview",
    json: () => ({ ...notice, message: "Closed.\r\nBcc: all@evil.example\r\nSubject: win a prize" }),
    expect: 200,
    check: (body) => {
      expect(body.subject).not.toMatch(/[\r\n]/);
      expect(body.subject).not.toContain("prize");
    },
  },

  // Injection-shaped slugs, ids and query strings: parameterised queries, so they are just unknown values.
  { name: "SQL in a park slug", as: "anonymous", method: "GET", path: () => "/api/parks/harrow-ridge'%20OR%20'1'%3D'1/trails", expect: 404 },
  { name: "SQL in a trail id", as: "anonymous", method: "GET", path: () => "/api/trails/1%20OR%201%3D1", expect: 404 },
  { name: "SQL in a sort parameter falls back to the default order", as: "anonymous", method: "GET", path: () => "/api/parks/harrow-ridge/trails?sort=name%3BDROP%20TABLE%20trails%3B--&dir=__proto__", expect: 200, check: (body) => expect(body.trails.length).toBeGreaterThan(0) },
  { name: "SQL in a park slug in a body", as: "rider", method: "POST", path: () => "/api/me/subscriptions", json: () => ({ parkSlug: "x' OR '1'='1", trailIds: null, kinds: ["closure"] }), expect: 422, field: "parkSlug" },
  { name: "path traversal as a setup id", as: "rider", method: "GET", path: () => "/api/me/setups/..%2F..%2F..%2Fetc%2Fpasswd", expect: 404 },
  { name: "path traversal as a photo id", as: "anonymous", method: "GET", path: () => "/api/photos/..%2F..%2F.local%2Fsecrets.env?size=..%2F..", expect: 404 },
  { name: "path traversal as a park slug", as: "anonymous", method: "GET", path: () => "/api/parks/..%2F..%2Fetc%2Fpasswd/board", expect: 404 },

  // Ids that look like UUIDs but are not (each was a 500 before: PostgreSQL refused the cast).
  { name: "a malformed notice id", as: "manager", method: "GET", path: () => `/api/notices/${NOT_A_UUID}`, expect: 404 },
  { name: "a malformed notice id to retry", as: "manager", method: "POST", path: () => `/api/notices/${NOT_A_UUID}/retry`, expect: 404 },
  { name: "a malformed hazard id", as: "parkRanger", method: "PATCH", path: () => `/api/hazards/${NOT_A_UUID}`, json: () => ({ lockVersion: 0, resolved: true }), expect: 404 },
  { name: "a malformed subscription id", as: "rider", method: "DELETE", path: () => `/api/me/subscriptions/${NOT_A_UUID}`, expect: 404 },
  { name: "a malformed push subscription id", as: "rider", method: "DELETE", path: () => `/api/me/push-subscriptions/${NOT_A_UUID}`, expect: 404 },

  // Push endpoints the worker must never POST to: our own network, plain http, credentials, not a URL.
  { name: "a push endpoint at the cloud metadata address", as: "rider", method: "POST", path: () => "/api/me/push-subscriptions", json: () => pushBody("http://169.254.169.254/latest/meta-data"), expect: 422, field: "subscription.endpoint" },
  { name: "a push endpoint on an https IP literal", as: "rider", method: "POST", path: () => "/api/me/push-subscriptions", json: () => pushBody("https://10.0.0.5/push/x"), expect: 422, field: "subscription.endpoint" },
  { name: "a push endpoint at localhost", as: "rider", method: "POST", path: () => "/api/me/push-subscriptions", json: () => pushBody("https://localhost:5432/"), expect: 422, field: "subscription.endpoint" },
  { name: "a push endpoint with credentials", as: "rider", method: "POST", path: () => "/api/me/push-subscriptions", json: () => pushBody("https://user:pw@push.example-service.test/x"), expect: 422, field: "subscription.endpoint" },
  { name: "a push endpoint that is not a URL", as: "rider", method: "POST", path: () => "/api/me/push-subscriptions", json: () => pushBody("not a url"), expect: 400, field: "subscription.endpoint" },
  { name: "a push key of the wrong length", as: "rider", method: "POST", path: () => "/api/me/push-subscriptions", json: () => pushBody("https://push.example-service.test/x", { ...pushKeys, p256dh: "AAAA" }), expect: 400, field: "subscription.keys.p256dh" },
  { name: "a push key that is not a point of P-256", as: "rider", method: "POST", path: () => "/api/me/push-subscriptions", json: () => pushBody(`${process.env.FAKE_PUSH_URL}/push/hostile`), expect: 422, field: "subscription.keys.p256dh" },
  { name: "a push subscription without keys", as: "rider", method: "POST", path: () => "/api/me/push-subscriptions", json: () => ({ ...pushBody("https://push.example-service.test/x"), subscription: { endpoint: "https://push.example-service.test/x" } }), expect: 400, field: "subscription.keys" },
  { name: "a malformed trail id for reports", as: "anonymous", method: "GET", path: () => `/api/trails/${"-".repeat(36)}/reports`, expect: 404 },
  { name: "a malformed trail id for a new report", as: "parkRanger", method: "POST", path: () => `/api/trails/${NOT_A_UUID}/reports`, json: () => ({ status: "open" }), expect: 404 },
  { name: "a malformed trail id for a hazard", as: "parkRanger", method: "POST", path: () => `/api/trails/${NOT_A_UUID}/hazards`, multipart: () => hazardFields, expect: 404 },
  { name: "a malformed photo id", as: "anonymous", method: "GET", path: () => `/api/photos/${NOT_A_UUID}`, expect: 404 },

  // Huge arrays.
  { name: "10,000 trail ids for browser alerts", as: "rider", method: "POST", path: () => "/api/me/push-subscriptions", json: () => ({ ...pushBody("https://push.example-service.test/x"), trailIds: FAKE_UUIDS(10_000) }), expect: 413 },
  { name: "10,000 trail ids in a subscription", as: "rider", method: "POST", path: () => "/api/me/subscriptions", json: () => ({ parkSlug: "harrow-ridge", trailIds: FAKE_UUIDS(10_000), kinds: ["closure"] }), expect: 413 },
  { name: "10,000 trail ids for today's pressure", as: "anonymous", method: "POST", path: () => "/api/pressure", json: () => ({ ...valid, name: undefined, today: { parkSlug: "harrow-ridge", trailIds: FAKE_UUIDS(10_000) } }), expect: 413 },
  { name: "2,000 trails in one check (500 at most)", as: "parkRanger", method: "POST", path: () => "/api/parks/harrow-ridge/morning-check", json: () => ({ entries: FAKE_UUIDS(2_000).map((trailId) => ({ trailId, unchanged: true })) }), expect: 400 },
  { name: "101 trails in one notice (100 at most)", as: "manager", method: "POST", path: () => "/api/parks/harrow-ridge/notices", json: () => ({ ...notice, trailIds: FAKE_UUIDS(101) }), expect: 400, field: "trailIds" },

  // Account routes: every field named, nothing taken that the route does not know.
  { name: "sign-up: siteRole smuggled in", as: "anonymous", method: "POST", path: () => "/api/account", json: () => ({ name: "Hostile", email: "hostile-signup@tests.loamcast.test", password: "switchback-dawn-patrol-8", siteRole: "admin" }), expect: 400 },
  { name: "sign-up: a password over bcrypt's 72 bytes", as: "anonymous", method: "POST", path: () => "/api/account", json: () => ({ name: "Hostile", email: "hostile-long@tests.loamcast.test", password: "é".repeat(40) }), expect: 400, field: "password" },
  { name: "reset request: not an e-mail", as: "anonymous", method: "POST", path: () => "/api/account/password-reset", json: () => ({ email: "not an address" }), expect: 400, field: "email" },
  { name: "reset request: CR/LF and a Bcc header", as: "anonymous", method: "POST", path: () => "/api/account/password-reset", json: () => ({ email: "a@tests.loamcast.test\r\nBcc: all@evil.example" }), expect: 400, field: "email" },
  { name: "reset confirm: a 5,000-character token", as: "anonymous", method: "POST", path: () => "/api/account/password-reset/confirm", json: () => ({ token: "x".repeat(5000), password: "switchback-dawn-patrol-8" }), expect: 400, field: "token" },
  { name: "reset confirm: a userId smuggled in", as: "anonymous", method: "POST", path: () => "/api/account/password-reset/confirm", json: () => ({ token: "x".repeat(43), password: "switchback-dawn-patrol-8", userId: "00000000-0000-4000-8000-000000000005" }), expect: 400 },
  { name: "change password: a number for the new password", as: "rider", method: "POST", path: () => "/api/me/password", json: () => ({ currentPassword: "x", newPassword: 12345678 }), expect: 400, field: "newPassword" },
  { name: "delete account: no password", as: "rider", method: "DELETE", path: () => "/api/me", json: () => ({}), expect: 400, field: "password" },
  // Parks: creating one (admin) and changing its settings (its manager).
  { name: "a park in a time zone that does not exist", as: "admin", method: "POST", path: () => "/api/parks", json: () => ({ ...newPark(), timeZone: "Mars/Olympus" }), expect: 422, field: "timeZone" },
  { name: "a park with an offset instead of a zone name", as: "admin", method: "POST", path: () => "/api/parks", json: () => ({ ...newPark(), timeZone: "+02:00" }), expect: 422, field: "timeZone" },
  { name: "a park whose summit is below its base", as: "admin", method: "POST", path: () => "/api/parks", json: () => ({ ...newPark(), summitElevationM: 100 }), expect: 422, field: "summitElevationM" },
  { name: "a park off the Earth", as: "admin", method: "POST", path: () => "/api/parks", json: () => ({ ...newPark(), location: { lon: 8.5, lat: 91 } }), expect: 422, field: "location.lat" },
  { name: "a park slug with a path in it", as: "admin", method: "POST", path: () => "/api/parks", json: () => ({ ...newPark(), slug: "../admin" }), expect: 422, field: "slug" },
  { name: "a park slug already taken", as: "admin", method: "POST", path: () => "/api/parks", json: () => ({ ...newPark(), slug: "harrow-ridge" }), expect: 409, field: "slug" },
  { name: "mass assignment: fictional on a new park", as: "admin", method: "POST", path: () => "/api/parks", json: () => ({ ...newPark(), fictional: true }), expect: 422 },
  { name: "a negative rain caution level", as: "manager", method: "PATCH", path: () => "/api/parks/harrow-ridge", json: () => ({ rainThresholdMm: -5, lockVersion: 0 }), expect: 422, field: "rainThresholdMm" },
  { name: "a rain caution level that is not a number", as: "manager", method: "PATCH", path: () => "/api/parks/harrow-ridge", json: () => ({ rainThresholdMm: "lots", lockVersion: 0 }), expect: 422, field: "rainThresholdMm" },
  { name: "park settings without a lockVersion", as: "manager", method: "PATCH", path: () => "/api/parks/harrow-ridge", json: () => ({ name: "Renamed" }), expect: 422, field: "lockVersion" },
  { name: "a new slug for a park that has trails", as: "manager", method: "PATCH", path: () => "/api/parks/harrow-ridge", json: () => ({ slug: "harrow-ridge-2", lockVersion: 0 }), expect: 409 },
  { name: "a role that does not exist", as: "manager", method: "PATCH", path: () => "/api/parks/harrow-ridge/staff/00000000-0000-4000-8000-000000000000", json: () => ({ role: "owner" }), expect: 400, field: "role" },
];
