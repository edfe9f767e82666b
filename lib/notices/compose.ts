import "server-only";
import { headerSafe } from "@/lib/server/mail/transport";
import type { NoticeKind } from "@/lib/notices/pure/schemas";
import { escapeHtml } from "@/lib/shared/text";
import type { PushAlert } from "@/lib/notices/pure/push-alert";

/**
 * The notice e-mail, built from parts only: the subject is ours (park and trail names,
 * with CR/LF neutralised), the staff message goes only into the body, escaped in HTML.
 * Pure: the worker and the preview both call it.
 */
export type NoticeEmailInput = {
  park: { name: string; slug: string; timeZone: string };
  /** Built by noticeSubject when the notice is written, stored with it. */
  subject: string;
  message: string;
  closedUntil: Date | null;
  appUrl: string;
  /** Page where a rider confirms with a button (works without signing in). */
  unsubscribePageUrl: string;
  /** RFC 8058 one-click target: a POST here unsubscribes. */
  oneClickUrl: string;
};

export const SUBJECT_MAX = 150;

export { escapeHtml };

/** "Ridgeback", "Ridgeback and Fernline", "A, B and C", "A, B and 3 more trails". */
export function trailList(names: string[]): string {
  const clean = names.map(headerSafe);
  const list = new Intl.ListFormat("en-GB", { type: "conjunction" });
  if (clean.length <= 3) return list.format(clean);
  return list.format([...clean.slice(0, 2), `${clean.length - 2} more trails`]);
}

export function noticeSubject(parkName: string, kind: NoticeKind, trailNames: string[] | null): string {
  const what = trailNames && trailNames.length > 0 ? trailList(trailNames) : "all trails";
  const phrase = kind === "closure" ? `${what} closed` : kind === "reopening" ? `${what} reopened` : `advisory for ${what}`;
  const subject = `${headerSafe(parkName)}: ${phrase}`;
  return subject.length <= SUBJECT_MAX ? subject : `${subject.slice(0, SUBJECT_MAX - 1).trimEnd()}…`;
}

/** "Sun 14 Jun 2026, 10:00, park time (America/Los_Angeles)", assembled from parts so ICU versions agree. */
export function formatClosedUntil(closedUntil: Date, timeZone: string): string {
  const parts = new Intl.DateTimeFormat("en-GB", {
    timeZone,
    weekday: "short",
    day: "numeric",
    month: "short",
    year: "numeric",
    hour: "2-digit",
    minute: "2-digit",
    hourCycle: "h23",
  }).formatToParts(closedUntil);
  const get = (type: Intl.DateTimeFormatPartTypes) => parts.find((p) => p.type === type)?.value ?? "";
  return `${get("weekday")} ${get("day")} ${get("month")} ${get("year")}, ${get("hour")}:${get("minute")}, park time (${timeZone})`;
}

export function composeNoticeEmail(input: NoticeEmailInput) {
  const subject = headerSafe(input.subject);
  const boardUrl = `${input.appUrl}/parks/${encodeURIComponent(input.park.slug)}`;
  const until = input.closedUntil ? formatClosedUntil(input.closedUntil, input.park.timeZone) : null;
  const message = input.message.replace(/\r\n?/g, "\n");

  const text = [
    subject,
    "",
    message,
    "",
    ...(until ? [`Closed until: ${until}`, ""] : []),
    `Today's conditions: ${boardUrl}`,
    "",
    "--",
    `You get this because you asked for notices from ${headerSafe(input.park.name)} on Loamcast.`,
    `Stop these e-mails: ${input.unsubscribePageUrl}`,
    "",
  ].join("\n");

  const e = escapeHtml;
  const html = `<!doctype html>
<html lang="en"><head><meta charset="utf-8"><meta name="viewport" content="width=device-width, initial-scale=1"></head>
<body style="font-family:system-ui,sans-serif;color:#221c16;max-width:560px;margin:0 auto;padding:16px;line-height:1.5">
<h1 style="font-size:20px">${e(subject)}</h1>
<p style="white-space:pre-line">${e(message)}</p>
${until ? `<p><strong>Closed until:</strong> ${e(until)}</p>` : ""}
<p><a href="${e(boardUrl)}">Today's conditions at ${e(input.park.name)}</a></p>
<hr>
<p style="font-size:13px;color:#63513a">You get this because you asked for notices from ${e(input.park.name)} on Loamcast.
<a href="${e(input.unsubscribePageUrl)}">Stop these e-mails</a>.</p>
</body></html>
`;

  const headers = {
    "List-Unsubscribe": `<${input.oneClickUrl}>`,
    "List-Unsubscribe-Post": "List-Unsubscribe=One-Click",
  };
  return { subject, text, html, headers };
}

/** A phone shows a few lines of an alert; the whole message is on the board it opens. */
export const PUSH_BODY_MAX = 300;


/** The push alert for a notice (read by the service worker, lib/notices/pure/push-alert.ts): far under the 4,096 bytes every push service must accept (RFC 8030 §7.2). */
export function composeNoticePush(input: Pick<NoticeEmailInput, "park" | "subject" | "message" | "closedUntil" | "appUrl"> & { noticeId: string }): PushAlert {
  const message = input.message.replace(/\s+/g, " ").trim();
  const until = input.closedUntil ? ` Closed until ${formatClosedUntil(input.closedUntil, input.park.timeZone)}.` : "";
  const room = PUSH_BODY_MAX - until.length;
  const body = (message.length <= room ? message : `${message.slice(0, room - 1).trimEnd()}…`) + until;
  return { title: headerSafe(input.subject), body, url: `${input.appUrl}/parks/${encodeURIComponent(input.park.slug)}`, tag: `notice-${input.noticeId}` };
}
