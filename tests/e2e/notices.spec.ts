import { execFile } from "node:child_process";
import { promisify } from "node:util";
import { expect, request as apiRequest, test } from "@playwright/test";
import { demo, shot, signInAs } from "./helpers";
import { linkIn, mailTo, readable, signUpAndProve } from "./mail-helpers";

/**
 * A rider subscribes and confirms by the e-mailed link; a ranger sends a closure from the staff
 * page; the rider's e-mail arrives and its unsubscribe link works without signing in.
 *
 * The app under test runs `next start` alone, with no worker process. After sending, this test
 * runs the real worker once (`tsx scripts/worker.ts --once`, same environment) as `npm start`
 * would in the background. Mail is read from the fake SMTP server's control API.
 */
const run = promisify(execFile);
const PASSWORD = "switchback-dawn-patrol-8";

test("a rider subscribes and confirms, staff send a closure, the rider's e-mail arrives and unsubscribes in one click", async ({ page, browser, baseURL }) => {
  test.setTimeout(120_000);
  const email = `notice-rider-${Date.now()}@tests.loamcast.test`;
  await signUpAndProve(page, { name: "Noa Trailhead", email, password: PASSWORD });

  // 1. Subscribe.
  await signInAs(page, email, PASSWORD);
  await page.goto("/me/subscriptions?park=harrow-ridge");
  await expect(page.getByLabel("Park", { exact: true })).toHaveValue("harrow-ridge");
  await expect(page.getByLabel("Every trail in the park")).toBeChecked();
  await expect(page.getByLabel("Closures", { exact: true })).toBeChecked();
  await page.getByRole("button", { name: "Send me these e-mails" }).click();
  await expect(page.getByRole("status")).toContainText(`open the link we just sent to ${email}`);
  await expect(page.getByTestId("subscription-harrow-ridge")).toContainText("Waiting for you to confirm");
  await shot(page, "notices-subscribe");

  // 2. Confirm by the link in the e-mail.
  const confirmation = (await mailTo(email)).at(-1)!;
  const confirmLink = linkIn(confirmation.raw, "/api/subscriptions/confirm");
  expect(confirmLink).toMatch(new RegExp(`^${baseURL}/api/subscriptions/confirm\\?token=`));
  await page.goto(confirmLink!);
  await expect(page.getByTestId("confirm-done")).toContainText("You will get notices from Harrow Ridge Bike Park");
  await page.goto("/me/subscriptions");
  await expect(page.getByTestId("subscription-harrow-ridge")).toContainText("On");

  // 3. A ranger writes a closure (prefilled as the conditions page would link it), previews and sends.
  const staff = await browser.newContext({ ...test.info().project.use });
  const ranger = await staff.newPage();
  await signInAs(ranger, demo("ranger"));
  const message = "Overnight storm: every trail closed while the crew clears fallen trees. Next update at 11:00.";
  await ranger.goto(`/staff/harrow-ridge/notices/new?kind=closure&message=${encodeURIComponent(message)}`);
  await expect(ranger.getByLabel("Closure", { exact: true })).toBeChecked();
  await expect(ranger.getByLabel("Message to riders")).toHaveValue(message);
  await ranger.getByRole("button", { name: "Preview the e-mail" }).click();
  const preview = ranger.getByTestId("notice-preview");
  await expect(preview).toContainText("Subject: Harrow Ridge Bike Park: all trails closed");
  await expect(ranger.getByTestId("recipient-count")).toHaveText(/This goes to \d+ riders?\./);
  await expect(ranger.frameLocator("iframe[title='E-mail preview']").getByText("every trail closed while the crew")).toBeVisible();
  await shot(ranger, "notices-preview");
  await preview.getByRole("button", { name: /^Send to \d+ riders?$/ }).click();
  await expect(ranger).toHaveURL(/\/staff\/harrow-ridge\/notices\/[0-9a-f-]{36}\?sent=1$/);
  await expect(ranger.getByTestId("sending-banner")).toContainText("This page follows the deliveries by itself.");

  // 4. The worker sends it (one pass, as the background worker of npm start does continuously).
  const worker = await run("node_modules/.bin/tsx", ["--conditions=react-server", "scripts/worker.ts", "--once"], { env: process.env, timeout: 60_000 });
  expect(worker.stdout).toMatch(/done: \d+ sent/);
  // No reload: the page reads the deliveries again by itself, and the banner goes once all are settled.
  await expect(ranger.getByTestId("sending-banner")).toHaveCount(0, { timeout: 15_000 });
  const summary = ranger.getByTestId("delivery-summary");
  await expect(summary).toContainText(/^\d+ delivered$/);
  await expect(ranger.getByRole("row").filter({ hasText: email })).toContainText("delivered");
  await shot(ranger, "notices-deliveries");
  await staff.close();

  // 5. The e-mail arrived once, with RFC 8058 headers and a working unsubscribe link.
  const notices = (await mailTo(email)).filter((m) => /^Subject: Harrow Ridge Bike Park: all trails closed/m.test(readable(m.raw)));
  expect(notices).toHaveLength(1);
  const raw = readable(notices[0].raw);
  expect(raw).toMatch(/^List-Unsubscribe-Post: List-Unsubscribe=One-Click\r?$/m);
  const oneClick = /^List-Unsubscribe: <([^>]+)>/m.exec(raw)![1];
  const unsubscribePage = linkIn(notices[0].raw, "/unsubscribe")!;
  expect(raw).toContain(message);

  // Opened in a browser with no session at all.
  const stranger = await browser.newContext({ ...test.info().project.use });
  const anon = await stranger.newPage();
  await anon.goto(unsubscribePage);
  await expect(anon.getByRole("heading", { name: "Stop notices from Harrow Ridge Bike Park?" })).toBeVisible();
  await shot(anon, "notices-unsubscribe");
  await anon.getByRole("button", { name: "Stop these e-mails" }).click();
  await expect(anon.getByTestId("unsubscribe-done")).toContainText("You are unsubscribed");
  await stranger.close();

  // The one-click POST a mail provider makes: no cookies, no Origin; the token is the authority.
  const provider = await apiRequest.newContext();
  const again = await provider.post(oneClick, { form: { "List-Unsubscribe": "One-Click" } });
  expect(again.status()).toBe(200);
  expect(await again.json()).toMatchObject({ unsubscribed: true, wasSubscribed: false });
  const tampered = await provider.post(oneClick.replace(/.(.)$/, (_, last: string) => (last === "A" ? "BB" : "AA")), { form: { "List-Unsubscribe": "One-Click" } });
  expect(tampered.status()).toBe(400);
  await provider.dispose();

  await page.goto("/me/subscriptions");
  await expect(page.getByTestId("subscription-harrow-ridge")).toContainText("Stopped");
});

