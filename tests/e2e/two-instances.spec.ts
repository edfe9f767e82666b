import { expect, request as apiRequest, test } from "@playwright/test";
import { demo, shot, signInAs } from "./helpers";

/**
 * Scaling out: two `next start` processes on loopback (playwright.config.ts starts both, same
 * build, same environment), one PostgreSQL database. Neither keeps state of its own: a report
 * written through one is on the other's board, and a session cookie issued by one is accepted by
 * the other (a JWT signed with the shared NEXTAUTH_SECRET).
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
  const note = `Posted through instance A (${test.info().project.name}, ${Date.now().toString(36)})`;
  const posted = await page.request.post(`/api/trails/${before.id}/reports`, { data: { status: "open", surfaces: ["tacky"], note, baseRevision: before.revision } });
  expect(posted.status()).toBe(201);

  // B reads the same database: its API and its board page show the report.
  const onB = await trailOf(await anonymousB.get(`/api/parks/${PARK}/board`), "Cedar Skip");
  expect(onB).toMatchObject({ note, status: "open", revision: before.revision + 1 });
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
