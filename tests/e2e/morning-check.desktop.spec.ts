import { expect, test, type Locator, type Page } from "@playwright/test";
import { demo, shot, signInAs } from "./helpers";

/**
 * The ranger's morning check, measured: one closure with a reason among the park's trails in at
 * most five taps plus typing the reason, and the result of the save in view without scrolling.
 * Taps are counted by the page itself (every pointerdown the browser receives), not by the test.
 * Runs on the phone (412 × 915, touch) and the desktop (1280 × 860, mouse).
 */
const PAGE = "/staff/harrow-ridge/morning-check";
const TRAIL = "Scree Stairs";
const row = (page: Page, name: string) => page.locator(`[data-testid="check-trail"][data-trail-name="${name}"]`);

async function countTaps(page: Page) {
  await page.evaluate(() => {
    const w = window as unknown as { taps: number };
    w.taps = 0;
    document.addEventListener("pointerdown", () => w.taps++, { capture: true });
  });
}
const taps = (page: Page) => page.evaluate(() => (window as unknown as { taps: number }).taps);
const press = (page: Page, target: Locator) => (test.info().project.name === "phone" ? target.tap() : target.click());

test.describe.configure({ mode: "serial" });

test("one closure with a reason among every trail: at most 5 taps plus the reason, the result in view", async ({ page }) => {
  await signInAs(page, demo("ranger"), undefined, PAGE);
  await page.goto(PAGE);
  await expect(page.getByRole("heading", { level: 1, name: "Morning check" })).toBeVisible();
  const total = await page.getByTestId("check-trail").count();
  expect(total).toBeGreaterThanOrEqual(10);
  // Compact rows: the page is a list, not a stack of forms.
  const rowHeights = await page.getByTestId("check-trail").evaluateAll((rows) => rows.map((r) => r.getBoundingClientRect().height));
  expect(Math.max(...rowHeights)).toBeLessThan(200);
  await shot(page, "check-start");

  await countTaps(page);
  const trail = row(page, TRAIL);
  await press(page, trail.getByRole("button", { name: "Change", exact: true }));
  await press(page, trail.getByRole("radio", { name: "Closed" }));
  // The reason field has the cursor already: the ranger only types.
  await expect(trail.getByLabel("Reason (closed)")).toBeFocused();
  await page.keyboard.type("Rockfall on the second stair after the frost");
  const rest = page.getByRole("button", { name: /^Mark the rest unchanged/ });
  if (await rest.isEnabled()) await press(page, rest);
  // A trail never reported (one another journey uploaded today) has no last state to keep: it stays to check.
  const neverReported = await page.locator('[data-testid="check-trail"][data-last-state="none"]').count();
  await expect(page.getByTestId("check-count")).toContainText(`${total - neverReported} of ${total} trails checked today`);
  await shot(page, "check-marked");
  await press(page, page.getByRole("button", { name: /^Save \d+ trails?$/ }));

  const outcome = page.getByTestId("check-outcome");
  await expect(outcome).toContainText(/Saved \d+ trails?\. Riders see it on the board now\./);
  expect(await taps(page)).toBeLessThanOrEqual(5);
  // The result and the notice it calls for are on screen and focused, where the ranger is.
  await expect(outcome).toBeInViewport();
  await expect(outcome).toBeFocused();
  const notice = page.getByRole("link", { name: "Send a closure notice to riders" });
  await expect(notice).toBeInViewport();
  expect(decodeURIComponent((await notice.getAttribute("href"))!)).toContain(`${TRAIL} is closed: Rockfall on the second stair after the frost.`);
  await expect(page.getByRole("link", { name: "Send a reopening notice to riders" })).toHaveCount(0);
  await expect(trail).toContainText("Rockfall on the second stair after the frost");
  await expect(trail.getByTestId("mode")).toHaveText("Checked today");
  await page.screenshot({ path: `.local/test-results/screens/check-saved-viewport-${page.viewportSize()?.width}.png` });
});

test("kept closed offers no closure notice again; reopening offers the reopening notice", async ({ page }) => {
  await signInAs(page, demo("ranger"), undefined, PAGE);
  await page.goto(PAGE);
  const trail = row(page, TRAIL);
  await trail.getByRole("button", { name: "Unchanged" }).click();
  await page.getByRole("button", { name: "Save 1 trail" }).click();
  await expect(page.getByTestId("check-outcome")).toContainText("Saved 1 trail.");
  await expect(page.getByRole("link", { name: /Send a (closure|reopening) notice/ })).toHaveCount(0);

  await trail.getByRole("button", { name: "Change", exact: true }).click();
  await trail.getByRole("radio", { name: "Open" }).click();
  await page.getByRole("button", { name: "Save 1 trail" }).click();
  const reopening = page.getByRole("link", { name: "Send a reopening notice to riders" });
  await expect(reopening).toBeInViewport();
  await expect(reopening).toHaveAttribute("href", /kind=reopening&trailIds=[0-9a-f-]{36}&message=.*open%20again/);
  await expect(page.getByRole("link", { name: "Send a closure notice to riders" })).toHaveCount(0);
});

test("a refused save brings the trail that needs attention into view and says why", async ({ page }) => {
  await signInAs(page, demo("ranger"), undefined, PAGE);
  await page.goto(PAGE);
  const names = await page.getByTestId("check-trail").evaluateAll((rows) => rows.map((r) => r.getAttribute("data-trail-name")!));
  const last = row(page, names.at(-1)!);
  await last.getByRole("button", { name: "Change", exact: true }).click();
  await last.getByRole("radio", { name: "Caution" }).click();
  // No reason typed; scroll to the top as if reading the park-wide notice, then save.
  await page.evaluate(() => window.scrollTo(0, 0));
  await page.getByRole("button", { name: "Save 1 trail" }).click();
  await expect(page.getByTestId("check-outcome")).toContainText("1 trail needs attention. Nothing was saved.");
  await expect(last.getByRole("alert")).toBeInViewport();
  await expect(last).toBeFocused();
});
