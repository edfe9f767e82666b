/**
 * Today's band, readable at a glance in sunlight: large dark numbers on white, the pump reading
 * spelled out, every reason with its signed share per wheel, and the cautions always shown.
 * Band values are shown to 0.5 psi (0.05 bar, 5 kPa): the estimate is good to about ±1.5 psi
 * and gauges to about ±1 psi, so finer figures would claim what nobody can measure.
 */
import { forwardRef } from "react";
import type { PressureAnswer } from "@/lib/pressure/pressure-today";
import { formatBandPressure, formatPressure, type PressureUnit } from "@/lib/shared/units";

type Band = PressureAnswer["front"];

const fmt = (kPa: number, unit: PressureUnit) => formatBandPressure(kPa, unit);
const BASIS_WORDS: Record<PressureAnswer["basis"], { start: string; versus: string }> = {
  rides: { start: "From your own logged rides on this setup.", versus: "your rides" },
  baseline: { start: "Starting from your baseline.", versus: "your baseline" },
  estimate: { start: "A starting estimate from weight and tyre size (no baseline yet).", versus: "the estimate" },
};
const STARTS = new Set(["basis-baseline", "basis-rides", "basis-rides-disagree", "estimate-load"]);
/** A signed change; one that rounds to nothing in this unit reads "≈ 0" rather than "±0.0". */
function signed(kPa: number, unit: PressureUnit) {
  if (kPa === 0) return "—";
  const text = formatPressure(kPa, unit, { signed: true, decimals: unit === "kPa" ? 1 : unit === "bar" ? 3 : 1 });
  return text.startsWith("±") ? `≈ 0 ${unit}` : text;
}
/** Absolute for the starting point (baseline or estimate), signed for every change after it. */
const contribution = (id: string, kPa: number, unit: PressureUnit) => (STARTS.has(id) ? formatPressure(kPa, unit) : signed(kPa, unit));
/** The table shows the numbers in their own columns, so the text's trailing figures are left out. */
export const reasonWords = (text: string) => text.replace(/: [^:]*\b(front|rear)( to pump now)?$/, "");

/** " Ground: tacky on 10, rocky on 2." — what ground the planned trails report today, most common first. */
function groundText(trails: { surfaces: readonly string[] }[]): string {
  const counts = new Map<string, number>();
  for (const t of trails) for (const s of t.surfaces) counts.set(s, (counts.get(s) ?? 0) + 1);
  if (counts.size === 0) return " No ground reported yet today.";
  return ` Ground: ${[...counts].sort((a, b) => b[1] - a[1]).map(([s, n]) => `${s} on ${n}`).join(", ")}.`;
}

function WheelCard({ title, band, unit, basis }: { title: string; band: Band; unit: PressureUnit; basis: PressureAnswer["basis"] }) {
  const [value, unitLabel] = fmt(band.targetKpa, unit).split(" ");
  return (
    <section aria-label={`${title}: target ${fmt(band.targetKpa, unit)}`} className="rounded-xl border-2 border-loam-900 bg-white p-3" data-testid={`band-${title.toLowerCase()}`}>
      <h3 className="text-sm font-extrabold uppercase tracking-wider text-loam-900">{title}</h3>
      <p className="mt-1 leading-none text-loam-900">
        <span className="text-5xl font-black tabular-nums sm:text-6xl">{value}</span> <span className="text-xl font-bold">{unitLabel}</span>
      </p>
      <p className="mt-2 text-base font-semibold text-loam-900">
        Band {fmt(band.lowKpa, unit).split(" ")[0]} – {fmt(band.highKpa, unit)}
      </p>
      <p className="mt-2 rounded-lg bg-loam-900 px-2 py-1 text-white">
        <span className="block text-sm font-semibold">Pump to now</span>
        <span className="block text-2xl font-black tabular-nums">{fmt(band.pumpToKpa, unit)}</span>
      </p>
      <p className="mt-1 text-sm font-semibold text-loam-800">
        {signed(band.deltaKpa, unit)} vs {BASIS_WORDS[basis].versus}
      </p>
    </section>
  );
}

