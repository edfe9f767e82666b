import "server-only";
import { env } from "@/lib/server/env";
import { AppError } from "@/lib/shared/errors";

export type CapturedMail = { id: number; from: string; to: string[]; subject: string; text: string; raw: string; receivedAt: string };

/** Reads what the local fake SMTP server received (only when the app uses it). */
export async function capturedMail(): Promise<CapturedMail[]> {
  const control = env().FAKE_SMTP_CONTROL_URL;
  if (!control) throw new AppError(404, "Captured mail exists only with the local fake mail server.");
  const response = await fetch(new URL("/messages", control), { cache: "no-store" });
  const body = (await response.json()) as { messages: { id: number; from: string; to: string[]; raw: string; receivedAt: string }[] };
  return body.messages.map((m) => {
    const [head, ...rest] = m.raw.split(/\r?\n\r?\n/);
    const subject = /^Subject: (.*(?:\r?\n[ \t].*)*)/im.exec(head)?.[1]?.replace(/\r?\n[ \t]/g, " ") ?? "";
    return { ...m, subject, text: rest.join("\n\n") };
  });
}
