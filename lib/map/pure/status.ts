/**
 * How a trail's status for today reads on the map: a line pattern and a word, never colour alone
 * (the line keeps its difficulty colour). Loamcast's own scheme:
 * - open: a full solid line;
 * - caution: long dashes, with CAUTION repeated along the line;
 * - closed: a row of round dots, with CLOSED repeated along the line;
 * - not inspected today: a thinner line of short dashes, named "not inspected".
 * Dash lengths are in line widths, as the MapLibre style specification measures `line-dasharray`.
 */
export const TRAIL_STATUS_KEYS = ["open", "caution", "closed", "uninspected"] as const;
export type TrailStatusKey = (typeof TRAIL_STATUS_KEYS)[number];
export type ReportedStatus = Exclude<TrailStatusKey, "uninspected">;

export type StatusLook = {
  /** The word riders read: card, list, legend and the `statusLabel` property. */
  label: string;
  /** Short upper-case tag drawn on the map beside the trail's name. */
  tag: string;
  /** The pattern in words, for the legend and screen readers. */
  patternText: string;
  /** `line-dasharray` in line widths; null draws a solid line. */
  dasharray: number[] | null;
  lineCap: "butt" | "round";
  /** Width relative to a normal trail line. */
  widthScale: number;
  /** Repeat the tag along the whole line (for statuses a rider must not miss). */
  repeatTag: boolean;
};

export const STATUS_LOOKS: Record<TrailStatusKey, StatusLook> = {
  open: { label: "Open", tag: "OPEN", patternText: "solid line", dasharray: null, lineCap: "round", widthScale: 1, repeatTag: false },
  caution: { label: "Caution", tag: "CAUTION", patternText: "long dashes, marked CAUTION", dasharray: [3, 1.6], lineCap: "butt", widthScale: 1, repeatTag: true },
  closed: { label: "Closed", tag: "CLOSED", patternText: "round dots, marked CLOSED", dasharray: [0.01, 2], lineCap: "round", widthScale: 1.15, repeatTag: true },
  uninspected: { label: "Not inspected today", tag: "NOT INSPECTED", patternText: "thin short dashes", dasharray: [1.6, 1.6], lineCap: "butt", widthScale: 0.6, repeatTag: false },
};

/** The display key for today's reported status; no report today reads "not inspected". */
export const statusKey = (status: ReportedStatus | null | undefined): TrailStatusKey => status ?? "uninspected";

export const statusLabel = (status: ReportedStatus | null | undefined): string => STATUS_LOOKS[statusKey(status)].label;
