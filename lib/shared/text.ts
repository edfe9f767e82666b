/**
 * What a name may hold. PostgreSQL text cannot store U+0000 at all, control characters have no
 * place in a name, and the explicit directional formatting characters (Unicode UAX #9 §2:
 * LRE, RLE, PDF, LRO, RLO U+202A–U+202E; LRI, RLI, FSI, PDI U+2066–U+2069) can make a name
 * display as something else ("Trojan Source", CVE-2021-42574). Emoji, accents and zero-width
 * joiners (needed by emoji sequences and some scripts) are fine; a name needs one visible character.
 */
import { z } from "zod";

/** C0 controls (tab, LF and CR included: a name is one line), DEL, C1 controls, U+2028/U+2029. */
const CONTROL_OR_BREAK = /[\u0000-\u001F\u007F-\u009F\u2028\u2029]/;
const BIDI_CONTROL = /[\u202A-\u202E\u2066-\u2069]/;
const VISIBLE = /[\p{L}\p{N}\p{P}\p{S}]/u;

export const nameProblem = (text: string): string | null => {
  if (CONTROL_OR_BREAK.test(text)) return "contains a line break or a control character";
  if (BIDI_CONTROL.test(text)) return "contains a text-direction control character";
  if (text.length > 0 && !VISIBLE.test(text)) return "has no visible character";
  return null;
};

/** For `.superRefine(nameCheck("The name"))` on a trimmed string; an empty string passes (min() decides). */
export const nameCheck = (label: string) => (text: string, ctx: z.RefinementCtx) => {
  const problem = nameProblem(text);
  if (problem) ctx.addIssue({ code: "custom", message: `${label} ${problem}.` });
};

const CONTROL_IN_NOTE = /[\u0000-\u0008\u000B\u000C\u000E-\u001F\u007F-\u009F]/;

/** A note may span lines (tab, LF, CR) but holds no other control or text-direction character. */
export const noteCheck = (label: string) => (text: string, ctx: z.RefinementCtx) => {
  if (CONTROL_IN_NOTE.test(text) || BIDI_CONTROL.test(text)) ctx.addIssue({ code: "custom", message: `${label} contains characters that are not allowed.` });
};

const HTML_ESCAPES: Record<string, string> = { "&": "&amp;", "<": "&lt;", ">": "&gt;", '"': "&quot;", "'": "&#39;" };
/** Text safe inside HTML element content and quoted attributes. */
export const escapeHtml = (text: string) => text.replace(/[&<>"']/g, (c) => HTML_ESCAPES[c]);
