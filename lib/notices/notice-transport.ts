import nodemailer, { type Transporter } from "nodemailer";
import { env, usesFakeMail } from "@/lib/env";

/**
 * The worker's SMTP transport: pooled for throughput, but with `maxRequeues: 0`, so a
 * message on a connection that drops is reported failed instead of being silently resent
 * by nodemailer. The delivery queue decides about retries, with the claim and Message-ID
 * that keep them from turning into duplicates.
 */
export function createNoticeTransport(opts: { smtpUrl?: string; maxConnections?: number } = {}): Transporter {
  const url = new URL(opts.smtpUrl ?? env().SMTP_URL);
  const settings: Record<string, string> = {
    pool: "true",
    maxConnections: String(opts.maxConnections ?? 4),
    maxMessages: "500",
    maxRequeues: "0",
    connectionTimeout: "10000",
    greetingTimeout: "10000",
    socketTimeout: "20000",
  };
  if (usesFakeMail()) settings.ignoreTLS = "true";
  for (const [key, value] of Object.entries(settings)) url.searchParams.set(key, value);
  return nodemailer.createTransport(url.toString());
}
