import { readFileSync } from "node:fs";
import { expect, request as apiRequest, test, type Page } from "@playwright/test";
import { demo, shot, signInAs } from "./helpers";
import { mailTo, newestLinkTo, signUpAndProve } from "./mail-helpers";

/**
 * Accounts and sessions (issue #12), in Chromium against the running app: reset, the account
 * page, sessions that end on the server, and the sign-in page's redirect rule. ASVS v5.0.0
 * requirements beside each test.
 */
const PASSWORD = "hardpack-morning-ride-5";
const NEW_PASSWORD = "loose-over-hardpack-6";

async function newRider(page: Page, label: string) {
  const email = `${label}-${Date.now()}@tests.loamcast.test`;
  await signUpAndProve(page, { name: "Kit Lowline", email, password: PASSWORD });
  await signInAs(page, email, PASSWORD);
  return email;
}

/** The session cookie a thief could have copied, replayed from a context of its own. */
async function replay(page: Page, baseURL: string) {
  const stolen = await apiRequest.newContext({ baseURL, storageState: await page.context().storageState() });
  return { status: async (path = "/api/me/setups") => (await stolen.get(path)).status(), dispose: () => stolen.dispose() };
}

test("forgot password → link → new password; the old session's cookie is refused (ASVS 6.4.1, 7.4.3)", async ({ page, browser, baseURL }) => {
  const email = await newRider(page, "reset");
  const copied = await replay(page, baseURL!);
  expect(await copied.status()).toBe(200);

  const other = await browser.newPage();
  await other.goto("/sign-in");
  await other.getByRole("link", { name: "Forgot your password?" }).click();
  await expect(other.getByRole("heading", { name: "Forgot your password?" })).toBeVisible();
  await other.getByLabel("E-mail").fill(email);
  await other.getByRole("button", { name: "E-mail me a link" }).click();
  await expect(other.getByTestId("forgot").getByRole("status")).toContainText("If an account uses that address");
  await shot(other, "account-forgot");
  await other.goto(await newestLinkTo(email, "/account/reset"));
  await other.getByLabel("New password").fill("password123");
  await other.getByRole("button", { name: "Save the new password" }).click();
  await expect(other.getByTestId("reset").getByRole("alert")).toContainText("too common");
  await other.getByLabel("New password").fill(NEW_PASSWORD);
  await other.getByRole("button", { name: "Save the new password" }).click();
  await expect(other).toHaveURL(/\/sign-in\?reset=1/);
  await shot(other, "account-reset-done");

  expect(await copied.status()).toBe(401);
  await copied.dispose();
  await signInAs(other, email, NEW_PASSWORD);
  // The link was single use.
  await other.goto(await newestLinkTo(email, "/account/reset"));
  await other.getByLabel("New password").fill("yet-another-line-7");
  await other.getByRole("button", { name: "Save the new password" }).click();
  await expect(other.getByTestId("reset").getByRole("alert")).toContainText("not valid any more");
});

test("sign-out ends the session on the server: a cookie copied before is refused (issue #12 finding 4, ASVS 7.4.1)", async ({ page, baseURL }) => {
  await signInAs(page, demo("ranger"));
  const copied = await replay(page, baseURL!);
  expect(await copied.status("/api/parks/harrow-ridge/notices")).toBe(200);
  await page.getByRole("button", { name: "Sign out" }).click();
  await expect(page.getByTestId("signed-in-as")).toHaveCount(0);
  expect(await copied.status("/api/parks/harrow-ridge/notices")).toBe(401);
  await copied.dispose();
});

