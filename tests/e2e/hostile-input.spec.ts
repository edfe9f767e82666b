import { mkdirSync, readFileSync, writeFileSync } from "node:fs";
import { expect, test, type APIRequestContext, type APIResponse } from "@playwright/test";
import { allCallers, type Caller } from "./api-callers";
import { okJson, setupBody, unique } from "./authorization-matrix-fixtures";
import { BODY_CASES } from "./hostile-input-bodies";
import { fileCases, polyglotJpeg, SCRIPT_PAYLOAD } from "./hostile-input-files";
import type { HostileCase, Targets } from "./hostile-input-types";

/**
 * The hostile-input corpus against the running app (OWASP ASVS v5.0.0 2.2.1 input validation,
 * 5.2.1–5.2.2 files, 15.3.3 mass assignment, 1.2.4 injection, 1.3.11 mail headers): every case
 * gets its status, the one JSON error shape and never a 500, and the API listings that would
 * show a write are the same before and after.
 */
test.describe.configure({ mode: "serial" });
let as: Record<Caller, APIRequestContext>;
let targets: Targets;
const cleanUp: (() => Promise<unknown>)[] = [];

test.beforeAll(async ({ baseURL }, testInfo) => {
  testInfo.setTimeout(120_000);
  as = await allCallers(baseURL!);
  const gpx = { name: "hostile-target.gpx", mimeType: "application/gpx+xml", buffer: readFileSync("tests/fixtures/trails/good-track.gpx") };
  const { trail } = await okJson(await as.admin.post("/api/parks/harrow-ridge/trails", { multipart: { file: gpx, name: "Hostile input target" } }), "trail");
  cleanUp.push(() => as.manager.delete(`/api/trails/${trail.id}`));
  const { hazard } = await okJson(await as.manager.post("/api/parks/harrow-ridge/hazards", { multipart: { kind: "other", note: "Hostile input target", lon: "-121.94", lat: "47.3" } }), "hazard");
  // Every request aimed at this hazard is refused, so its lockVersion is still the one read here.
  cleanUp.push(() => as.manager.patch(`/api/hazards/${hazard.id}`, { data: { lockVersion: hazard.lockVersion, resolved: true } }));
  const { setups } = await okJson(await as.rider.get("/api/me/setups"), "setups");
  const board = await okJson(await as.anonymous.get("/api/parks/harrow-ridge/board"), "board");
  targets = { trailId: trail.id, trailLockVersion: trail.lockVersion, hazardId: hazard.id, hazardLockVersion: hazard.lockVersion, setupId: setups[0].id, demoTrailId: board.trails[0].id };
});

test.afterAll(async ({}, testInfo) => {
  testInfo.setTimeout(60_000);
  for (const undo of cleanUp.reverse()) await undo();
  for (const context of Object.values(as ?? {})) await context.dispose();
});

/** Everything a hostile request could have written shows in one of these listings (both parks). */
const LISTINGS: [Caller, string][] = [
  ["anonymous", "/api/parks/harrow-ridge/board"],
  ["anonymous", "/api/parks/cinder-hollow/board"],
  ["anonymous", "/api/parks/harrow-ridge/trails"],
  ["anonymous", "/api/parks/harrow-ridge/hazards.geojson"],
  ["anonymous", "/api/parks/harrow-ridge/features.geojson"],
  ["manager", "/api/parks/harrow-ridge/notices"],
  ["otherParkRanger", "/api/parks/cinder-hollow/notices"],
  ["rider", "/api/me/setups"],
  ["rider", "/api/me/ride-logs"],
  ["rider", "/api/me/subscriptions"],
];

async function listings() {
  const read = async ([caller, path]: [Caller, string]) => {
    const response = await as[caller].get(path);
    if (!response.ok()) return response.status();
    const body = await response.json();
    return path.endsWith("/board") ? { ...body, generatedAt: null } : body;
  };
  return Promise.all([...LISTINGS.map(read), read(["manager", `/api/trails/${targets.trailId}`])]);
}

function send(c: HostileCase, multipart: unknown): Promise<APIResponse> {
  const options: Parameters<APIRequestContext["fetch"]>[1] = { method: c.method, maxRedirects: 0, timeout: 60_000 };
  if (c.json) options.data = c.json(targets);
  if (c.raw) Object.assign(options, { data: c.raw.body, headers: { "content-type": c.raw.type } });
  if (multipart) options.multipart = multipart as never;
  return as[c.as].fetch(c.path(targets), options);
}

