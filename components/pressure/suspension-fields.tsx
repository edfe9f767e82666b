"use client";
/** Suspension measurements with the sag check worked out live as the rider types. */
import { suspensionSag, type SagResult } from "@/lib/pressure/pure/sag";
import { numberFrom, type DraftErrors, type SetupDraft } from "@/lib/setups/pure/setup-form";
import { TextInput } from "./inputs";

const VERDICT = { "too-little": "Too little sag", "in-range": "In range", "too-much": "Too much sag", "measure-again": "Measure again" } as const;

function SagVerdict({ label, result, testId }: { label: string; result?: SagResult; testId: string }) {
  if (!result) return <p className="text-sm text-loam-800">{label}: enter the sag and the {label === "Rear" ? "shock stroke" : "fork travel"} to check it.</p>;
  const ok = result.verdict === "in-range";
  return (
    <div className={`rounded-lg border-2 p-3 ${ok ? "border-moss-600 bg-moss-100" : "border-flare-500 bg-flare-100"}`} data-testid={testId} aria-live="polite">
      <p className="text-lg font-extrabold text-loam-900">
        {label}: {result.percent.toFixed(1)} % — {VERDICT[result.verdict]} (target {result.min}–{result.max} %)
      </p>
      <p className="text-loam-900">{result.text}</p>
    </div>
  );
}

export function SuspensionFields({ draft, errors, onChange }: { draft: SetupDraft; errors: DraftErrors; onChange: (draft: SetupDraft) => void }) {
  const n = (text: string) => {
    const v = numberFrom(text);
    return v === undefined || Number.isNaN(v) ? undefined : v;
  };
  const sag = suspensionSag({ rearStrokeMm: n(draft.rearStroke), rearSagMm: n(draft.rearSag), forkTravelMm: n(draft.forkTravel), frontSagMm: n(draft.frontSag) });
  const field = (key: "rearStroke" | "rearSag" | "forkTravel" | "frontSag", label: string, hint?: string) => (
    <TextInput id={`setup-${key}`} label={label} value={draft[key]} onChange={(value) => onChange({ ...draft, [key]: value })} error={errors[key]} hint={hint} />
  );
  return (
    <fieldset className="card space-y-3">
      <legend className="px-1 text-lg font-bold">Suspension and sag (optional)</legend>
      <p className="text-loam-800">Sit on the bike in your riding kit, then measure how far the shock and fork have sunk.</p>
      <div className="grid grid-cols-2 gap-3">
        {field("rearStroke", "Shock stroke (mm)", "The shock's own stroke, e.g. 55 or 65 mm — not the wheel travel.")}
        {field("rearSag", "Rear sag (mm)", "Measured on the shock's shaft.")}
      </div>
      <SagVerdict label="Rear" result={sag.rear} testId="sag-rear" />
      <div className="grid grid-cols-2 gap-3">
        {field("forkTravel", "Fork travel (mm)")}
        {field("frontSag", "Fork sag (mm)")}
      </div>
      <SagVerdict label="Fork" result={sag.fork} testId="sag-fork" />
      <p className="text-sm font-semibold text-loam-900">Never go above the shock&apos;s or fork&apos;s printed maximum air pressure; the maker&apos;s guide comes first.</p>
    </fieldset>
  );
}
