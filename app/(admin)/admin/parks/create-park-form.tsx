"use client";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { FormNote, ParkFields } from "@/components/parks/park-fields";
import { sendJson } from "@/lib/client/api-request";
import { parkBodyOf, parkCreateSchema, parseParkFields, slugFromName, type ParkFormValues } from "@/lib/parks/pure/schemas";

const EMPTY: ParkFormValues = { name: "", slug: "", timeZone: "", lon: "", lat: "", baseElevationM: "", summitElevationM: "", contactEmail: "", websiteUrl: "" };

/** Creates a park and invites its first manager in one step; a refusal keeps what was typed and shows beside its field. */
export function CreateParkForm() {
  const router = useRouter();
  const [values, setValues] = useState(EMPTY);
  const [managerEmail, setManagerEmail] = useState("");
  const [slugTouched, setSlugTouched] = useState(false);
  const [errors, setErrors] = useState<Record<string, string>>({});
  const [note, setNote] = useState<{ ok: boolean; text: string } | null>(null);
  const [pending, setPending] = useState(false);

  // The slug follows the name until someone types a slug of their own.
  function change(next: ParkFormValues) {
    const typedSlug = next.slug !== values.slug;
    if (typedSlug) setSlugTouched(true);
    setValues(slugTouched || typedSlug ? next : { ...next, slug: slugFromName(next.name) });
  }

  async function submit(event: React.FormEvent) {
    event.preventDefault();
    const body = { ...parkBodyOf(values), managerEmail };
    const checked = parseParkFields(parkCreateSchema, body);
    if (!checked.ok) {
      setErrors(checked.field ? { [checked.field]: checked.message } : {});
      return setNote({ ok: false, text: checked.message });
    }
    setPending(true);
    const result = await sendJson<{ park: { slug: string; name: string }; invitation: { email: string } }>("POST", "/api/parks", body);
    setPending(false);
    if (!result.ok) {
      setErrors(result.error.field ? { [result.error.field]: result.error.message } : {});
      return setNote({ ok: false, text: result.error.message });
    }
    setErrors({});
    setValues(EMPTY);
    setManagerEmail("");
    setSlugTouched(false);
    setNote({ ok: true, text: `${result.data.park.name} is created. The invitation went to ${result.data.invitation.email}.` });
    router.refresh();
  }

  return (
    <form onSubmit={submit} className="card space-y-3" aria-labelledby="create-park-heading" noValidate>
      <h2 id="create-park-heading" className="text-lg font-bold">Create a park</h2>
      <FormNote note={note} />
      <ParkFields values={values} onChange={change} errors={errors} idPrefix="new-park" />
      <div>
        <label htmlFor="new-park-managerEmail" className="label">First manager&apos;s e-mail</label>
        <input
          id="new-park-managerEmail"
          name="managerEmail"
          type="email"
          value={managerEmail}
          onChange={(e) => setManagerEmail(e.target.value)}
          aria-invalid={Boolean(errors.managerEmail)}
          aria-describedby="new-park-managerEmail-error"
          className="field"
          required
        />
        <p className="mt-1 text-sm text-loam-600">They get an invitation by e-mail as soon as the park is created; it is valid for 7 days.</p>
        <p id="new-park-managerEmail-error" className="field-error" aria-live="polite">{errors.managerEmail ?? ""}</p>
      </div>
      <button type="submit" className="btn-primary" disabled={pending}>{pending ? "Creating…" : "Create the park and invite its manager"}</button>
    </form>
  );
}