test("the account page: download my data, sign out everywhere, delete my account (GDPR art. 15/17/20; ASVS 7.4.1, 6.2.3)", async ({ page, baseURL }) => {
  const email = await newRider(page, "account");
  await page.goto("/me");
  await page.getByRole("link", { name: /Account and sign-in/ }).click();
  await expect(page.getByRole("heading", { name: "Account and sign-in" })).toBeVisible();
  await shot(page, "account-page");

  const [download] = await Promise.all([page.waitForEvent("download"), page.getByRole("link", { name: "Download my data" }).click()]);
  expect(download.suggestedFilename()).toMatch(/^loamcast-my-data-\d{4}-\d{2}-\d{2}\.json$/);
  const data = JSON.parse(readFileSync(await download.path(), "utf8"));
  expect(data.account.email).toBe(email);
  expect(Object.keys(data)).toEqual(expect.arrayContaining(["setups", "rideLogs", "subscriptions"]));

  // Sign out everywhere: this session ends too.
  const copied = await replay(page, baseURL!);
  const everywhere = page.getByTestId("sign-out-everywhere");
  await everywhere.getByLabel("Current password").fill(PASSWORD);
  await everywhere.getByRole("button", { name: "Sign out everywhere" }).click();
  await expect(page).toHaveURL(/\/sign-in$/);
  expect(await copied.status()).toBe(401);
  await copied.dispose();

  // Delete: a wrong password first, then the right one; afterwards sign-in fails.
  await signInAs(page, email, PASSWORD, "/me/account");
  await page.goto("/me/account");
  const deletion = page.getByTestId("delete-account");
  await deletion.getByLabel("Current password").fill("not-my-password");
  await deletion.getByRole("button", { name: "Delete my account" }).click();
  await expect(deletion.getByRole("alert").first()).toContainText("not your current password");
  await deletion.getByLabel("Current password").fill(PASSWORD);
  await deletion.getByRole("button", { name: "Delete my account" }).click();
  await expect(page).toHaveURL(/\/\?account=deleted/);
  const mailsBefore = (await mailTo(email)).length;
  await page.goto("/sign-in");
  await page.getByLabel("E-mail").fill(email);
  await page.getByLabel("Password").fill(PASSWORD);
  await page.getByRole("button", { name: "Sign in" }).click();
  await expect(page.locator("form [role=alert]").first()).toContainText("do not match");
  // A reset request for the deleted address sends nothing.
  await page.request.post("/api/account/password-reset", { data: { email } });
  expect((await mailTo(email)).length).toBe(mailsBefore);
});

test("the last manager of a park cannot delete the account (409)", async ({ page }) => {
  await signInAs(page, demo("manager"));
  const response = await page.request.delete("/api/me", { data: { password: "ridgeline-demo-7" } });
  // Harrow Ridge has one manager in the demo.
  expect(response.status()).toBe(409);
  expect((await response.json()).error.message).toMatch(/last manager of Harrow Ridge/);
});

test.describe("no open redirect after sign-in (issue #12 finding 2, ASVS v5.0.0 3.7.2)", () => {
  for (const [label, value] of [
    ["a backslash", "%2F%5C127.0.0.1%3A3999%2Fstolen"],
    ["a tab", "%2F%09%2F127.0.0.1%3A3999%2Fstolen"],
    ["//host", "%2F%2F127.0.0.1%3A3999%2Fstolen"],
    ["javascript:", "javascript%3Aalert(1)"],
  ]) {
    test(`a callbackUrl with ${label} stays on our origin`, async ({ page, baseURL }) => {
      await page.goto(`/sign-in?callbackUrl=${value}`);
      await page.getByLabel("E-mail").fill(demo("rider"));
      await page.getByLabel("Password").fill("ridgeline-demo-7");
      await page.getByRole("button", { name: "Sign in" }).click();
      await expect(page.getByTestId("signed-in-as")).toBeVisible();
      expect(new URL(page.url()).origin).toBe(new URL(baseURL!).origin);
    });
  }
});

test("next-auth's own sign-in page answers a hostile callbackUrl with no 5xx (issue #12 finding 7)", async ({ request }) => {
  for (const value of ["javascript:alert(1)", "%ZZ", "https://evil.example/", "%2F%5Cevil.example"]) {
    const response = await request.get(`/api/auth/signin?callbackUrl=${value}`, { maxRedirects: 0 });
    expect(response.status(), value).toBe(400);
    expect(response.headers()["location"] ?? "", value).not.toMatch(/evil\.example|javascript:/);
  }
});

test("a junk session cookie reads as signed out, not an error (issue #12 finding 7)", async ({ page, baseURL }) => {
  const host = new URL(baseURL!).hostname;
  await page.context().addCookies([{ name: "next-auth.session-token", value: "junk.junk.junk", domain: host, path: "/" }]);
  const response = await page.goto("/staff");
  expect(response?.status()).toBeLessThan(500);
  await expect(page).toHaveURL(/\/sign-in/);
});
