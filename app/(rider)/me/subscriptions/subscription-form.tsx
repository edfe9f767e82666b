"use client";
import { startTransition, useActionState, useState, type FormEvent } from "react";
import { FormMessage } from "@/components/form-bits";
import { initialFormState } from "@/lib/shared/form-state";
import { saveSubscriptionAction } from "@/lib/notices/subscription-actions";
import { NOTICE_KINDS, type NoticeKind } from "@/lib/notices/pure/schemas";
import { PushAlerts } from "./push-alerts";

export type ParkChoice = {
  slug: string;
  name: string;
  trails: { id: string; name: string }[];
  /** The rider's current choice for this park, if any. */
  current: { trailIds: string[] | null; kinds: NoticeKind[] } | null;
};

const KIND_TEXT: Record<NoticeKind, string> = {
  closure: "Closures",
  reopening: "Reopenings",
  advisory: "Advisories (works, events, lift changes)",
};

export function SubscriptionForm({ parks, initialSlug, vapidPublicKey }: { parks: ParkChoice[]; initialSlug: string; vapidPublicKey: string | null }) {
  const [state, action, pending] = useActionState(saveSubscriptionAction, initialFormState);
  const [slug, setSlug] = useState(initialSlug);
  const park = parks.find((p) => p.slug === slug) ?? parks[0];
  const [scope, setScope] = useState<"park" | "trails">(park?.current?.trailIds ? "trails" : "park");
  const [trailIds, setTrailIds] = useState<string[]>(park?.current?.trailIds ?? []);
  const [kinds, setKinds] = useState<NoticeKind[]>(park?.current?.kinds ?? ["closure", "reopening"]);
  if (!park) return <p className="card">There are no parks on Loamcast yet.</p>;

  const choosePark = (next: string) => {
    const chosen = parks.find((p) => p.slug === next)!;
    setSlug(next);
    setScope(chosen.current?.trailIds ? "trails" : "park");
    setTrailIds(chosen.current?.trailIds ?? []);
    setKinds(chosen.current?.kinds ?? ["closure", "reopening"]);
  };
  const toggle = <T,>(list: T[], item: T) => (list.includes(item) ? list.filter((x) => x !== item) : [...list, item]);
  // React resets a form after its action runs, which put the park list back on its first park while
  // the rest of the form still showed the rider's choice. Submitting here keeps every field as chosen.
  const submit = (event: FormEvent<HTMLFormElement>) => {
    event.preventDefault();
    const data = new FormData(event.currentTarget);
    startTransition(() => action(data));
  };
  const error = (name: string) => state.fieldErrors?.[name] ?? Object.entries(state.fieldErrors ?? {}).find(([k]) => k.startsWith(`${name}.`))?.[1] ?? "";

  return (
    <form action={action} onSubmit={submit} className="card space-y-4">
      <h2 className="text-lg font-bold">{park.current ? "Change what you get" : "Get trail notices"}</h2>
      <FormMessage state={state} />
      <div>
        <label htmlFor="sub-park" className="label">Park</label>
        <select id="sub-park" name="parkSlug" value={slug} onChange={(e) => choosePark(e.target.value)} className="field">
          {parks.map((p) => (
            <option key={p.slug} value={p.slug}>{p.name}</option>
          ))}
        </select>
        <p className="field-error" aria-live="polite">{error("parkSlug")}</p>
      </div>

      <fieldset className="space-y-1">
        <legend className="label">About</legend>
        <label className="flex min-h-tap items-center gap-2">
          <input type="radio" name="scope" value="park" checked={scope === "park"} onChange={() => setScope("park")} className="h-5 w-5" />
          Every trail in the park
        </label>
        <label className="flex min-h-tap items-center gap-2">
          <input type="radio" name="scope" value="trails" checked={scope === "trails"} onChange={() => setScope("trails")} disabled={park.trails.length === 0} className="h-5 w-5" />
          Only trails I choose {park.trails.length === 0 && <span className="text-sm text-loam-600">(no trails listed yet)</span>}
        </label>
        {scope === "trails" && (
          <ul className="grid gap-1 pl-7 sm:grid-cols-2">
            {park.trails.map((t) => (
              <li key={t.id}>
                <label className="flex min-h-tap items-center gap-2">
                  <input type="checkbox" name="trailIds" value={t.id} checked={trailIds.includes(t.id)} onChange={() => setTrailIds(toggle(trailIds, t.id))} className="h-5 w-5" />
                  {t.name}
                </label>
              </li>
            ))}
          </ul>
        )}
        <p className="text-sm text-loam-600">A notice about the whole park reaches you either way.</p>
        <p className="field-error" aria-live="polite">{error("trailIds")}</p>
      </fieldset>

      <fieldset className="space-y-1">
        <legend className="label">Which notices</legend>
        {NOTICE_KINDS.map((kind) => (
          <label key={kind} className="flex min-h-tap items-center gap-2">
            <input type="checkbox" name="kinds" value={kind} checked={kinds.includes(kind)} onChange={() => setKinds(toggle(kinds, kind))} className="h-5 w-5" />
            {KIND_TEXT[kind]}
          </label>
        ))}
        <p className="field-error" aria-live="polite">{error("kinds")}</p>
      </fieldset>

      <button type="submit" className="btn-primary w-full" disabled={pending}>
        {pending ? "Saving…" : park.current ? "Save changes" : "Send me these e-mails"}
      </button>
      <PushAlerts publicKey={vapidPublicKey} choice={{ parkSlug: park.slug, parkName: park.name, trailIds: scope === "trails" ? trailIds : null, kinds }} />
    </form>
  );
}
