import { expect, request as apiRequest, test } from "@playwright/test";
import sharp from "sharp";
import { demo, shot, signInAs } from "./helpers";

/**
 * Scaling out: two `next start` processes on loopback (playwright.config.ts starts both, same
 * build, same environment), one PostgreSQL database. Each caches boards and map layers, but the
 * database decides when a cached answer is stale: a report written through one is on the other's
 * board at once, and a session cookie issued by one is accepted by the other (a JWT signed with
 * the shared NEXTAUTH_SECRET). npm test runs this file again with PHOTO_STORAGE=s3.
 */
const B = process.env.SECOND_APP_URL!;
const PARK = "harrow-ridge";

type BoardTrail = { id: string; name: string; revision: number; note: string | null; status: string | null };
const trailOf = async (response: { json: () => Promise<{ trails: BoardTrail[] }> }, name: string) => (await response.json()).trails.find((t) => t.name === name)!;

test("a report posted through instance A is on instance B's board, and A's session works on B", async ({ page, browser, baseURL }) => {
  expect(new URL(B).port).not.toBe(new URL(baseURL!).port);
  const anonymousB = await apiRequest.newContext({ baseURL: B });
  expect((await anonymousB.get("/api/health")).status()).toBe(200);

  // Signed in on A; a report through A's API.
  await signInAs(page, demo("ranger"));
  const before = await trailOf(await page.request.get(`/api/parks/${PARK}/board`), "Cedar Skip");
  // B has the board in its cache, and answers 304 to a phone holding it.
  const cachedOnB = await anonymousB.get(`/api/parks/${PARK}/board`);
  const etagOnB = cachedOnB.headers()["etag"];
  expect(etagOnB).toBeTruthy();
  expect((await anonymousB.get(`/api/parks/${PARK}/board`, { headers: { "if-none-match": etagOnB } })).status()).toBe(304);

  const note = `Posted through instance A (${test.info().project.name}, ${Date.now().toString(36)})`;
  const posted = await page.request.post(`/api/trails/${before.id}/reports`, { data: { status: "open", surfaces: ["tacky"], note, baseRevision: before.revision } });
  expect(posted.status()).toBe(201);

  // B reads the same database, and its cached board does not outlive A's write: the very next
  // request gets the report, with a new ETag, so the phone's copy is replaced.
  const afterWrite = await anonymousB.get(`/api/parks/${PARK}/board`, { headers: { "if-none-match": etagOnB } });
  expect(afterWrite.status()).toBe(200);
  expect(afterWrite.headers()["etag"]).not.toBe(etagOnB);
  const onB = await trailOf(afterWrite, "Cedar Skip");
  expect(onB).toMatchObject({ note, status: "open", revision: before.revision + 1 });

  // A hazard with a photo, reported through A: on B's map at once, and its photo served by B
  // (photos live behind the storage interface: one folder, or one bucket with PHOTO_STORAGE=s3).
  const hazardsOnB = async () => (await (await anonymousB.get(`/api/parks/${PARK}/hazards.geojson`)).json()).features as { properties: { id: string } }[];
  const pinsBefore = await hazardsOnB();
  const jpeg = await sharp({ create: { width: 64, height: 48, channels: 3, background: "#6b8e23" } }).jpeg().toBuffer();
  const reported = await page.request.post(`/api/parks/${PARK}/hazards`, {
    multipart: { kind: "other", note: `Two-instance check ${Date.now().toString(36)}`, lon: "-121.94", lat: "47.3", photos: { name: "pin.jpg", mimeType: "image/jpeg", buffer: jpeg } },
  });
  expect(reported.status()).toBe(201);
  const { hazard } = await reported.json();
  expect((await hazardsOnB()).map((f) => f.properties.id)).toEqual(expect.arrayContaining([...pinsBefore.map((f) => f.properties.id), hazard.id]));
  const hazardPhoto = await anonymousB.get(`/api/photos/${hazard.photoIds[0]}?size=full`);
  expect(hazardPhoto.status()).toBe(200);
  expect([...(await hazardPhoto.body()).subarray(0, 3)]).toEqual([0xff, 0xd8, 0xff]);
  const resolved = await page.request.patch(`/api/hazards/${hazard.id}`, { data: { lockVersion: hazard.lockVersion, resolved: true } });
  expect(resolved.status()).toBe(200);
  expect((await hazardsOnB()).map((f) => f.properties.id)).not.toContain(hazard.id);
  // Photos live behind the storage interface, here one folder both instances share.
  const board = await (await anonymousB.get(`/api/parks/${PARK}/board`)).json();
  const photoId = [...board.trails, { hazards: board.parkHazards }].flatMap((t: { hazards: { photoIds: string[] }[] }) => t.hazards.flatMap((h) => h.photoIds))[0];
  const photo = await anonymousB.get(`/api/photos/${photoId}?size=thumb`);
  expect(photo.status()).toBe(200);
  expect(photo.headers()["content-type"]).toBe("image/jpeg");

  const visitor = await browser.newContext({ ...test.info().project.use, baseURL: B });
  const boardOnB = await visitor.newPage();
  await boardOnB.goto(`/parks/${PARK}`);
  const card = boardOnB.getByTestId("board-trail").filter({ has: boardOnB.getByRole("heading", { name: "Cedar Skip", exact: true }) });
  await expect(card).toContainText(note);
  await shot(boardOnB, "two-instances-board-on-b");
  await visitor.close();

  // A's session cookie, sent to B: accepted for a staff-only read and for a write.
  const cookie = (await page.context().cookies(baseURL)).map((c) => `${c.name}=${c.value}`).join("; ");
  expect(cookie).toContain("next-auth.session-token=");
  const rangerOnB = await apiRequest.newContext({ baseURL: B, extraHTTPHeaders: { cookie } });
  expect((await anonymousB.get(`/api/parks/${PARK}/reports.csv`)).status()).toBe(401);
  expect((await rangerOnB.get(`/api/parks/${PARK}/reports.csv`)).status()).toBe(200);
  const second = `${note}, then through B`;
  const throughB = await rangerOnB.post(`/api/trails/${before.id}/reports`, { data: { status: "open", surfaces: ["tacky"], note: second, baseRevision: before.revision + 1 } });
  expect(throughB.status()).toBe(201);
  expect(await trailOf(await page.request.get(`/api/parks/${PARK}/board`), "Cedar Skip")).toMatchObject({ note: second, revision: before.revision + 2 });

  // In the browser too (cookies belong to the host, not the port, so it sends A's cookie to B):
  // the staff check page opens on B for the ranger who signed in on A.
  const staffPageOnB = await page.context().newPage();
  await staffPageOnB.goto(`${B}/staff/${PARK}/morning-check`);
  await expect(staffPageOnB.getByRole("heading", { name: "Morning check" })).toBeVisible();
  await expect(staffPageOnB.getByTestId("signed-in-as")).toContainText("ranger");
  await shot(staffPageOnB, "two-instances-check-on-b");

  await rangerOnB.dispose();
  await anonymousB.dispose();
});
