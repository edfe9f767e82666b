import path from "node:path";
import { expect, test, type Browser, type Page } from "@playwright/test";
import { demo, shot, signInAs } from "./helpers";
import { linkIn, mailTo, readable, signUpAndProve } from "./mail-helpers";

/**
 * A new park starts on Loamcast, on a phone and a desktop: the admin creates it and invites its
 * manager; the manager joins, draws the ground (boundary, lifts, landmarks), uploads a trail and
 * invites two rangers; one ranger posts the first morning check; the manager makes that ranger a
 * manager and removes the other, whose next staff page is refused; a rider subscribes; the map
 * shows the ground and the trail. Screenshots: .local/test-results/screens/new-park-*.png.
 * Everything is made fresh per run and project (unique slug and e-mails).
 */
const TRAIL_FILE = path.resolve("tests/fixtures/trails/good-track.gpx");
const LOCATION = { lon: -121.93, lat: 47.305 }; // beside the corpus track, which the trail upload uses
const PASSWORD = "larch-needles-on-the-berm-62";

const square = (d: number) => [[[LOCATION.lon - d, LOCATION.lat - d], [LOCATION.lon + d, LOCATION.lat - d], [LOCATION.lon + d, LOCATION.lat + d], [LOCATION.lon - d, LOCATION.lat + d], [LOCATION.lon - d, LOCATION.lat - d]]];
const file = (name: string, features: unknown[]) => ({ name, mimeType: "application/geo+json", buffer: Buffer.from(JSON.stringify({ type: "FeatureCollection", features })) });
const GROUND = {
  boundary: file("boundary.geojson", [{ type: "Feature", properties: { name: "Our park" }, geometry: { type: "Polygon", coordinates: square(0.012) } }]),
  lifts: file("lifts.geojson", [{ type: "Feature", properties: { name: "Larch Lift" }, geometry: { type: "LineString", coordinates: [[-121.938, 47.297], [-121.925, 47.313]] } }]),
  landmarks: file("landmarks.geojson", [
    { type: "Feature", properties: { name: "Car park" }, geometry: { type: "Point", coordinates: [-121.939, 47.296] } },
    { type: "Feature", properties: { name: "First aid" }, geometry: { type: "Point", coordinates: [-121.936, 47.297] } },
  ]),
};

async function freshPage(browser: Browser): Promise<Page> {
  return (await browser.newContext({ ...test.info().project.use })).newPage();
}

async function join(browser: Browser, email: string, name: string, parkName: string): Promise<Page> {
  const mail = (await mailTo(email)).at(-1)!;
  const link = /https?:\/\/\S+\/invitations\/[A-Za-z0-9_-]+/.exec(readable(mail.raw))![0];
  const page = await freshPage(browser);
  await page.goto(link);
  await expect(page.getByRole("heading", { name: `Join ${parkName}` })).toBeVisible();
  await page.getByLabel("Your name").fill(name);
  await page.getByLabel("Choose a password").fill(PASSWORD);
  await page.getByRole("button", { name: "Join the team" }).click();
  await expect(page).toHaveURL(/\/sign-in\?joined=1/);
  await signInAs(page, email, PASSWORD);
  return page;
}

