import { execFile } from "node:child_process";
import { promisify } from "node:util";
import { expect, test, type Page } from "@playwright/test";
import { decryptPush, newTestBrowserKeys } from "../../scripts/fakes/push-browser";
import { demo, shot, signInAs } from "./helpers";
import { signUpAndProve } from "./mail-helpers";

/**
 * The trail notices page on a phone and a desktop: a rider turns on push alerts for this browser,
 * a closure is pushed to it once (read back from the local fake push service and decrypted with
 * the browser's keys), the service worker shows it, and the rider stops it again. And the form
 * keeps the park the rider chose (#15).
 *
 * Headless Chromium has PushManager but no push service: subscribe() rejects with "Registration
 * failed - permission denied". So only that one call is stood in for, by a subscription whose
 * endpoint is the local fake push service and whose keys the test holds; everything else (the
 * page, our API, the queue, the worker, VAPID, encryption, the service worker) is the real thing.
 */
const run = promisify(execFile);
const PASSWORD = "switchback-dawn-patrol-8";
const PARK = { slug: "cinder-hollow", name: "Cinder Hollow Shuttle Park" };

async function newRider(page: Page, tag: string) {
  const email = `${tag}-${Date.now()}-${test.info().project.name}@tests.loamcast.test`;
  await signUpAndProve(page, { name: "Ines Switchback", email, password: PASSWORD });
  await signInAs(page, email, PASSWORD);
  return email;
}

test("a rider turns on alerts for this browser; a closure is pushed to it once, shown by the service worker, and the rider stops it", async ({ page, browser, baseURL }) => {
  test.setTimeout(120_000);
  const keys = newTestBrowserKeys();
  const token = `e2e-${Date.now()}-${test.info().project.name}`;
  const endpoint = `${process.env.FAKE_PUSH_URL}/push/${token}`;
  await page.context().grantPermissions(["notifications"]);
  await page.addInitScript(({ endpoint, p256dh, auth }) => {
    const subscription = { endpoint, expirationTime: null, toJSON: () => ({ endpoint, expirationTime: null, keys: { p256dh, auth } }) };
    PushManager.prototype.subscribe = async () => subscription as unknown as PushSubscription;
    PushManager.prototype.getSubscription = async () => null;
  }, { endpoint, p256dh: keys.p256dh, auth: keys.auth });
  const email = await newRider(page, "push-rider");

  // 1. Closures only, every trail, as alerts on this browser.
  await page.goto(`/me/subscriptions?park=${PARK.slug}`);
  await expect(page.getByLabel("Park", { exact: true })).toHaveValue(PARK.slug);
  await page.getByLabel("Reopenings", { exact: true }).uncheck();
  await page.getByRole("button", { name: "Alert this browser" }).click();
  await expect(page.getByTestId("push-outcome")).toHaveText(`Alerts on: this browser will show notices from ${PARK.name}.`);
  await expect(page.getByTestId(`push-subscription-${PARK.slug}`)).toContainText("Every trail · closures · as alerts on a browser");
  await shot(page, "push-alerts-on");

  // 2. Staff send a closure; the worker runs once, as npm start's background worker does.
  const staff = await browser.newContext({ ...test.info().project.use });
  const admin = await staff.newPage();
  await signInAs(admin, demo("admin"));
  const message = `Shuttle road washed out below the second hairpin; every trail closed until it is graded (${token}).`;
  const sent = await admin.request.post(`/api/parks/${PARK.slug}/notices`, { data: { kind: "closure", message } });
  expect(sent.status()).toBe(202);
  const notice = await sent.json();
  const worker = await run("node_modules/.bin/tsx", ["--conditions=react-server", "scripts/worker.ts", "--once"], { env: process.env, timeout: 60_000 });
  expect(worker.stdout).toMatch(/done: \d+ sent/);

  // 3. The fake push service received exactly one push for this browser, and it decrypts to the notice.
  const received = (await (await fetch(`${process.env.FAKE_PUSH_URL}/control/received`)).json()).received.filter((p: { subscription: string }) => p.subscription === token);
  expect(received).toHaveLength(1);
  const alert = JSON.parse(decryptPush(keys, Buffer.from(received[0].body, "base64")));
  expect(alert).toEqual({ title: `${PARK.name}: all trails closed`, body: message, url: `${baseURL}/parks/${PARK.slug}`, tag: `notice-${notice.id}` });

  // 4. Staff see it delivered, by browser alert, beside the e-mails.
  await admin.goto(`/staff/${PARK.slug}/notices/${notice.id}`);
  await expect(admin.getByRole("row").filter({ hasText: email }).filter({ hasText: "alert on a browser" })).toContainText("delivered");
  await shot(admin, "push-alerts-staff-deliveries");
  await staff.close();

  // 5. The service worker shows what arrived (delivered to it as the push service would, over DevTools).
  const cdp = await page.context().newCDPSession(page);
  const registrationId = new Promise<string>((resolve) =>
    cdp.on("ServiceWorker.workerRegistrationUpdated", ({ registrations }) => {
      const mine = registrations.find((r) => r.scopeURL.startsWith(baseURL!) && !r.isDeleted);
      if (mine) resolve(mine.registrationId);
    }),
  );
  await cdp.send("ServiceWorker.enable");
  await cdp.send("ServiceWorker.deliverPushMessage", { origin: baseURL!, registrationId: await registrationId, data: JSON.stringify(alert) });
  await expect
    .poll(() => page.evaluate(async () => (await (await navigator.serviceWorker.ready).getNotifications()).map((n) => ({ title: n.title, body: n.body, url: n.data?.url }))))
    .toEqual([{ title: alert.title, body: alert.body, url: alert.url }]);

  // 6. Stop it: the browser is gone from the list and from the server.
  await page.getByRole("button", { name: `Stop browser alerts from ${PARK.name}` }).click();
  await expect(page.getByTestId(`push-subscription-${PARK.slug}`)).toHaveCount(0);
  const left = await (await page.request.get("/api/me/push-subscriptions")).json();
  expect(left.pushSubscriptions).toEqual([]);
});

