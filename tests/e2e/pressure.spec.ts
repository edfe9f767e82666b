import { expect, test, type Page } from "@playwright/test";
import { demo, shot, signInAs } from "./helpers";

const STANDARD_CAUTION = "Never go above the tyre's or the rim's printed maximum pressure";

/** Presses Tab until the focused control is labelled `label`; returns how many presses it took. */
async function tabTo(page: Page, label: string | RegExp, max = 150): Promise<number> {
  for (let presses = 1; presses <= max; presses++) {
    await page.keyboard.press("Tab");
    const name = await page.evaluate(() => {
      const el = document.activeElement as HTMLInputElement | null;
      return (el?.labels?.[0]?.textContent ?? el?.getAttribute("aria-label") ?? el?.textContent ?? "").trim();
    });
    if (typeof label === "string" ? name === label : label.test(name)) return presses;
  }
  throw new Error(`Tab never reached ${label}`);
}

test("an anonymous rider gets a band for an unsaved setup, with the cautions", async ({ page }) => {
  await page.goto("/pressure");
  await expect(page.getByRole("heading", { name: "Today's pressure" })).toBeVisible();
  // Cautions are on the page before anything is asked.
  await expect(page.getByTestId("cautions")).toContainText(STANDARD_CAUTION);
  await expect(page.getByLabel("Park")).toHaveValue("harrow-ridge");
  // The bike is asked in three steps; the first stops only on its own fields.
  await expect(page.getByRole("button", { name: "Show my pressure band" })).toHaveCount(0);
  await page.getByRole("button", { name: "Next: Wheels and tyres" }).click();
  await expect(page.locator("#setup-rider-mass-error")).toContainText("is required");
  await expect(page.getByLabel("Rider with kit (kg)")).toBeFocused();
  await page.getByLabel("Rider with kit (kg)").fill("72");
  await page.getByLabel("Bike (kg)").fill("15.5");
  await page.getByRole("button", { name: "Next: Wheels and tyres" }).click();
  await expect(page.getByRole("heading", { name: "Step 2 of 3: Wheels and tyres" })).toBeFocused();
  await expect(page.getByTestId("bike-steps")).toContainText("Rider 72 kg, bike 15.5 kg, steady pace");
  await page.getByLabel("Front wheel: tyre's printed maximum (psi)").fill("40");
  await page.getByRole("button", { name: "Next: Pressures that have worked" }).click();
  // The rear maximum is missing: the field says "required", focus moves to it, and nothing typed is lost.
  await expect(page.locator("#setup-rear-max-error")).toContainText("is required");
  await expect(page.getByLabel("Rear wheel: tyre's printed maximum (psi)")).toBeFocused();
  await expect(page.getByLabel("Front wheel: tyre's printed maximum (psi)")).toHaveValue("40");
  await page.getByLabel("Rear wheel: tyre's printed maximum (psi)").fill("40");
  await page.getByRole("button", { name: "Next: Pressures that have worked" }).click();
  await expect(page.getByRole("heading", { name: "Step 3 of 3: Pressures that have worked" })).toBeFocused();
  await shot(page, "pressure-bike-step-3");
  await page.getByRole("button", { name: "Show my pressure band" }).click();

  const result = page.getByTestId("band-result");
  await expect(result).toContainText("A starting estimate");
  await expect(page.getByTestId("band-front")).toContainText(/\d+\.\d psi/);
  await expect(page.getByTestId("band-rear")).toContainText("Pump to");
  await expect(page.getByTestId("reasons")).toContainText("Starting point for 87.5 kg");
  await expect(page.getByTestId("reasons")).toContainText("29 × 2.4 in tyres");
  // Band values to 0.5 psi on screen.
  await expect(page.getByTestId("band-front")).toContainText(/\d+\.[05] psi/);
  await expect(page.getByTestId("cautions")).toContainText(STANDARD_CAUTION);
  await expect(page.getByTestId("cautions")).toContainText("Check both tyres with a gauge");
  await shot(page, "pressure-anonymous-band");

  // A finished step is one click away: the pressure unit switch (step 1) re-words the band and the
  // maximums typed in step 2; the setup can be kept on this device only.
  await page.getByRole("button", { name: /^Change: 1\. Rider and bike/ }).click();
  await page.getByRole("group", { name: "Pressure in" }).getByText("bar", { exact: true }).click();
  await page.getByRole("button", { name: /^Change: 2\. Wheels and tyres/ }).click();
  await expect(page.getByLabel("Rear wheel: tyre's printed maximum (bar)")).toHaveValue("2.758"); // 40 psi (NIST SP 811)
  await page.getByRole("button", { name: "Next: Pressures that have worked" }).click();
  await page.getByLabel(/Keep this setup on this device/).check();
  await page.getByRole("button", { name: "Show my pressure band" }).click();
  await expect(page.getByTestId("band-front")).toContainText(/\d\.\d\d bar/);
  // Back on this device, the kept bike opens at its last step, ready to submit; nothing was lost.
  await page.reload();
  await expect(page.getByRole("button", { name: "Show my pressure band" })).toBeVisible();
  await expect(page.getByTestId("bike-steps")).toContainText("Rider 72 kg, bike 15.5 kg, steady pace");
  await page.getByRole("button", { name: /^Change: 2\. Wheels and tyres/ }).click();
  await expect(page.getByLabel("Rear wheel: tyre's printed maximum (bar)")).toHaveValue("2.758");
  await page.getByRole("button", { name: /^Change: 1\. Rider and bike/ }).click();
  await expect(page.getByLabel("Rider with kit (kg)")).toHaveValue("72");
});