test("a rider and another park's ranger cannot send notices for Harrow Ridge", async ({ page }) => {
  const body = { kind: "closure", message: "Should not be sent." };
  await signInAs(page, demo("rider"));
  expect((await page.request.post("/api/parks/harrow-ridge/notices", { data: body })).status()).toBe(403);
  expect((await page.goto("/staff/harrow-ridge/notices/new"))?.status()).toBe(403);
  await expect(page.getByTestId("refused")).toContainText("Not for this account");

  await page.context().clearCookies();
  await signInAs(page, "ranger@cinder.loamcast.test");
  const refused = await page.request.post("/api/parks/harrow-ridge/notices", { data: body });
  expect(refused.status()).toBe(403);
  expect((await page.request.get("/api/parks/harrow-ridge/notices")).status()).toBe(403);
  await page.goto("/staff/harrow-ridge/notices/new");
  await expect(page.getByRole("heading", { name: /new notice/ })).toHaveCount(0);
});

test("the admin reads captured mail decoded: GET /api/dev/mail gives text and html beside raw, the page frames the HTML", async ({ page }) => {
  await signInAs(page, demo("admin"), undefined, "/admin/mail");
  const { messages } = await (await page.request.get("/api/dev/mail")).json();
  const withHtml = (messages as { raw: string; text: string; html: string | null; subject: string }[]).filter((m) => m.html);
  expect(withHtml.length).toBeGreaterThan(0);
  const mail = withHtml.at(-1)!;
  // The transfer encoding (RFC 2045 §6.7 quoted-printable, or base64) is undone: the link is whole
  // in the decoded text, while the raw message carries it only encoded.
  const link = /https?:\/\/\S+\?token=[A-Za-z0-9._%-]+/.exec(mail.text)?.[0];
  expect(link).toBeTruthy();
  expect(mail.raw).not.toContain(link);
  expect(mail.text).not.toMatch(/=\r?\n|=3D/);
  expect(mail.html).toMatch(/<a [^>]*href="https?:\/\//);
  await page.goto("/admin/mail");
  const first = page.getByTestId("captured-mail").first();
  await first.getByText("As the rider sees it (HTML)").click();
  await expect(first.locator("iframe")).toHaveAttribute("sandbox", "");
  await shot(page, "admin-mail-decoded");
});
