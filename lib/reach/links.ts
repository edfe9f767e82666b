import "server-only";
import { env } from "@/lib/server/env";

/** Absolute links to our own pages, for places outside the app (calendars, QR codes, other websites). */
export const absoluteUrl = (path: string) => new URL(path, env().APP_URL).toString();

/** The same address with the webcal scheme calendar apps subscribe to (they fetch it over http/https). */
export const webcalUrl = (path: string) => absoluteUrl(path).replace(/^https?:/, "webcal:");