test("a refusal from the server reopens the step that holds the field, with focus on it", async ({ page }) => {
  // The server's own checks can refuse what the browser's let through (the same schema, but a
  // newer server may know more); the faked answer has the shape of the API's 422.
  await page.route("**/api/pressure", (route) =>
    route.fulfill({ status: 422, contentType: "application/json", body: JSON.stringify({ error: { message: "Front wheel: tyre's printed maximum must be at most 100 psi.", field: "front.maxKpa" } }) }),
  );
  await page.goto("/pressure");
  await page.getByLabel("Rider with kit (kg)").fill("80");
  await page.getByLabel("Bike (kg)").fill("16");
  await page.getByLabel("Bike (kg)").press("Enter"); // Enter goes on to the next step
  await expect(page.getByRole("heading", { name: "Step 2 of 3: Wheels and tyres" })).toBeFocused();
  await page.getByLabel("Front wheel: tyre's printed maximum (psi)").fill("40");
  await page.getByLabel("Rear wheel: tyre's printed maximum (psi)").fill("40");
  await page.getByRole("button", { name: "Next: Pressures that have worked" }).click();
  await page.getByLabel("Front (psi)").fill("20");
  await page.getByLabel("Rear (psi)").fill("23");
  await page.getByRole("button", { name: "Show my pressure band" }).click();
  await expect(page.getByRole("heading", { name: "Step 2 of 3: Wheels and tyres" })).toBeVisible();
  await expect(page.locator("#setup-front-max-error")).toHaveText("Front wheel: tyre's printed maximum must be at most 100 psi.");
  await expect(page.getByLabel("Front wheel: tyre's printed maximum (psi)")).toBeFocused();
  await expect(page.getByRole("form", { name: "Today's pressure" }).getByRole("alert")).toContainText("at most 100 psi");
  await expect(page.getByTestId("bike-steps")).toContainText("Front 20, rear 23 psi");
  await expect(page.getByTestId("band-result")).toHaveCount(0);
});

