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
