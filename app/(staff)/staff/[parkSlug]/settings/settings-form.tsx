"use client";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { FormNote, ParkFields } from "@/components/parks/park-fields";
import { sendJson } from "@/lib/client/api-request";
import { parkBodyOf, parkPatchSchema, parseParkFields, type ParkFormValues } from "@/lib/parks/pure/schemas";

export type ParkSettingsView = {
  slug: string;
  name: string;
  timeZone: string;
  location: { lon: number; lat: number };
  baseElevationM: number;
  summitElevationM: number;
  contactEmail: string | null;
  websiteUrl: string | null;
  rainThresholdMm: number;
  lockVersion: number;
};

const valuesOf = (p: ParkSettingsView): ParkFormValues => ({
  name: p.name,
  slug: p.slug,
  timeZone: p.timeZone,
  lon: String(p.location.lon),
  lat: String(p.location.lat),
  baseElevationM: String(p.baseElevationM),
  summitElevationM: String(p.summitElevationM),
  contactEmail: p.contactEmail ?? "",
  websiteUrl: p.websiteUrl ?? "",
});

/** The park's settings, saved with the lockVersion read; a refusal keeps what was typed, a clash shows the other person's values. */
export function ParkSettingsForm({ initial, slugLocked }: { initial: ParkSettingsView; slugLocked: boolean }) {
  const router = useRouter();
  const [values, setValues] = useState(valuesOf(initial));
  const [threshold, setThreshold] = useState(String(initial.rainThresholdMm));
  const [lockVersion, setLockVersion] = useState(initial.lockVersion);
  const [errors, setErrors] = useState<Record<string, string>>({});
  const [note, setNote] = useState<{ ok: boolean; text: string } | null>(null);
  const [pending, setPending] = useState(false);

  async function save(event: React.FormEvent) {
    event.preventDefault();
    const body = { ...parkBodyOf(values), rainThresholdMm: threshold.trim(), lockVersion };
    if (slugLocked) delete (body as { slug?: string }).slug;
    const checked = parseParkFields(parkPatchSchema, body);
    if (!checked.ok) {
      setErrors(checked.field ? { [checked.field]: checked.message } : {});
      return setNote({ ok: false, text: checked.message });
    }
    setPending(true);
    const result = await sendJson<{ park: ParkSettingsView }>("PATCH", `/api/parks/${initial.slug}`, body);
    setPending(false);
    if (result.ok) {
      setErrors({});
      setLockVersion(result.data.park.lockVersion);
      setNote({ ok: true, text: "Settings saved." });
      if (result.data.park.slug !== initial.slug) return router.replace(`/staff/${result.data.park.slug}/settings`);
      return router.refresh();
    }
    const current = (result.error.details as { current?: ParkSettingsView } | undefined)?.current;
    if (result.status === 409 && current) {
      setValues(valuesOf(current));
      setThreshold(String(current.rainThresholdMm));
      setLockVersion(current.lockVersion);
    }
    setErrors(result.error.field ? { [result.error.field]: result.error.message } : {});
    setNote({ ok: false, text: result.error.message });
  }

  return (
    <form onSubmit={save} className="card space-y-3" aria-labelledby="settings-heading" noValidate>
      <h2 id="settings-heading" className="text-lg font-bold">Park settings</h2>
      <FormNote note={note} />
      <ParkFields
        values={values}
        onChange={setValues}
        errors={errors}
        idPrefix="park-settings"
        slugLocked={slugLocked}
        slugHint={slugLocked ? "The address is fixed now that the park has trails: links in e-mails and QR codes depend on it." : undefined}
      />
      <div>
        <label htmlFor="park-settings-rain" className="label">Rain caution level (mm in 24 h)</label>
        <input
          id="park-settings-rain"
          className="field w-32"
          inputMode="decimal"
          value={threshold}
          onChange={(e) => setThreshold(e.target.value)}
          aria-invalid={Boolean(errors.rainThresholdMm)}
          aria-describedby="park-settings-rain-hint"
        />
        {errors.rainThresholdMm && <p className="field-error">{errors.rainThresholdMm}</p>}
        <p id="park-settings-rain-hint" className="text-sm text-loam-700">
          When the last 24 hours bring this much rain or more, the morning check shows a caution. It decides nothing: each trail&apos;s status stays the ranger&apos;s call.
          Published closure rules can guide the number; the USDA Forest Service&apos;s wet-weather guidance for motorised trails, for example, uses 2 in (51 mm) in 24 h.
        </p>
      </div>
      <p className="rounded-lg bg-flare-100 p-3 text-sm">
        <strong>Time zone:</strong> &ldquo;today&rdquo; on the board, the morning check and closure notices is the date in this zone. A change counts from the moment you save; reports already written keep their dates.
      </p>
      <button type="submit" className="btn-primary" disabled={pending}>{pending ? "Saving…" : "Save settings"}</button>
    </form>
  );
}