test("the demo rider picks a saved setup and today's trails, and sees band, reasons and cautions", async ({ page }) => {
  await signInAs(page, demo("rider"), undefined, "/pressure");
  await page.goto("/pressure");
  await expect(page.getByRole("radio", { name: /Hardpack 29er/ })).toBeChecked();
  // A saved setup goes straight to today's band, before anything is typed; the demo rider has logged
  // rides on it, so the band starts from them.
  await expect(page.getByTestId("band-result")).toContainText("From your own logged rides on this setup.");
  await page.getByRole("button", { name: "None" }).click();
  await page.getByLabel("Tumblewire").check();
  await page.getByLabel("Gnarlroot").check();
  // …and follows the day as the trails change: the ground line names today's reported surfaces of
  // those two trails (other journeys report on them earlier in the run, so read them from the board).
  await expect(page.getByTestId("band-result")).toContainText("Harrow Ridge Bike Park, 2 trails. Ground:");
  const board = (await (await page.request.get("/api/parks/harrow-ridge/board")).json()) as { trails: { name: string; inspectedToday: boolean; surfaces: string[] }[] };
  const planned = board.trails.filter((t) => (t.name === "Tumblewire" || t.name === "Gnarlroot") && t.inspectedToday);
  const surfaces = new Set(planned.flatMap((t) => t.surfaces));
  expect(surfaces.size).toBeGreaterThan(0);
  for (const surface of surfaces) await expect(page.getByTestId("band-result")).toContainText(`${surface} on `);
  const reasons = page.getByTestId("reasons");
  const ridesRow = reasons.locator('tr[data-reason="basis-rides"], tr[data-reason="basis-rides-disagree"]');
  await expect(ridesRow).toContainText(/From \d+ of your rides on this setup/);
  // Support takes the most demanding planned trail and names it.
  await expect(reasons).toContainText(/(Jumps|Drops|Jumps and drops) on (Tumblewire|Gnarlroot)/);
  await expect(page.getByTestId("cautions")).toContainText(STANDARD_CAUTION);
  await expect(page.getByTestId("cautions")).toContainText("Follow park signage, closures and staff instructions.");
  await shot(page, "pressure-rider-band");
});

test("keyboard only: Tab to each field, type, Space to tick, Enter to submit", async ({ page }) => {
  await page.goto("/pressure");
  await tabTo(page, "None");
  await page.keyboard.press("Enter");
  await tabTo(page, /^Slatebelt Flow/);
  await page.keyboard.press("Space");
  await tabTo(page, "Rider with kit (kg)");
  await page.keyboard.type("64");
  expect(await tabTo(page, "Bike (kg)")).toBe(1);
  await page.keyboard.type("14");
  // Enter in a field goes on to the next step, whose heading takes focus.
  await page.keyboard.press("Enter");
  await expect(page.getByRole("heading", { name: "Step 2 of 3: Wheels and tyres" })).toBeFocused();
  await tabTo(page, "Front wheel: tyre's printed maximum (psi)");
  await page.keyboard.type("45");
  await tabTo(page, "Rear wheel: tyre's printed maximum (psi)");
  await page.keyboard.type("45");
  await page.keyboard.press("Enter");
  await expect(page.getByRole("heading", { name: "Step 3 of 3: Pressures that have worked" })).toBeFocused();
  await tabTo(page, "Show my pressure band");
  await page.keyboard.press("Enter");
  const heading = page.getByRole("heading", { name: "Today's band" });
  await expect(heading).toBeFocused();
  await expect(page.getByTestId("reasons")).toContainText("Slatebelt Flow");
  await expect(page.getByTestId("cautions")).toContainText(STANDARD_CAUTION);
});

