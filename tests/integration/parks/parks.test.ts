import { randomUUID } from "node:crypto";
import { afterAll, describe, expect, it } from "vitest";
import { clearGroundLayer, groundLayerHistory, replaceGroundLayer } from "@/lib/parks/ground";
import { createPark, updatePark } from "@/lib/parks/park-writes";
import { loadActor } from "@/lib/server/auth/actor";
import { acceptInvitation, findOpenInvitation, inviteStaff, isWithdrawnInvitation } from "@/lib/staff/invitations";
import { changeMemberRole, listTeam, removeMember, resendInvitation, revokeInvitation } from "@/lib/staff/team";
import { AuditEvent, Invitation, Park, sequelize } from "@/models";
import { createTrail } from "../map/fixtures";
import { addStaff, capturedMessages, createPark as createTestPark, createUser, uniqueEmail } from "../helpers";

afterAll(() => sequelize.close());

const slug = () => `own-park-${randomUUID().slice(0, 8)}`;
const body = (over: Record<string, unknown> = {}) => ({
  name: "A park of our own",
  slug: slug(),
  timeZone: "America/Denver",
  location: { lon: -105.6, lat: 39.7 },
  baseElevationM: 2600,
  summitElevationM: 3300,
  managerEmail: uniqueEmail("first-manager"),
  ...over,
});
const admin = async () => (await loadActor((await createUser({ role: "admin" })).id))!;
const tokenFrom = (raw: string) => raw.replace(/=\r?\n/g, "").match(/\/invitations\/([A-Za-z0-9_-]{20,})/)![1];
const rejection = (promise: Promise<unknown>) => promise.then(() => null, (e) => e as { status: number; field?: string; message: string });

async function managedPark() {
  const park = await createTestPark();
  const manager = await createUser();
  await addStaff(park.id, manager.id, "manager");
  return { park, manager: (await loadActor(manager.id))! };
}

describe("creating a park", () => {
  it("writes the park, its first manager's invitation and the audit event together, and mails the link", async () => {
    const input = body();
    const created = await createPark(await admin(), input);
    expect(created.park).toMatchObject({ slug: input.slug, timeZone: "America/Denver", location: { lon: -105.6, lat: 39.7 }, lockVersion: 0 });
    const park = await Park.findOne({ where: { slug: input.slug } });
    expect(await Invitation.count({ where: { parkId: park!.id, email: input.managerEmail, role: "manager" } })).toBe(1);
    expect(await AuditEvent.count({ where: { parkId: park!.id, action: "park.create" } })).toBe(1);
    const mail = (await capturedMessages()).find((m) => m.to.includes(input.managerEmail));
    const joined = await acceptInvitation({ token: tokenFrom(mail!.raw), name: "First Manager", password: "ridge-runner-44" });
    expect(joined).toMatchObject({ role: "manager", parkSlug: input.slug });
  });

  it("refuses what the issue names, with the field, and writes nothing", async () => {
    const actor = await admin();
    expect(await rejection(createPark(actor, body({ timeZone: "Mars/Olympus" })))).toMatchObject({ status: 422, field: "timeZone" });
    expect(await rejection(createPark(actor, body({ slug: "No Caps" })))).toMatchObject({ status: 422, field: "slug" });
    expect(await rejection(createPark(actor, body({ summitElevationM: 2000 })))).toMatchObject({ status: 422, field: "summitElevationM" });
    expect(await rejection(createPark(actor, body({ location: { lon: 190, lat: 10 } })))).toMatchObject({ status: 422, field: "location.lon" });
    const taken = body();
    await createPark(actor, taken);
    expect(await rejection(createPark(actor, { ...body(), slug: taken.slug }))).toMatchObject({ status: 409, field: "slug" });
  });

  it("is for site admins only", async () => {
    const { manager } = await managedPark();
    expect(await rejection(createPark(manager, body()))).toMatchObject({ status: 403 });
    expect(await rejection(createPark(null, body()))).toMatchObject({ status: 401 });
  });

  it("leaves no park behind when the invitation cannot be written", async () => {
    const input = body({ managerEmail: `${"x".repeat(250)}@a.test` });
    expect(await rejection(createPark(await admin(), input))).toMatchObject({ status: 422, field: "managerEmail" });
    expect(await Park.count({ where: { slug: input.slug } })).toBe(0);
  });
});