test("every hostile input is refused as the corpus says, in the error shape, and nothing is written", async () => {
  test.setTimeout(600_000);
  const cases = [...(await fileCases()), ...BODY_CASES];
  expect(cases.length).toBeGreaterThanOrEqual(40);
  const problems: string[] = [];
  const rows = ["| case | as | expected | got |", "| --- | --- | --- | --- |"];
  for (const c of cases) {
    const multipart = c.multipart ? await c.multipart(targets) : undefined;
    const before = await listings();
    const response = await send(c, multipart);
    const status = response.status();
    const body = (response.headers()["content-type"] ?? "").includes("json") ? await response.json().catch(() => null) : null;
    rows.push(`| ${c.name} | ${c.as} | ${c.expect}${c.field ? ` (${c.field})` : ""} | ${status}${body?.error?.field ? ` (${body.error.field})` : ""} |`);
    if (status !== c.expect) problems.push(`${c.name}: expected ${c.expect}, got ${status} ${JSON.stringify(body)?.slice(0, 200)}`);
    if (status >= 400 && typeof body?.error?.message !== "string") problems.push(`${c.name}: ${status} without the JSON error shape`);
    if (c.field && body?.error?.field !== c.field) problems.push(`${c.name}: expected field ${c.field}, got ${body?.error?.field}`);
    if (status < 400) c.check?.(body);
    if (JSON.stringify(await listings()) !== JSON.stringify(before)) problems.push(`${c.name}: something was written`);
  }
  mkdirSync(".local/test-results", { recursive: true });
  writeFileSync(".local/test-results/hostile-input.md", `${rows.join("\n")}\n`);
  expect(problems).toEqual([]);
});

test("what is accepted is stored as ours: emoji names verbatim, photos re-encoded, file names made on the server", async () => {
  // Emoji and accents are names like any other, and come back exactly as sent.
  const name = "Gnarly 🐗 Élan 29er";
  const created = await as.rider.post("/api/me/setups", { data: setupBody(name) });
  expect(created.status()).toBe(201);
  const { setup } = await created.json();
  cleanUp.push(() => as.rider.delete(`/api/me/setups/${setup.id}`));
  expect((await okJson(await as.rider.get(`/api/me/setups/${setup.id}`), "setup")).setup.name).toBe(name);

  // A JPEG that is also an HTML page is stored as a fresh JPEG: the script is gone from both sizes.
  const photo = { name: "<img src=x onerror=alert(1)>.jpg", mimeType: "image/jpeg", buffer: await polyglotJpeg() };
  const hazardResponse = await as.parkRanger.post("/api/parks/harrow-ridge/hazards", { multipart: { kind: "other", note: "Polyglot check", lon: "-121.94", lat: "47.3", photos: photo } });
  expect(hazardResponse.status()).toBe(201);
  const { hazard } = await hazardResponse.json();
  cleanUp.push(() => as.manager.patch(`/api/hazards/${hazard.id}`, { data: { lockVersion: hazard.lockVersion, resolved: true } }));
  for (const size of ["full", "thumb"]) {
    const served = await as.anonymous.get(`/api/photos/${hazard.photoIds[0]}?size=${size}`);
    expect(served.headers()["content-type"]).toBe("image/jpeg");
    expect(served.headers()["content-disposition"]).toBe(`inline; filename="hazard-${hazard.photoIds[0]}.jpg"`);
    const bytes = await served.body();
    expect([...bytes.subarray(0, 3)]).toEqual([0xff, 0xd8, 0xff]);
    expect(bytes.includes(Buffer.from("<script"))).toBe(false);
    expect(bytes.includes(Buffer.from(SCRIPT_PAYLOAD))).toBe(false);
  }

  // A traversal-shaped file name is only a label: the download's name is made on the server.
  const gpx = { name: "../../../etc/cron.d/evil.gpx", mimeType: "application/gpx+xml", buffer: readFileSync("tests/fixtures/trails/good-track.gpx") };
  const uploaded = await as.admin.post("/api/parks/harrow-ridge/trails", { multipart: { file: gpx, name: unique("Traversal check").slice(0, 40) } });
  expect(uploaded.status()).toBe(201);
  const { trail } = await uploaded.json();
  cleanUp.push(() => as.manager.delete(`/api/trails/${trail.id}`));
  const download = await as.anonymous.get(`/api/trails/${trail.id}/download`);
  expect(download.headers()["content-disposition"]).toMatch(/^attachment; filename="[a-z0-9-]+-v1\.gpx"$/);

  // After every pollution attempt above, a rider is still a rider.
  expect((await as.rider.get("/api/parks/harrow-ridge/notices")).status()).toBe(403);
});