test("a new setup: errors per field keep what was typed; the sag check is shown live", async ({ page }) => {
  await signInAs(page, demo("rider"), undefined, "/me/setups/new");
  await page.goto("/me/setups/new");
  await page.getByLabel("Name").fill("Trail test bike");
  await page.getByLabel("Rider with kit (kg)").fill("80");
  await page.getByLabel("Bike (kg)").fill("16");
  await page.getByLabel("Front wheel: tyre width (inches)").fill("24");
  await page.getByLabel("Front wheel: tyre's printed maximum (psi)").fill("50");
  await page.getByRole("button", { name: "Same as the front" }).click();
  await page.getByRole("button", { name: "Save setup" }).click();
  await expect(page.locator("#setup-front-width-error")).toHaveText("Tyre width must be at most 4.72 in.");
  await expect(page.getByLabel("Name")).toHaveValue("Trail test bike");
  await page.getByLabel("Front wheel: tyre width (inches)").fill("2.4");
  await page.getByLabel("Rear wheel: tyre width (inches)").fill("2.4");
  await expect(page.locator("#setup-front-width-error")).toHaveText("");
  await page.getByLabel("Shock stroke (mm)").fill("60");
  await page.getByLabel("Rear sag (mm)").fill("17");
  await expect(page.getByTestId("sag-rear")).toContainText("Rear: 28.3 % — In range (target 25–30 %)");
  await page.getByLabel("Rear sag (mm)").fill("24");
  await expect(page.getByTestId("sag-rear")).toContainText("Too much sag");
  await page.getByRole("button", { name: "Save setup" }).click();
  await expect(page).toHaveURL(/\/me\/setups\/[0-9a-f-]{36}\?saved=1/);
  await expect(page.getByRole("status").filter({ hasText: "Setup saved." })).toBeVisible();
  await expect(page.getByTestId("sag-rear")).toContainText("40.0 %");
  await shot(page, "setup-editor");
});

test("a ride log produces one suggestion, which the rider applies to the baseline", async ({ page }) => {
  await signInAs(page, demo("rider2"), undefined, "/me/rides/new");
  await page.goto("/me/rides/new");
  await expect(page.getByLabel("Front (psi)")).toHaveValue("17");
  await page.getByRole("group", { name: "Front tyre" }).getByLabel("Sliding").check();
  await page.getByRole("group", { name: "Rear tyre" }).getByLabel("Rim strike").check();
  await page.getByRole("button", { name: "Log ride and get one suggestion" }).click();
  const suggestion = page.getByTestId("suggestion");
  // +7 % of the 19.5 psi run on the rear.
  await expect(page.getByTestId("suggestion-change")).toHaveText("+1.4 psi rear");
  await expect(suggestion).toContainText("Rear rim strike");
  await expect(suggestion).not.toContainText("Front sliding");
  await shot(page, "ride-suggestion");
  await page.getByRole("button", { name: "Apply to my baseline" }).click();
  await expect(page.getByRole("status")).toContainText("Baseline of Light climber is now 17.0 psi front, 20.9 psi rear.");
  await page.goto("/me/rides");
  await expect(page.getByTestId("ride-history")).toContainText("applied");
});

test("My bike links to setups, rides and notices, and keeps the rider's units", async ({ page }) => {
  await signInAs(page, demo("rider"), undefined, "/me");
  await page.goto("/me");
  const links = page.getByRole("navigation", { name: "My bike" });
  for (const name of ["My setups", "My rides", "My notices"]) await expect(links.getByRole("link", { name: new RegExp(name) })).toBeVisible();
  await page.getByText("kPa", { exact: true }).click();
  await page.getByRole("button", { name: "Save units" }).click();
  await expect(page.getByRole("status")).toContainText("Units saved.");
  await shot(page, "my-bike");
  await page.goto("/me/setups");
  await expect(page.getByText(/baseline 141 kPa \/ 165 kPa/)).toBeVisible();
  // Back to psi for the other journeys.
  await page.goto("/me");
  await page.getByText("psi", { exact: true }).click();
  await page.getByRole("button", { name: "Save units" }).click();
  await expect(page.getByRole("status")).toContainText("Units saved.");
});

