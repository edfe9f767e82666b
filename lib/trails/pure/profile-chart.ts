import { M_PER_MI, formatDistance, formatHeight, mToFt, type DistanceSystem } from "@/lib/shared/units";
import type { ProfilePoint } from "./profile";

export type ChartTick = { at: number; label: string };
export type ProfileChart = {
  width: number;
  height: number;
  plot: { left: number; top: number; right: number; bottom: number };
  /** SVG path of the profile line and of the area under it. */
  line: string;
  area: string;
  xTicks: ChartTick[];
  yTicks: ChartTick[];
  xUnit: string;
  yUnit: string;
  /** One sentence for screen readers. */
  summary: string;
  /** Marks along the line (built features): where each sits on the drawn profile. */
  marks: { x: number; y: number; label: string }[];
};

export type ProfileMark = { dM: number; label: string };

/** The elevation at `dM` metres along a profile, linearly between its points (clamped to its ends). */
export function elevationAt(profile: ProfilePoint[], dM: number): number {
  if (dM <= profile[0].dM) return profile[0].eleM;
  for (let i = 1; i < profile.length; i++) {
    const [a, b] = [profile[i - 1], profile[i]];
    if (dM <= b.dM) return b.dM === a.dM ? b.eleM : a.eleM + ((b.eleM - a.eleM) * (dM - a.dM)) / (b.dM - a.dM);
  }
  return profile.at(-1)!.eleM;
}

/**
 * Round step sizes for axis labels: 1, 2 or 5 times a power of ten, the step nearest to
 * range ÷ (count − 1). After Heckbert, "Nice numbers for graph labels", Graphics Gems (1990) (from memory).
 */
export function niceStep(range: number, count = 5): number {
  if (!(range > 0)) return 1;
  const rough = range / Math.max(1, count - 1);
  const power = 10 ** Math.floor(Math.log10(rough));
  const fraction = rough / power;
  const nice = fraction < 1.5 ? 1 : fraction < 3 ? 2 : fraction < 7 ? 5 : 10;
  return nice * power;
}

/** Tick values at multiples of a nice step from `from` to `to` (both inclusive when they fall on a step). */
export function ticksBetween(from: number, to: number, step: number): number[] {
  const ticks: number[] = [];
  const first = Math.ceil(from / step - 1e-9);
  for (let k = first; k * step <= to + step * 1e-9; k++) ticks.push(Number((k * step).toPrecision(12)));
  return ticks;
}

const one = (x: number) => Math.round(x * 10) / 10;
const trimNumber = (x: number) => String(Number(x.toPrecision(6)));

/** Sized so the labels stay readable when a phone shrinks the chart to its width. */
const SIZE = { width: 480, height: 220 };
const MARGIN = { left: 52, right: 12, top: 24, bottom: 40 };

/**
 * The elevation profile as SVG geometry in the viewer's units (km/m or mi/ft): distance along the
 * trail across, elevation up, the elevation axis widened to round values. Null without elevation.
 */
export function profileChart(profile: ProfilePoint[], system: DistanceSystem, size = SIZE, marks: ProfileMark[] = []): ProfileChart | null {
  if (profile.length < 2) return null;
  const imperial = system === "imperial";
  const toX = (m: number) => (imperial ? m / M_PER_MI : m / 1000);
  const toY = (m: number) => (imperial ? mToFt(m) : m);
  const xs = profile.map((p) => toX(p.dM));
  const ys = profile.map((p) => toY(p.eleM));
  const xMax = Math.max(...xs);
  let [yMin, yMax] = [Math.min(...ys), Math.max(...ys)];
  if (yMax - yMin < 10) [yMin, yMax] = [yMin - 5, yMax + 5]; // a flat trail still gets an axis
  const yStep = niceStep(yMax - yMin, 5);
  const [yLow, yHigh] = [Math.floor(yMin / yStep) * yStep, Math.ceil(yMax / yStep) * yStep];

  const plot = { left: MARGIN.left, top: MARGIN.top, right: size.width - MARGIN.right, bottom: size.height - MARGIN.bottom };
  const px = (x: number) => one(plot.left + (xMax > 0 ? (x / xMax) * (plot.right - plot.left) : 0));
  const py = (y: number) => one(plot.bottom - ((y - yLow) / (yHigh - yLow)) * (plot.bottom - plot.top));

  const points = xs.map((x, i) => `${px(x)},${py(ys[i])}`);
  const line = `M${points.join("L")}`;
  const area = `${line}L${px(xMax)},${plot.bottom}L${px(0)},${plot.bottom}Z`;
  const xTicks = ticksBetween(0, xMax, niceStep(xMax, 4)).map((x) => ({ at: px(x), label: trimNumber(x) }));
  const yTicks = ticksBetween(yLow, yHigh, yStep).map((y) => ({ at: py(y), label: trimNumber(y) }));

  const lowest = Math.min(...profile.map((p) => p.eleM));
  const highest = Math.max(...profile.map((p) => p.eleM));
  const summary = `Elevation profile: from ${formatHeight(profile[0].eleM, system)} at the start to ${formatHeight(profile.at(-1)!.eleM, system)} at the end, between ${formatHeight(lowest, system)} and ${formatHeight(highest, system)}, over ${formatDistance(profile.at(-1)!.dM, system)}.`;
  const onLine = marks.map((m) => ({ x: px(toX(Math.min(m.dM, profile.at(-1)!.dM))), y: py(toY(elevationAt(profile, m.dM))), label: m.label }));
  return { ...size, plot, line, area, xTicks, yTicks, xUnit: imperial ? "mi" : "km", yUnit: imperial ? "ft" : "m", summary, marks: onLine };
}
