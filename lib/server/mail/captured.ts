import "server-only";
import { simpleParser } from "mailparser";
import { env } from "@/lib/server/env";
import { AppError } from "@/lib/shared/errors";

/** A captured message as a mail app shows it: `text` and `html` decoded (quoted-printable, base64, charsets), `raw` as received. */
export type CapturedMail = { id: number; from: string; to: string[]; subject: string; text: string; html: string | null; raw: string; receivedAt: string };

/** Reads what the local fake SMTP server received (only when the app uses it), decoded with mailparser. */
export async function capturedMail(): Promise<CapturedMail[]> {
  const control = env().FAKE_SMTP_CONTROL_URL;
  if (!control) throw new AppError(404, "Captured mail exists only with the local fake mail server.");
  const response = await fetch(new URL("/messages", control), { cache: "no-store" });
  const body = (await response.json()) as { messages: { id: number; from: string; to: string[]; raw: string; receivedAt: string }[] };
  return Promise.all(
    body.messages.map(async (m) => {
      const parsed = await simpleParser(m.raw, { skipImageLinks: true });
      return { ...m, subject: parsed.subject ?? "", text: parsed.text ?? "", html: parsed.html || null };
    }),
  );
}