test("the API: public band, 422 for another park's trails, 401 and 404 for setups", async ({ request }) => {
  const setup = { riderMassKg: 72, bikeMassKg: 15.5, pace: "steady", front: { bsdMm: 622, widthMm: 61, casing: "trail", insert: false, tubeless: true, maxKpa: 276 } };
  const body = { ...setup, rear: setup.front, baseline: { frontKpa: 131, rearKpa: 159, surfaces: ["dry"], temperatureC: 18 } };
  const ok = await request.post("/api/pressure", { data: { ...body, today: { parkSlug: "harrow-ridge", airTemperatureC: 6, pumpTemperatureC: 20, pumpElevationM: 620 } } });
  expect(ok.status()).toBe(200);
  const band = await ok.json();
  expect(band.basis).toBe("baseline");
  expect(Object.keys(band.front).sort()).toEqual(["deltaKpa", "highKpa", "lowKpa", "pumpToKpa", "targetKpa"]);
  expect(band.reasons.map((r: { id: string }) => r.id)).toEqual(expect.arrayContaining(["basis-baseline", "pump-temperature", "pump-elevation"]));
  // The day rides at the planned trails' midpoint; the maximum is checked at their top.
  expect(band.conditions.rideElevationM).toBe(Math.round((band.conditions.lowestElevationM + band.conditions.highestElevationM) / 2));
  expect(band.conditions.highestElevationM).toBeGreaterThan(band.conditions.lowestElevationM);
  expect(band.uncertainty.front.elevationKpa).toBeGreaterThan(0);
  expect(band.cautions).toContain("Never go above the tyre's or the rim's printed maximum pressure, whichever is lower.");

  const trails = (await (await request.post("/api/pressure", { data: { ...body, today: { parkSlug: "harrow-ridge" } } })).json()).conditions.trails;
  const wrongPark = await request.post("/api/pressure", { data: { ...body, today: { parkSlug: "cinder-hollow", trailIds: [trails[0].id] } } });
  expect(wrongPark.status()).toBe(422);
  expect((await wrongPark.json()).error.field).toBe("today.trailIds");

  expect((await request.get("/api/me/setups")).status()).toBe(401);
  expect((await request.post("/api/pressure", { data: { setupId: "00000000-0000-4000-8000-000000000000" } })).status()).toBe(401);
});

test("another rider's setup is 404 over HTTP", async ({ page, browser }) => {
  await signInAs(page, demo("rider"));
  const { setups } = await (await page.request.get("/api/me/setups")).json();
  const other = await browser.newPage();
  await signInAs(other, demo("rider2"));
  expect((await other.request.get(`/api/me/setups/${setups[0].id}`)).status()).toBe(404);
  const patch = await other.request.patch(`/api/me/setups/${setups[0].id}`, { data: { lockVersion: 0, name: "Taken" } });
  expect(patch.status()).toBe(404);
  const stale = await page.request.patch(`/api/me/setups/${setups[0].id}`, { data: { lockVersion: setups[0].lockVersion + 5, name: "Stale" } });
  expect(stale.status()).toBe(409);
  await other.close();
});

test("every rule is documented on a public page, with its id, numbers and source", async ({ page }) => {
  await page.goto("/pressure/how-it-works");
  await expect(page.getByRole("heading", { name: "How the pressure band works" })).toBeVisible();
  const wet = page.locator("#rule-grip-wet");
  await expect(wet.getByRole("link", { name: /Link to this rule/ })).toHaveAttribute("href", "#rule-grip-wet");
  await expect(wet).toContainText("front \u22125.5\u00a0%, rear \u22123.2\u00a0%");
  await expect(wet).toContainText("common practice");
  await expect(page.locator("#rule-basis-rides")).toContainText("your own rides");
  await expect(page.locator("body")).not.toContainText(/from memory/i);
  await expect(page.locator("#rule-atmosphere-iso-2533")).toContainText("ISO 2533:1975");
  await expect(page.getByRole("heading", { name: "Always" })).toBeVisible();
  await shot(page, "pressure-how-it-works");
});
