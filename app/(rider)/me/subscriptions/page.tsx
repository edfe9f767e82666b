import { getActor } from "@/lib/server/auth/actor";
import { listSubscriptions, subscriptionChoices } from "@/lib/notices/subscriptions";
import { listPushSubscriptions } from "@/lib/notices/push-subscriptions";
import { vapidPublicKey } from "@/lib/notices/push-sender";
import type { NoticeKind } from "@/lib/notices/pure/schemas";
import { RemoveSubscriptionForm } from "./remove-form";
import { SubscriptionForm, type ParkChoice } from "./subscription-form";
import { RemovePushButton } from "./push-alerts";

export const metadata = { title: "Trail notices" };
export const dynamic = "force-dynamic";

const KIND_PLURAL: Record<string, string> = { closure: "closures", reopening: "reopenings", advisory: "advisories" };

const STATUS_TEXT = {
  pending: "Waiting for you to confirm: open the link we e-mailed you",
  active: "On",
  unsubscribed: "Stopped (you unsubscribed)",
} as const;

export default async function MySubscriptionsPage({ searchParams }: { searchParams: Promise<{ park?: string }> }) {
  const actor = (await getActor())!;
  const [{ park: wanted }, subscriptions, browsers, parks] = await Promise.all([searchParams, listSubscriptions(actor), listPushSubscriptions(actor), subscriptionChoices()]);
  const trailName = new Map(parks.flatMap((p) => p.trails).map((t) => [t.id, t.name]));
  const choices: ParkChoice[] = parks.map((p) => {
    const current = subscriptions.find((s) => s.park.slug === p.slug && s.status !== "unsubscribed");
    return { ...p, current: current ? { trailIds: current.trailIds, kinds: current.kinds as NoticeKind[] } : null };
  });
  const initialSlug = choices.some((c) => c.slug === wanted) ? wanted! : (choices[0]?.slug ?? "");

  return (
    <section className="space-y-4">
      <h1 className="text-2xl font-bold">Trail notices</h1>
      <p className="text-loam-700">When staff close or reopen a trail, hear it before you drive up: by e-mail, as an alert on this browser, or both. Every e-mail has a link to stop them in one click.</p>
      {subscriptions.length + browsers.length > 0 && (
        <ul className="space-y-3" aria-label="Your subscriptions">
          {subscriptions.map((s) => (
            <li key={s.id} className="card flex flex-wrap items-start justify-between gap-3" data-testid={`subscription-${s.park.slug}`}>
              <div className="space-y-1">
                <p className="font-bold">{s.park.name}</p>
                <p className="text-sm">
                  {s.trailIds ? s.trailIds.map((id) => trailName.get(id) ?? "a removed trail").join(", ") : "Every trail"} ·{" "}
                  {s.kinds.map((k) => KIND_PLURAL[k] ?? k).join(", ")} · to {s.email}
                </p>
                <p className="text-sm font-semibold" data-status={s.status}>{STATUS_TEXT[s.status]}</p>
              </div>
              <RemoveSubscriptionForm subscriptionId={s.id} parkName={s.park.name} />
            </li>
          ))}
          {browsers.map((b) => (
            <li key={b.id} className="card flex flex-wrap items-start justify-between gap-3" data-testid={`push-subscription-${b.park.slug}`}>
              <div className="space-y-1">
                <p className="font-bold">{b.park.name}</p>
                <p className="text-sm">
                  {b.trailIds ? b.trailIds.map((id) => trailName.get(id) ?? "a removed trail").join(", ") : "Every trail"} ·{" "}
                  {b.kinds.map((k) => KIND_PLURAL[k] ?? k).join(", ")} · as alerts on a browser
                </p>
                <p className="text-sm font-semibold">On</p>
              </div>
              <RemovePushButton id={b.id} parkName={b.park.name} />
            </li>
          ))}
        </ul>
      )}
      <SubscriptionForm key={initialSlug} parks={choices} initialSlug={initialSlug} vapidPublicKey={vapidPublicKey()} />
    </section>
  );
}
