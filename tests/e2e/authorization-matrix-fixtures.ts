import { createECDH, randomBytes, randomUUID } from "node:crypto";
import { readFileSync } from "node:fs";
import type { APIRequestContext, APIResponse } from "@playwright/test";
import { CALLER_EMAIL, type Caller } from "./api-callers";

/**
 * The objects the authorization matrix acts on, all in the demo park and made through the API as
 * the right user. Writes that would use up an object (delete, archive, apply, a lockVersion)
 * get a fresh object per call; everything made here is removed, resolved or archived at the
 * end, so later specs see the demo park as seeded.
 */
export const PARK = "harrow-ridge";
export const OTHER_PARK = "cinder-hollow";
const GPX = readFileSync("tests/fixtures/trails/good-track.gpx");
export const gpxFile = (name = "matrix-line.gpx") => ({ name, mimeType: "application/gpx+xml", buffer: GPX });

const wheel = { bsdMm: 622, widthMm: 61, casing: "trail", insert: false, tubeless: true, maxKpa: 345 };
export const bikeFields = { riderMassKg: 75, bikeMassKg: 15, pace: "steady", front: wheel, rear: wheel };
export const setupBody = (name: string) => ({ name, ...bikeFields, baseline: { frontKpa: 140, rearKpa: 160, surfaces: ["dry"] } });
export const unique = (label: string) => `${label}-${Date.now().toString(36)}-${Math.random().toString(36).slice(2, 7)}`;

type Json = Record<string, any>; // eslint-disable-line @typescript-eslint/no-explicit-any

/** The body of a 2xx response; anything else throws with the status and body, so a broken fixture is obvious. */
export async function okJson(response: APIResponse, what: string): Promise<Json> {
  if (!response.ok()) throw new Error(`${what}: ${response.status()} ${(await response.text()).slice(0, 300)}`);
  return response.status() === 204 ? {} : ((await response.json()) as Json);
}

/** Mail the fake SMTP server captured for one address (the server started by npm test). */
async function mailTo(address: string): Promise<string[]> {
  const response = await fetch(`${process.env.FAKE_SMTP_CONTROL_URL}/messages`);
  const { messages } = (await response.json()) as { messages: { to: string[]; raw: string }[] };
  return messages.filter((m) => m.to.includes(address)).map((m) => m.raw.replace(/=\r?\n/g, "").replace(/=([0-9A-F]{2})/g, (_, h: string) => String.fromCharCode(parseInt(h, 16))));
}

export class MatrixFixtures {
  demoTrailId = "";
  trailId = "";
  archivedTrailId = "";
  photoId = "";
  setupId = "";
  rideSetupId = "";
  noticeId = "";
  confirmToken = "";
  center = { lon: 0, lat: 0 };
  private landmarks: Json[] = [];
  private made = { hazards: [] as string[], features: [] as string[], trails: [] as string[], setups: [] as [Caller, string][], subscriptions: [] as [Caller, string][], pushSubscriptions: [] as [Caller, string][] };

  constructor(readonly as: Record<Caller, APIRequestContext>) {}

  async setUp() {
    const { as } = this;
    this.center = (await okJson(await as.anonymous.get(`/api/parks/${PARK}`), "park")).park.location;
    const board = await okJson(await as.anonymous.get(`/api/parks/${PARK}/board`), "board");
    this.demoTrailId = board.trails[0].id;
    this.photoId = board.trails.flatMap((t: Json) => t.hazards).find((h: Json) => h.photoIds.length > 0).photoIds[0];
    this.setupId = (await okJson(await as.rider.get("/api/me/setups"), "setups")).setups[0].id;
    this.trailId = await this.freshTrail("Matrix trail");
    this.archivedTrailId = await this.freshTrail("Matrix archived trail");
    await okJson(await as.manager.delete(`/api/trails/${this.archivedTrailId}`), "archive");
    this.rideSetupId = (await this.freshSetup("Matrix ride setup")).id;
    const notice = { kind: "advisory", trailIds: [this.trailId], message: "Matrix check: the authorization matrix is running." };
    this.noticeId = (await okJson(await as.manager.post(`/api/parks/${PARK}/notices`, { data: notice }), "notice")).id;
    this.confirmToken = await this.subscribeAndReadConfirmation();
    const layers = await okJson(await as.anonymous.get(`/api/parks/${PARK}/park-layers.geojson`), "park layers");
    this.landmarks = layers.features.filter((f: Json) => f.properties.layer === "landmark");
  }

  /** The rider subscribes to the other park afresh and the token is read from the e-mailed link. */
  private async subscribeAndReadConfirmation(): Promise<string> {
    for (const sub of (await okJson(await this.as.rider.get("/api/me/subscriptions"), "subscriptions")).subscriptions) {
      if (sub.park.slug === OTHER_PARK) await okJson(await this.as.rider.delete(`/api/me/subscriptions/${sub.id}`), "unsubscribe");
    }
    const saved = await okJson(await this.as.rider.post("/api/me/subscriptions", { data: { parkSlug: OTHER_PARK, trailIds: null, kinds: ["advisory"] } }), "subscribe");
    if (!saved.confirmationSent) throw new Error("No confirmation e-mail was sent");
    const mail = (await mailTo("rider@demo.loamcast.test")).filter((raw) => raw.includes("/api/subscriptions/confirm?token=")).at(-1);
    const token = /\/api\/subscriptions\/confirm\?token=([A-Za-z0-9._%-]+)/.exec(mail ?? "")?.[1];
    if (!token) throw new Error("No confirmation link in the rider's mail");
    return decodeURIComponent(token);
  }