describe("park settings", () => {
  it("changes with the lockVersion read; a stale one gets 409 with the current values", async () => {
    const { park, manager } = await managedPark();
    const saved = await updatePark(manager, park.slug, { timeZone: "Europe/Vienna", lockVersion: 0 });
    expect(saved).toMatchObject({ timeZone: "Europe/Vienna", lockVersion: 1 });
    const stale = await rejection(updatePark(manager, park.slug, { name: "Late edit", lockVersion: 0 }));
    expect(stale).toMatchObject({ status: 409, details: { current: { timeZone: "Europe/Vienna", lockVersion: 1 } } });
    expect(await AuditEvent.findOne({ where: { parkId: park.id, action: "park.update" } })).toMatchObject({ data: { changed: ["timeZone"] } });
  });

  it("keeps the slug once the park has trails, and checks summit against the stored base", async () => {
    const { park, manager } = await managedPark();
    expect(await rejection(updatePark(manager, park.slug, { summitElevationM: 800, lockVersion: 0 }))).toMatchObject({ status: 422, field: "summitElevationM" });
    await createTrail(park, "Pinned");
    expect(await rejection(updatePark(manager, park.slug, { slug: slug(), lockVersion: 0 }))).toMatchObject({ status: 409, field: "slug" });
  });

  it("keeps the rain caution level (default 10 mm in 24 h), refusing one out of range and writing nothing", async () => {
    const { park, manager } = await managedPark();
    expect(await rejection(updatePark(manager, park.slug, { rainThresholdMm: 0, lockVersion: 0 }))).toMatchObject({ status: 422, field: "rainThresholdMm" });
    expect((await Park.findByPk(park.id))?.rainThresholdMm).toBe(10);
    expect(await updatePark(manager, park.slug, { rainThresholdMm: "25.4", lockVersion: 0 })).toMatchObject({ rainThresholdMm: 25.4, lockVersion: 1 });
    expect(await AuditEvent.findOne({ where: { parkId: park.id, action: "park.update" } })).toMatchObject({ data: { changed: ["rainThresholdMm"] } });
  });

  it("rangers may not change settings", async () => {
    const { park } = await managedPark();
    const ranger = await createUser();
    await addStaff(park.id, ranger.id, "ranger");
    expect(await rejection(updatePark(await loadActor(ranger.id), park.slug, { name: "Ranger's park", lockVersion: 0 }))).toMatchObject({ status: 403 });
  });
});

const fileRequest = (text: string, name = "layer.geojson") => {
  const form = new FormData();
  form.append("file", new Blob([text], { type: "application/geo+json" }), name);
  return new Request("http://127.0.0.1/x", { method: "PUT", body: form });
};
const collection = (...features: unknown[]) => JSON.stringify({ type: "FeatureCollection", features });
const square = (lon: number, lat: number, d = 0.01) => ({ type: "Feature", properties: { name: "Area" }, geometry: { type: "Polygon", coordinates: [[[lon, lat], [lon + d, lat], [lon + d, lat + d], [lon, lat + d], [lon, lat]]] } });

describe("ground layers", () => {
  it("an upload replaces the layer in one step and keeps what it held; clearing keeps it too", async () => {
    const { park, manager } = await managedPark();
    await replaceGroundLayer(manager, park, "boundary", fileRequest(collection(square(8.5, 46.8))));
    await replaceGroundLayer(manager, park, "boundary", fileRequest(collection(square(8.49, 46.79, 0.02))));
    await park.reload();
    expect(park.mapLayers.boundary?.features[0].geometry).toMatchObject({ type: "Polygon" });
    expect((park.mapLayers.boundary?.features[0].geometry as { coordinates: number[][][] }).coordinates[0][0]).toEqual([8.49, 46.79]);
    await clearGroundLayer(manager, park, "boundary");
    await park.reload();
    expect(park.mapLayers.boundary).toBeUndefined();
    const history = await groundLayerHistory(park.id);
    // The first upload had nothing to keep; the replacement and the clear each kept one shape.
    expect(history.map((h) => h.features)).toEqual([1, 1]);
    expect(await AuditEvent.count({ where: { parkId: park.id, action: ["ground.replace", "ground.clear"] } })).toBe(3);
  });

  it("refuses a feature far from the park by its number, and leaves the layer as it was", async () => {
    const { park, manager } = await managedPark();
    await replaceGroundLayer(manager, park, "landmarks", fileRequest(collection({ type: "Feature", properties: { name: "Base lodge" }, geometry: { type: "Point", coordinates: [8.5, 46.8] } })));
    const far = { type: "Feature", properties: { name: "Elsewhere" }, geometry: { type: "Point", coordinates: [10.5, 46.8] } };
    const near = { type: "Feature", properties: { name: "First aid" }, geometry: { type: "Point", coordinates: [8.501, 46.8] } };
    expect(await rejection(replaceGroundLayer(manager, park, "landmarks", fileRequest(collection(near, far))))).toMatchObject({ status: 422, field: "file", message: expect.stringMatching(/^Feature 2 reaches 152 km/) });
    await park.reload();
    expect(park.mapLayers.landmarks?.features.map((f) => f.properties?.name)).toEqual(["Base lodge"]);
  });

  it("is for the park's managers, and refuses unknown layers and other file types", async () => {
    const { park, manager } = await managedPark();
    const ranger = await createUser();
    await addStaff(park.id, ranger.id, "ranger");
    expect(await rejection(replaceGroundLayer(await loadActor(ranger.id), park, "boundary", fileRequest(collection(square(8.5, 46.8)))))).toMatchObject({ status: 403 });
    expect(await rejection(replaceGroundLayer(manager, park, "parking", fileRequest(collection(square(8.5, 46.8)))))).toMatchObject({ status: 404 });
    expect(await rejection(replaceGroundLayer(manager, park, "boundary", fileRequest("<gpx/>", "track.gpx")))).toMatchObject({ status: 415 });
  });
});

