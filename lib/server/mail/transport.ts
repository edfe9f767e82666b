import "server-only";
import nodemailer, { type Transporter } from "nodemailer";
import { parseConnectionUrl } from "nodemailer/lib/shared";
import type SMTPTransport from "nodemailer/lib/smtp-transport";
import { env, usesFakeMail } from "@/lib/server/env";

/** One SMTP transport, unpooled: a dropped pooled connection can resend (see DEVELOPERS.md). */
let transport: Transporter | undefined;

export function mailTransport(): Transporter {
  if (!transport) {
    // Transport options belong in the first argument: createTransport's second one holds message defaults.
    transport = nodemailer.createTransport({
      ...parseConnectionUrl(env().SMTP_URL),
      ...(usesFakeMail() ? { ignoreTLS: true } : {}),
      connectionTimeout: 10_000,
      greetingTimeout: 10_000,
      socketTimeout: 20_000,
    } satisfies SMTPTransport.Options);
  }
  return transport;
}

/** Strips CR and LF from text that ends up in a header (ASVS v5.0.0 1.3.11). */
export const headerSafe = (text: string) => text.replace(/[\r\n]+/g, " ").trim();

export async function sendMail(message: { to: string; subject: string; text: string; html?: string; headers?: Record<string, string>; messageId?: string }) {
  return mailTransport().sendMail({
    from: env().MAIL_FROM,
    to: message.to,
    subject: headerSafe(message.subject),
    text: message.text,
    html: message.html,
    headers: message.headers,
    messageId: message.messageId,
  });
}