  async freshTrail(name = "Matrix trail to archive"): Promise<string> {
    const response = await this.as.admin.post(`/api/parks/${PARK}/trails`, { multipart: { file: gpxFile(), name: unique(name).slice(0, 60) } });
    const id = (await okJson(response, "upload")).trail.id as string;
    this.made.trails.push(id);
    return id;
  }

  async freshHazard(): Promise<{ id: string; lockVersion: number; lon: number; lat: number }> {
    const multipart = { kind: "other", note: "Matrix check", lon: String(this.center.lon), lat: String(this.center.lat) };
    const { hazard } = await okJson(await this.as.manager.post(`/api/parks/${PARK}/hazards`, { multipart }), "hazard");
    this.made.hazards.push(hazard.id);
    return hazard;
  }

  async freshFeature(): Promise<{ id: string; lon: number; lat: number }> {
    const { feature } = await okJson(await this.as.manager.post(`/api/trails/${this.trailId}/features`, { data: { kind: "berm", distanceAlongM: 40 } }), "feature");
    this.made.features.push(feature.id);
    return feature;
  }

  async freshSetup(name = "Matrix setup"): Promise<{ id: string; lockVersion: number }> {
    const { setup } = await okJson(await this.as.rider.post("/api/me/setups", { data: setupBody(name) }), "setup");
    this.made.setups.push(["rider", setup.id]);
    return setup;
  }

  rideLogBody(setupId = this.rideSetupId) {
    return { setupId, riddenOn: new Date().toISOString().slice(0, 10), frontKpa: 140, rearKpa: 160, symptoms: { front: ["fine"], rear: ["rim-strike"] } };
  }

  /** A ride log of the rider's whose suggestion (rim strike: more rear pressure) can be applied once. */
  async freshRideLog(): Promise<string> {
    return (await okJson(await this.as.rider.post("/api/me/ride-logs", { data: this.rideLogBody() }), "ride log")).rideLog.id;
  }

  /** The rider's subscription to the other park (created again after each delete). */
  /** A browser's push subscription as the browser gives it, its endpoint at the local fake push service. */
  pushSubscriptionBody() {
    const endpoint = `${process.env.FAKE_PUSH_URL}/push/matrix-${randomUUID()}`;
    const browserKey = createECDH("prime256v1");
    browserKey.generateKeys();
    return { parkSlug: OTHER_PARK, trailIds: null, kinds: ["closure"], subscription: { endpoint, expirationTime: null, keys: { p256dh: browserKey.getPublicKey().toString("base64url"), auth: randomBytes(16).toString("base64url") } } };
  }

  async freshPushSubscription(): Promise<string> {
    const saved = await okJson(await this.as.rider.post("/api/me/push-subscriptions", { data: this.pushSubscriptionBody() }), "push subscribe");
    return saved.subscription.id;
  }

  async freshSubscription(): Promise<string> {
    const saved = await okJson(await this.as.rider.post("/api/me/subscriptions", { data: { parkSlug: OTHER_PARK, trailIds: null, kinds: ["advisory"] } }), "subscribe");
    return saved.subscription.id;
  }

  /** Today's current revision of a trail's report (0 before the first), as a writer must send it. */
  async currentRevision(trailId = this.trailId): Promise<number> {
    const { date } = await okJson(await this.as.anonymous.get(`/api/parks/${PARK}/board`), "board");
    const { reports } = await okJson(await this.as.anonymous.get(`/api/trails/${trailId}/reports?from=${date}&to=${date}`), "reports");
    return reports.find((r: Json) => r.isCurrent)?.revision ?? 0;
  }

  async trailLockVersion(trailId = this.trailId): Promise<number> {
    return (await okJson(await this.as.manager.get(`/api/trails/${trailId}`), "trail")).trail.lockVersion;
  }

  /** The park's settings lockVersion, as its manager reads it. */
  async parkLockVersion(): Promise<number> {
    return (await okJson(await this.as.manager.get(`/api/parks/${PARK}`), "park settings")).park.lockVersion;
  }

  /**
   * The park's landmarks as they were when the matrix started, as a layer file: the clearing row
   * empties the layer, the upload row (and cleanUp) put the same shapes back.
   */
  landmarksFile() {
    return { name: "landmarks.geojson", mimeType: "application/geo+json", buffer: Buffer.from(JSON.stringify({ type: "FeatureCollection", features: this.landmarks })) };
  }

