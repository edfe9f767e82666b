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
  const [lockVersion, setLockVersion] = useState(initial.lockVersion);
  const [errors, setErrors] = useState<Record<string, string>>({});
  const [note, setNote] = useState<{ ok: boolean; text: string } | null>(null);
  const [pending, setPending] = useState(false);

  async function save(event: React.FormEvent) {
    event.preventDefault();
    const body = { ...parkBodyOf(values), lockVersion };
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
      <p className="rounded-lg bg-flare-100 p-3 text-sm">
        <strong>Time zone:</strong> &ldquo;today&rdquo; on the board, the morning check and closure notices is the date in this zone. A change counts from the moment you save; reports already written keep their dates.
      </p>
      <button type="submit" className="btn-primary" disabled={pending}>{pending ? "Saving…" : "Save settings"}</button>
    </form>
  );
}