test.describe.serial("a park of our own", () => {
  const tag = () => `${test.info().project.name}-${RUN}`;
  const RUN = Date.now().toString(36);
  let slug = "";
  let parkName = "";
  let manager: Page;
  let ranger: Page;
  let leaver: Page;
  const email = (who: string) => `${who}-${tag()}@tests.loamcast.test`;

  test.afterAll(async () => {
    for (const page of [manager, ranger, leaver]) await page?.context().close();
  });

  test("1. the admin creates the park with its time zone and elevations and invites its manager", async ({ page }) => {
    slug = `a-park-of-our-own-${tag()}`;
    parkName = `A park of our own ${tag()}`;
    await signInAs(page, demo("admin"), undefined, "/admin/parks");
    await page.goto("/admin/parks");
    await page.getByLabel("Park name").fill(parkName);
    await expect(page.getByLabel("Web address (slug)")).toHaveValue(slug);
    await page.getByLabel("Time zone").fill("Mars/Olympus");
    await page.getByLabel("Latitude (°)").fill(String(LOCATION.lat));
    await page.getByLabel("Longitude (°)").fill(String(LOCATION.lon));
    await page.getByLabel("Base elevation (m)").fill("880");
    await page.getByLabel("Summit elevation (m)").fill("1240");
    await page.getByLabel("First manager's e-mail").fill(email("manager"));
    await page.getByRole("button", { name: "Create the park and invite its manager" }).click();
    // Refused beside the field, and nothing typed is lost.
    await expect(page.locator("#new-park-timeZone-error")).toContainText("IANA time zone");
    await expect(page.getByLabel("Base elevation (m)")).toHaveValue("880");
    await shot(page, "new-park-1-refused-time-zone");
    await page.getByLabel("Time zone").fill("America/Vancouver");
    await page.getByRole("button", { name: "Create the park and invite its manager" }).click();
    await expect(page.getByRole("status")).toContainText(`The invitation went to ${email("manager")}`);
    await expect(page.getByTestId("admin-parks").getByRole("link", { name: parkName })).toBeVisible();
    await shot(page, "new-park-1-created");

    // A new park is not a dead end for riders: the board says so, with no filter message.
    await page.goto(`/parks/${slug}`);
    await expect(page.getByTestId("no-trails-yet")).toContainText("has not published its trails yet");
    await expect(page.getByText("No trail matches these filters")).toHaveCount(0);
    await shot(page, "new-park-1-empty-board");
  });

  test("2. the manager joins, sees the set-up checklist and draws the ground", async ({ browser }) => {
    manager = await join(browser, email("manager"), "Marit Larchwood", parkName);
    await manager.goto(`/staff/${slug}`);
    const checklist = manager.getByTestId("setup-checklist");
    await expect(checklist).toContainText("Getting the park ready (0 of 6 done)");
    await shot(manager, "new-park-2-checklist");
    await checklist.getByRole("link", { name: "Check the park's settings" }).click();
    await expect(manager.getByText("A change counts from the moment you save")).toBeVisible();
    await manager.getByLabel("Contact e-mail (optional)").fill(`crew-${tag()}@tests.loamcast.test`);
    await manager.getByRole("button", { name: "Save settings" }).click();
    await expect(manager.getByRole("status").filter({ hasText: "Settings saved." })).toBeVisible();
    for (const layer of ["boundary", "lifts", "landmarks"] as const) {
      const row = manager.getByTestId(`layer-${layer}`);
      await row.locator('input[type="file"]').setInputFiles(GROUND[layer]);
      await row.getByRole("button", { name: "Upload" }).click();
      await expect(row.getByRole("status")).toContainText("saved and on the map");
    }
    await expect(manager.getByTestId("layer-landmarks")).toContainText("2 shapes");
    // A shape far from the park is refused by its number; the layer keeps what it held.
    const row = manager.getByTestId("layer-landmarks");
    await row.locator('input[type="file"]').setInputFiles(file("far.geojson", [{ type: "Feature", properties: { name: "Lodge" }, geometry: { type: "Point", coordinates: [-121.93, 47.31] } }, { type: "Feature", properties: { name: "Far" }, geometry: { type: "Point", coordinates: [-119.5, 47.31] } }]));
    await row.getByRole("button", { name: "Replace" }).click();
    await expect(row.getByRole("alert")).toContainText(/^Feature 2 reaches \d+ km from the park's location/);
    await expect(row).toContainText("2 shapes");
    await shot(manager, "new-park-2-ground");
  });

  test("3. the manager uploads a trail and invites two rangers", async () => {
    await manager.goto(`/staff/${slug}/trails/new`);
    await manager.getByTestId("trail-file").setInputFiles(TRAIL_FILE);
    await expect(manager.getByTestId("upload-preview").getByTestId("figure-length")).toContainText(/\d km|\d m/);
    await manager.getByLabel("Trail name").fill(`Larch Line ${tag()}`);
    await manager.getByRole("button", { name: "Save trail" }).click();
    await expect(manager).toHaveURL(/\/trails\/[0-9a-f-]{36}$/);

    await manager.goto(`/staff/${slug}/team`);
    for (const who of ["ranger", "leaver"]) {
      await manager.getByLabel("Their e-mail").fill(email(who));
      await manager.getByRole("radio", { name: "Ranger" }).check();
      await manager.getByRole("button", { name: "Send invitation" }).click();
      await expect(manager.getByText(`Invitation sent to ${email(who)}.`)).toBeVisible();
    }
    await manager.reload();
    await expect(manager.getByTestId("team-invitations")).toContainText(email("leaver"));
    await shot(manager, "new-park-3-team-invited");
  });

  test("4. the rangers join; one posts the first morning check", async ({ browser }) => {
    ranger = await join(browser, email("ranger"), "Rafe Loamsworth", parkName);
    leaver = await join(browser, email("leaver"), "Lio Seasonal", parkName);
    await ranger.goto(`/staff/${slug}/morning-check`);
    const card = ranger.getByTestId("check-trail").first();
    await card.getByRole("button", { name: "Change", exact: true }).click();
    await card.getByRole("radio", { name: "Open" }).click();
    await card.getByRole("checkbox", { name: "tacky", exact: true }).check();
    await ranger.getByRole("button", { name: "Save 1 trail" }).click();
    await expect(ranger.getByTestId("check-outcome")).toContainText("Saved 1 trail.");
    await shot(ranger, "new-park-4-first-check");
  });

  test("5. the manager makes the ranger a manager and removes the other; the removed one is refused at once", async () => {
    await manager.goto(`/staff/${slug}/team`);
    const members = manager.getByTestId("team-members");
    const rafe = members.getByRole("listitem").filter({ hasText: "Rafe Loamsworth" });
    await rafe.getByRole("button", { name: "Make manager" }).click();
    await expect(rafe.getByRole("status")).toContainText("Rafe Loamsworth is now manager.");
    const lio = members.getByRole("listitem").filter({ hasText: "Lio Seasonal" });
    manager.once("dialog", (dialog) => dialog.accept());
    await lio.getByRole("button", { name: "Remove" }).click();
    await expect(members.getByRole("listitem").filter({ hasText: "Lio Seasonal" })).toHaveCount(0);
    await shot(manager, "new-park-5-team-changed");

    // The removed ranger's very next staff request, with the same session, is refused.
    const refused = await leaver.request.get(`/api/parks/${slug}/staff`);
    expect(refused.status()).toBe(403);
    await leaver.goto(`/staff/${slug}/team`);
    // No staff role anywhere now: the staff area answers its 403 page.
    await expect(leaver.getByTestId("refused")).toContainText("Not for this account");

    await manager.goto(`/staff/${slug}/activity`);
    const activity = manager.getByTestId("setup-activity");
    await expect(activity).toContainText("Made Rafe Loamsworth manager (was ranger)");
    await expect(activity).toContainText("Removed Lio Seasonal from the team");
    await expect(activity).toContainText("Uploaded the landmarks layer (2 shapes)");
    await shot(manager, "new-park-5-activity");
  });

  test("6. a rider subscribes, and the map shows the ground and the trail", async ({ page }) => {
    const riderEmail = email("rider");
    await signUpAndProve(page, { name: "Runa Brakeless", email: riderEmail, password: PASSWORD });
    await signInAs(page, riderEmail, PASSWORD);
    await page.goto(`/me/subscriptions?park=${slug}`);
    await page.getByRole("button", { name: "Send me these e-mails" }).click();
    await expect(page.getByRole("status")).toContainText(`open the link we just sent to ${riderEmail}`);
    await page.goto(linkIn((await mailTo(riderEmail)).at(-1)!.raw, "/api/subscriptions/confirm")!);
    await expect(page.getByTestId("confirm-done")).toContainText(`You will get notices from ${parkName}`);

    const layers = await (await page.request.get(`/api/parks/${slug}/park-layers.geojson`)).json();
    expect(layers.features.map((f: { properties: { layer: string } }) => f.properties.layer).sort()).toEqual(["boundary", "landmark", "landmark", "lift"]);
    await page.goto(`/parks/${slug}/map`);
    await expect(page.locator("[data-testid=park-map][data-map-state=idle]")).toBeVisible({ timeout: 30_000 });
    await expect(page.getByTestId("trail-text-list")).toContainText(`Larch Line ${tag()}`);
    await expect(page.getByTestId("missing-ground")).toHaveCount(0); // riders are never told what is missing
    await shot(page, "new-park-6-map");

    await manager.goto(`/staff/${slug}`);
    await expect(manager.getByTestId("setup-checklist")).toHaveCount(0); // every step is done, so the checklist steps aside
    await shot(manager, "new-park-6-staff-desk");
  });
});
