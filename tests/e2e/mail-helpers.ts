import { expect, type Page } from "@playwright/test";
/** Reading what the app sent, from the fake SMTP server's control API (FAKE_SMTP_CONTROL_URL, set by npm test). */
export type Captured = { to: string[]; raw: string };

export async function mailTo(address: string): Promise<Captured[]> {
  const response = await fetch(`${process.env.FAKE_SMTP_CONTROL_URL}/messages`);
  return ((await response.json()) as { messages: Captured[] }).messages.filter((m) => m.to.includes(address));
}

/** Quoted-printable (RFC 2045 §6.7) undone, headers unfolded (RFC 5322 §2.2.3). */
export const readable = (raw: string) =>
  raw.replace(/=\r?\n/g, "").replace(/=([0-9A-F]{2})/g, (_, h: string) => String.fromCharCode(parseInt(h, 16))).replace(/\r\n[ \t]+/g, " ");

/** The first link to `path` followed by a `?token=` in a message. */
export const linkIn = (raw: string, path: string) => new RegExp(`https?://[^\\s"<>]+${path.replace(/[/?]/g, "\\$&")}\\?token=[A-Za-z0-9._%-]+`).exec(readable(raw))?.[0] ?? null;

/** Quoted-printable (RFC 2045 §6.7) back to bytes, read as UTF-8. */
function decodeQuotedPrintable(text: string): string {
  const bytes: number[] = [];
  const joined = text.replace(/=\r?\n/g, "");
  for (let i = 0; i < joined.length; i++) {
    const hex = joined[i] === "=" ? /^[0-9A-F]{2}$/.exec(joined.slice(i + 1, i + 3))?.[0] : undefined;
    if (hex) {
      bytes.push(parseInt(hex, 16));
      i += 2;
    } else {
      bytes.push(...Buffer.from(joined[i], "utf8"));
    }
  }
  return Buffer.from(bytes).toString("utf8");
}

/** The text/html part of a multipart message, decoded, as a mail app would show it. */
export function htmlPartOf(raw: string): string | null {
  const part = /Content-Type: text\/html[^\r\n]*\r?\nContent-Transfer-Encoding: quoted-printable\r?\n\r?\n([\s\S]*?)\r?\n--/.exec(raw);
  return part ? decodeQuotedPrintable(part[1]) : null;
}

/** The newest link to `path` (…?token=) mailed to `address`; polls briefly, as mail can lag the answer. */
export async function newestLinkTo(address: string, path: string): Promise<string> {
  for (let i = 0; i < 20; i++) {
    const link = (await mailTo(address)).map((m) => linkIn(m.raw, path)).filter(Boolean).at(-1);
    if (link) return link;
    await new Promise((resolve) => setTimeout(resolve, 250));
  }
  throw new Error(`no ${path} link was mailed to ${address}`);
}

/**
 * A new rider's account, made as a person would: sign up through the API the form posts to, open
 * the link from the captured mail, press the button. Leaves `page` on the sign-in page.
 */
export async function signUpAndProve(page: Page, rider: { name: string; email: string; password: string }) {
  const response = await page.request.post("/api/account", { data: rider });
  expect(response.status()).toBe(202);
  await page.goto(await newestLinkTo(rider.email, "/account/prove"));
  await page.getByRole("button", { name: "This is my address" }).click();
  await expect(page).toHaveURL(/\/sign-in\?proven=1/);
}