describe("the team", () => {
  it("lists members with who invited them and open invitations; a manager changes roles and removes members", async () => {
    const { park, manager } = await managedPark();
    const email = uniqueEmail("seasonal");
    const invited = await inviteStaff(manager, park.id, { email, role: "ranger" });
    const joined = await acceptInvitation({ token: invited.link.split("/invitations/")[1], name: "Seasonal Sam", password: "ridge-runner-44" });
    const pending = uniqueEmail("pending");
    await inviteStaff(manager, park.id, { email: pending, role: "ranger" });

    const team = await listTeam(manager, park);
    expect(team.members.find((m) => m.email === email)).toMatchObject({ role: "ranger", invitedBy: "Test Person" });
    expect(team.invitations.map((i) => i.email)).toEqual([pending]);

    await changeMemberRole(manager, park, joined.userId, { role: "manager" });
    expect((await loadActor(joined.userId))!.memberships).toEqual([{ parkId: park.id, role: "manager" }]);
    await removeMember(manager, park, joined.userId);
    // Roles are read from the database on every request: the removed member holds no role at once.
    expect((await loadActor(joined.userId))!.memberships).toEqual([]);
    const actions = (await AuditEvent.findAll({ where: { parkId: park.id }, order: [["id", "ASC"]] })).map((e) => e.action);
    expect(actions).toEqual(expect.arrayContaining(["staff.role", "staff.remove"]));
  });

  it("never leaves a park without a manager", async () => {
    const { park, manager } = await managedPark();
    expect(await rejection(changeMemberRole(manager, park, manager.id, { role: "ranger" }))).toMatchObject({ status: 409, message: expect.stringMatching(/last manager/) });
    expect(await rejection(removeMember(manager, park, manager.id))).toMatchObject({ status: 409 });
  });

  it("rangers see the team but change nothing", async () => {
    const { park, manager } = await managedPark();
    const ranger = (await loadActor((await createUser()).id))!;
    await addStaff(park.id, ranger.id, "ranger");
    const asRanger = (await loadActor(ranger.id))!;
    expect((await listTeam(asRanger, park)).members).toHaveLength(2);
    expect(await rejection(changeMemberRole(asRanger, park, manager.id, { role: "ranger" }))).toMatchObject({ status: 403 });
    expect(await rejection(removeMember(asRanger, park, manager.id))).toMatchObject({ status: 403 });
  });

  it("a withdrawn invitation's link says so; a resent one works and the old link stops", async () => {
    const { park, manager } = await managedPark();
    const first = await inviteStaff(manager, park.id, { email: uniqueEmail("withdrawn"), role: "ranger" });
    await revokeInvitation(manager, park, first.id);
    const firstToken = first.link.split("/invitations/")[1];
    expect(await findOpenInvitation(firstToken)).toBeNull();
    expect(await isWithdrawnInvitation(firstToken)).toBe(true);
    await expect(acceptInvitation({ token: firstToken, name: "Too Late", password: "ridge-runner-44" })).rejects.toThrow(/not valid/);

    const email = uniqueEmail("resent");
    const second = await inviteStaff(manager, park.id, { email, role: "ranger" });
    await resendInvitation(manager, park, second.id);
    expect(await findOpenInvitation(second.link.split("/invitations/")[1])).toBeNull();
    const mails = (await capturedMessages()).filter((m) => m.to.includes(email));
    expect(mails).toHaveLength(2);
    const newToken = tokenFrom(mails[1].raw);
    expect(newToken).not.toBe(second.link.split("/invitations/")[1]);
    expect(await acceptInvitation({ token: newToken, name: "On Time", password: "ridge-runner-44" })).toMatchObject({ role: "ranger" });
  });
});