  /**
   * A new ranger of the park, for the row that removes one: invited by the manager and joined
   * through the invitation page's server action, posted as the browser posts it (the action id
   * from the build's server-reference manifest; tests/e2e/server-actions-http.spec.ts shows the encoding).
   */
  async freshMember(): Promise<string> {
    const email = `${unique("matrix-member")}@tests.loamcast.test`;
    await okJson(await this.as.manager.post(`/api/parks/${PARK}/invitations`, { data: { email, role: "ranger" } }), "invitation");
    const token = /\/invitations\/([A-Za-z0-9_-]{20,})/.exec((await mailTo(email)).at(-1) ?? "")?.[1];
    if (!token) throw new Error(`No invitation link in the mail to ${email}`);
    const manifest = JSON.parse(readFileSync(".next/server/server-reference-manifest.json", "utf8")).node as Record<string, { exportedName: string }>;
    const [actionId] = Object.entries(manifest).find(([, e]) => e.exportedName === "acceptInvitationAction")!;
    const multipart = new FormData();
    for (const [name, value] of Object.entries({ token, name: "Matrix Member", password: "matrix-member-joins-42" })) multipart.append(`_1_${name}`, value);
    multipart.append("0", JSON.stringify([{ ok: false }, "$K1"]));
    await this.as.anonymous.post(`/invitations/${token}`, { multipart, headers: { "Next-Action": actionId, Accept: "text/x-component" }, maxRedirects: 0 });
    const { members } = await okJson(await this.as.manager.get(`/api/parks/${PARK}/staff`), "team");
    const member = members.find((m: Json) => m.email === email);
    if (!member) throw new Error(`${email} did not join the team`);
    return member.userId;
  }

  async memberId(caller: Caller): Promise<string> {
    const { members } = await okJson(await this.as.manager.get(`/api/parks/${PARK}/staff`), "team");
    return members.find((m: Json) => m.email === CALLER_EMAIL[caller as Exclude<Caller, "anonymous">]).userId;
  }

  /** An open invitation to the park, made by its manager, for a call that withdraws or resends it. */
  async freshInvitation(): Promise<string> {
    const body = { email: `${unique("matrix-invitee")}@tests.loamcast.test`, role: "ranger" };
    return (await okJson(await this.as.manager.post(`/api/parks/${PARK}/invitations`, { data: body }), "invitation")).invitation.id;
  }

  track(kind: "hazard" | "feature" | "trail", id: string) {
    this.made[`${kind}s`].push(id);
  }

  trackOwn(kind: "setup" | "subscription" | "pushSubscription", caller: Caller, id: string) {
    this.made[`${kind}s`].push([caller, id]);
  }

  /** Everything the matrix made goes away again; the park-wide state it set is cleared. */
  async cleanUp() {
    const { as } = this;
    const failures: string[] = [];
    const attempt = async (what: string, send: () => Promise<APIResponse>, fine = [200, 204, 404, 409]) => {
      const response = await send();
      if (!fine.includes(response.status())) failures.push(`${what}: ${response.status()}`);
    };
    for (const id of this.made.features) await attempt(`feature ${id}`, () => as.manager.delete(`/api/trail-features/${id}`));
    for (const id of this.made.hazards) {
      const hazard = await as.manager.patch(`/api/hazards/${id}`, { data: { lockVersion: 0, resolved: true } });
      if (hazard.status() === 409) {
        const current = ((await hazard.json()) as Json).error.details.current;
        if (!current.resolvedAt) await attempt(`hazard ${id}`, () => as.manager.patch(`/api/hazards/${id}`, { data: { lockVersion: current.lockVersion, resolved: true } }));
      } else if (![200, 404].includes(hazard.status())) failures.push(`hazard ${id}: ${hazard.status()}`);
    }
    for (const id of this.made.trails) await attempt(`trail ${id}`, () => as.manager.delete(`/api/trails/${id}`));
    for (const [caller, id] of this.made.setups) await attempt(`setup ${id}`, () => as[caller].delete(`/api/me/setups/${id}`));
    for (const [caller, id] of this.made.subscriptions) await attempt(`subscription ${id}`, () => as[caller].delete(`/api/me/subscriptions/${id}`));
    for (const [caller, id] of this.made.pushSubscriptions) await attempt(`push subscription ${id}`, () => as[caller].delete(`/api/me/push-subscriptions/${id}`));
    const rider = (await okJson(await as.rider.get("/api/me/subscriptions"), "subscriptions")).subscriptions as Json[];
    for (const sub of rider.filter((s) => s.park.slug === OTHER_PARK)) await attempt("rider's subscription", () => as.rider.delete(`/api/me/subscriptions/${sub.id}`));
    // The DELETE row makes one of the rider's browsers for every caller; only the rider's own call removes it.
    const browsers = (await okJson(await as.rider.get("/api/me/push-subscriptions"), "push subscriptions")).pushSubscriptions as Json[];
    for (const sub of browsers.filter((s) => s.park.slug === OTHER_PARK)) await attempt("rider's browser alerts", () => as.rider.delete(`/api/me/push-subscriptions/${sub.id}`));
    await attempt("park state", () => as.manager.delete(`/api/parks/${PARK}/state`));
    if (this.landmarks.length) await attempt("landmarks", () => as.manager.put(`/api/parks/${PARK}/layers/landmarks`, { multipart: { file: this.landmarksFile() } }));
    return failures;
  }
}