test("the subscription form keeps the park the rider chose, after a refusal, after saving, and when arriving from a park's board", async ({ page }) => {
  await newRider(page, "kept-park");
  await page.goto("/me/subscriptions");
  const park = page.getByLabel("Park", { exact: true });
  const first = await park.locator("option").first().getAttribute("value");
  const chosen = first === "harrow-ridge" ? PARK.slug : "harrow-ridge";
  await park.selectOption(chosen);

  // Refused: no kind of notice chosen. The error is shown and the park stays.
  for (const kind of ["Closures", "Reopenings"]) await page.getByLabel(kind, { exact: true }).uncheck();
  await page.getByRole("button", { name: "Send me these e-mails" }).click();
  await expect(page.getByText("Choose at least one kind of notice.")).toBeVisible();
  await expect(park).toHaveValue(chosen);

  // Saved: the park stays, and the rest of the choice with it.
  await page.getByLabel("Closures", { exact: true }).check();
  await page.getByRole("button", { name: "Send me these e-mails" }).click();
  await expect(page.getByTestId(`subscription-${chosen}`)).toContainText("closures");
  await expect(park).toHaveValue(chosen);
  await expect(page.getByLabel("Closures", { exact: true })).toBeChecked();
  await expect(page.getByLabel("Reopenings", { exact: true })).not.toBeChecked();
  await shot(page, "subscriptions-kept-park");

  // From a park's board: the form opens on that park.
  const other = chosen === "harrow-ridge" ? PARK.slug : "harrow-ridge";
  await page.goto(`/parks/${other}`);
  await page.getByRole("link", { name: "Get trail notices" }).click();
  await expect(page).toHaveURL(new RegExp(`/me/subscriptions\\?park=${other}$`));
  await expect(park).toHaveValue(other);
});
