/**
 * The status card a park frames on its own website: which sites may frame it, and its HTML.
 * The card is plain server-rendered HTML with inline styles and no script, so it needs nothing
 * from our origin but itself, sets no cookie and reads none.
 */
import { z } from "zod";
import { PARK_STATE_LABELS, STATUS_LABELS, STATUS_SIGNS } from "@/lib/conditions/pure/labels";
import { difficultyLabel } from "@/lib/trails/pure/vocabulary";
import type { ParkStateKind } from "@/lib/conditions/pure/schemas";
import { escapeHtml } from "@/lib/shared/text";
import { longDate } from "@/lib/shared/park-clock";
import type { StatusFeed } from "./status-feed";

export const MAX_EMBED_ORIGINS = 10;
const LOCAL_HOSTS = new Set(["localhost", "127.0.0.1", "[::1]"]);

/**
 * One origin as CSP source expressions take it (CSP Level 3 §2.3.1): scheme, host and optional
 * port, nothing else, so a listed value can never smuggle another directive into the header.
 * https only, except a local development site.
 */
export const embedOriginSchema = z.string().transform((raw, ctx) => {
  const text = raw.trim().replace(/\/$/, "");
  let url: URL | null = null;
  try {
    url = new URL(text);
  } catch {}
  const local = url && url.protocol === "http:" && LOCAL_HOSTS.has(url.hostname);
  if (!url || (url.protocol !== "https:" && !local) || url.origin !== text.toLowerCase() || url.username || url.password) {
    ctx.addIssue({ code: "custom", message: `"${text.slice(0, 80)}" is not a website origin like https://www.example.org (no path, https only).` });
    return z.NEVER;
  }
  return url.origin;
});

/** The textarea on the staff desk: one origin per line (commas and spaces also separate). */
export const embedOriginsSchema = z
  .string()
  .max(4000, "That is too long for a list of websites.")
  .transform((text) => text.split(/[\s,]+/).filter(Boolean))
  .pipe(z.array(embedOriginSchema).max(MAX_EMBED_ORIGINS, `List at most ${MAX_EMBED_ORIGINS} websites.`))
  .transform((origins) => [...new Set(origins)]);

/** Our own pages may frame the card (the staff desk preview); so may each listed origin. */
export const frameAncestors = (origins: string[]) => ["'self'", ...origins].join(" ");

/** The snippet a park pastes into its website. */
export function embedSnippet(cardUrl: string, parkName: string): string {
  return `<iframe src="${escapeHtml(cardUrl)}" title="${escapeHtml(`Trail status at ${parkName}`)}" width="360" height="480" style="border:0;max-width:100%" loading="lazy"></iframe>`;
}

const STATUS_COLOURS = { open: ["#245522", "#e3f0df", "solid"], caution: ["#8a5a00", "#fdf1d2", "dashed"], closed: ["#98301f", "#f8e1dc", "solid"] } as const;

function statusBadge(status: keyof typeof STATUS_COLOURS | null): string {
  if (!status) return `<span class="badge" style="border:2px dotted #8c7a66;color:#5b4a3a">? Not inspected</span>`;
  const [ink, ground, line] = STATUS_COLOURS[status];
  return `<span class="badge" style="border:2px ${line} ${ink};color:${ink};background:${ground}">${STATUS_SIGNS[status]} ${STATUS_LABELS[status]}</span>`;
}

const timeIn = (iso: string, timeZone: string) => new Intl.DateTimeFormat("en-GB", { timeZone, hour: "2-digit", minute: "2-digit", hourCycle: "h23" }).format(new Date(iso));

/** The whole card page. Every value from the park goes through escapeHtml. */
export function embedCardHtml(feed: StatusFeed, renderedAt: Date): string {
  const e = escapeHtml;
  const { park, counts } = feed;
  const notice = feed.parkNotice
    ? `<p class="notice"><strong>${e(PARK_STATE_LABELS[feed.parkNotice.state as ParkStateKind] ?? "Notice")}:</strong> ${e(feed.parkNotice.message)}</p>`
    : "";
  const rows = feed.trails
    .map(
      (t) =>
        `<li><a href="${e(t.url)}" target="_blank" rel="noopener">${e(t.name)}</a><span class="diff">${e(difficultyLabel(t.difficulty))}</span>${statusBadge(t.status)}${t.reason ? `<span class="reason">${e(t.reason)}</span>` : ""}</li>`,
    )
    .join("");
  return `<!doctype html>
<html lang="en"><head><meta charset="utf-8"><meta name="viewport" content="width=device-width,initial-scale=1">
<meta http-equiv="refresh" content="300"><meta name="robots" content="noindex">
<title>${e(`Trail status: ${park.name}`)}</title>
<style>
body{margin:0;font:15px/1.4 system-ui,-apple-system,"Segoe UI",sans-serif;color:#221c16;background:#fff}
.card{padding:12px 14px}h1{font-size:17px;margin:0 0 2px}.meta{color:#5b4a3a;font-size:12px;margin:0 0 8px}
.counts{display:flex;gap:10px;margin:0 0 8px;font-weight:600;font-size:14px}.notice{background:#fdf1d2;border-left:4px solid #d99307;padding:6px 8px;margin:0 0 8px}
ul{list-style:none;margin:0;padding:0}li{display:grid;grid-template-columns:1fr auto;gap:0 8px;padding:6px 0;border-top:1px solid #eee4d8}
li a{color:#221c16;font-weight:600}.diff{grid-column:1;font-size:12px;color:#5b4a3a}.badge{grid-row:1/3;grid-column:2;align-self:center;border-radius:6px;padding:2px 6px;font-size:12px;font-weight:700;text-transform:uppercase;white-space:nowrap}
.reason{grid-column:1/3;font-size:13px}.foot{font-size:12px;margin:8px 0 0}.foot a{color:#245522}
</style></head>
<body><div class="card">
<h1>${e(park.name)}</h1>
<p class="meta">Trail status for ${e(longDate(feed.date))}, as of ${e(timeIn(renderedAt.toISOString(), park.timeZone))} park time</p>
<p class="counts"><span>${counts.open} open</span><span>${counts.caution} caution</span><span>${counts.closed} closed</span>${counts.notInspected ? `<span>${counts.notInspected} not inspected</span>` : ""}</p>
${notice}<ul>${rows}</ul>
<p class="foot"><a href="${e(park.url)}" target="_blank" rel="noopener">Full board and map</a> · Follow signs and staff on the day.</p>
</div></body></html>`;
}