function ReasonRows({ reasons, unit }: { reasons: PressureAnswer["reasons"]; unit: PressureUnit }) {
  return (
    <>
      {reasons.map((r) => (
        <tr key={r.id} className="border-t border-loam-200 align-top" data-reason={r.id}>
          <td className="py-2 pr-2 text-loam-900">
            {reasonWords(r.text)}{" "}
            <a href={`/pressure/how-it-works#rule-${r.id}`} className="whitespace-nowrap text-sm font-semibold text-loam-800 underline" aria-label={`How this rule works (${r.id.replace(/-/g, " ")})`}>
              how?
            </a>
          </td>
          <td className="whitespace-nowrap py-2 pr-2 text-right font-bold tabular-nums">{contribution(r.id, r.frontKpa, unit)}</td>
          <td className="whitespace-nowrap py-2 text-right font-bold tabular-nums">{contribution(r.id, r.rearKpa, unit)}</td>
        </tr>
      ))}
    </>
  );
}

export function Cautions({ cautions }: { cautions: readonly string[] }) {
  return (
    <section aria-labelledby="cautions-heading" className="rounded-xl border-l-8 border-flare-500 bg-flare-100 p-4" data-testid="cautions">
      <h2 id="cautions-heading" className="text-lg font-extrabold text-loam-900">
        Cautions
      </h2>
      <ul className="mt-2 list-disc space-y-1 pl-5 text-base font-medium text-loam-900">
        {cautions.map((c) => (
          <li key={c}>{c}</li>
        ))}
      </ul>
    </section>
  );
}

export const BandResult = forwardRef<HTMLHeadingElement, { answer: PressureAnswer }>(function BandResult({ answer }, headingRef) {
  const { unit } = answer;
  const toTarget = answer.reasons.filter((r) => !r.id.startsWith("pump-"));
  const toPump = answer.reasons.filter((r) => r.id.startsWith("pump-"));
  return (
    <div className="space-y-4" data-testid="band-result">
      <div>
        <h2 ref={headingRef} tabIndex={-1} className="text-2xl font-extrabold text-loam-900 focus:outline-3 focus:outline-moss-600">
          Today&apos;s band
        </h2>
        <p className="font-semibold text-loam-800">
          {BASIS_WORDS[answer.basis].start}
          {answer.conditions && ` ${answer.conditions.park.name}, ${answer.conditions.trails.length} trail${answer.conditions.trails.length === 1 ? "" : "s"}.${groundText(answer.conditions.trails)}`}
        </p>
      </div>
      <div className="grid grid-cols-2 gap-3">
        <WheelCard title="Front" band={answer.front} unit={unit} basis={answer.basis} />
        <WheelCard title="Rear" band={answer.rear} unit={unit} basis={answer.basis} />
      </div>
      <section aria-labelledby="reasons-heading" className="card overflow-x-auto">
        <h2 id="reasons-heading" className="text-lg font-extrabold">
          Why
        </h2>
        <table className="mt-2 w-full text-base" data-testid="reasons">
          <thead>
            <tr className="text-left text-sm uppercase tracking-wide text-loam-800">
              <th scope="col" className="pb-1">Reason</th>
              <th scope="col" className="pb-1 pr-2 text-right">Front</th>
              <th scope="col" className="pb-1 pl-2 text-right">Rear</th>
            </tr>
          </thead>
          <tbody>
            <ReasonRows reasons={toTarget} unit={unit} />
            <tr className="border-t-2 border-loam-900 font-extrabold">
              <td className="py-2">Target</td>
              <td className="whitespace-nowrap py-2 pr-2 text-right tabular-nums">{fmt(answer.front.targetKpa, unit)}</td>
              <td className="whitespace-nowrap py-2 text-right tabular-nums">{fmt(answer.rear.targetKpa, unit)}</td>
            </tr>
            {toPump.length > 0 && <ReasonRows reasons={toPump} unit={unit} />}
            {toPump.length > 0 && (
              <tr className="border-t-2 border-loam-900 font-extrabold">
                <td className="py-2">Pump to now</td>
                <td className="whitespace-nowrap py-2 pr-2 text-right tabular-nums">{fmt(answer.front.pumpToKpa, unit)}</td>
                <td className="whitespace-nowrap py-2 text-right tabular-nums">{fmt(answer.rear.pumpToKpa, unit)}</td>
              </tr>
            )}
          </tbody>
        </table>
      </section>
      <Cautions cautions={answer.cautions} />
    </div>
  );
});
