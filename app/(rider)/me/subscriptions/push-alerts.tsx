"use client";
/**
 * Turns on push alerts in this browser for the choice the form above shows (park, trails, kinds):
 * the service worker subscribes with our VAPID key, and the subscription goes to our API.
 * Pushes arrive even with every tab closed; the service worker shows them.
 */
import { useRouter } from "next/navigation";
import { useState, useSyncExternalStore } from "react";
import { sendJson } from "@/lib/client/api-request";
import { applicationServerKey } from "@/lib/notices/pure/push-alert";
import type { NoticeKind } from "@/lib/notices/pure/schemas";

export type PushChoice = { parkSlug: string; parkName: string; trailIds: string[] | null; kinds: NoticeKind[] };
type Outcome = { tone: "ok" | "error" | "working"; text: string } | null;

const SERVICE_WORKER_URL = "/serwist/sw.js";

const NO_SUPPORT = "This browser cannot show alerts from a website. On an iPhone or iPad, add Loamcast to the home screen (Share, then Add to Home Screen) and open it from there.";
const NOT_SET_UP = "Alerts are not set up on this Loamcast server.";

/** Why this browser cannot take alerts, or null when it can (known only in the browser). */
const missingSupport = () => ("serviceWorker" in navigator && "PushManager" in window && "Notification" in window ? null : NO_SUPPORT);
const neverChanges = () => () => {};

async function browserSubscription(publicKey: string): Promise<PushSubscription> {
  // The same registration as the park pages make (components/offline/service-worker.tsx): the whole site.
  const registration = await navigator.serviceWorker.register(SERVICE_WORKER_URL, { scope: "/" });
  await navigator.serviceWorker.ready;
  const existing = await registration.pushManager.getSubscription();
  if (existing) return existing;
  return registration.pushManager.subscribe({ userVisibleOnly: true, applicationServerKey: applicationServerKey(publicKey) });
}

export function PushAlerts({ publicKey, choice }: { publicKey: string | null; choice: PushChoice }) {
  const router = useRouter();
  const [outcome, setOutcome] = useState<Outcome>(null);
  const browserGap = useSyncExternalStore(neverChanges, missingSupport, () => null);
  const unsupported = publicKey ? browserGap : NOT_SET_UP;

  async function turnOn() {
    if (!publicKey) return;
    setOutcome({ tone: "working", text: "Asking this browser…" });
    const permission = await Notification.requestPermission();
    if (permission !== "granted") {
      return setOutcome({ tone: "error", text: "This browser is not allowing notifications from Loamcast. Allow them in the browser's site settings, then try again." });
    }
    let subscription: PushSubscription;
    try {
      subscription = await browserSubscription(publicKey);
    } catch {
      return setOutcome({ tone: "error", text: "This browser could not reach its push service. Check your connection and try again; nothing was saved." });
    }
    const saved = await sendJson("POST", "/api/me/push-subscriptions", {
      parkSlug: choice.parkSlug,
      trailIds: choice.trailIds,
      kinds: choice.kinds,
      subscription: subscription.toJSON(),
    });
    if (!saved.ok) return setOutcome({ tone: "error", text: saved.error.message });
    setOutcome({ tone: "ok", text: `Alerts on: this browser will show notices from ${choice.parkName}.` });
    router.refresh();
  }

  return (
    <div className="space-y-2 border-t border-loam-200 pt-3" data-testid="push-alerts">
      <h3 className="font-bold">Or as alerts on this browser</h3>
      <p className="text-sm text-loam-700">The same choice, shown as a notification on this phone or computer, even with Loamcast closed. No e-mail needed.</p>
      {unsupported ? (
        <p className="text-sm font-semibold">{unsupported}</p>
      ) : (
        <button type="button" className="btn-quiet w-full" onClick={turnOn} disabled={outcome?.tone === "working"}>
          Alert this browser
        </button>
      )}
      <p aria-live="polite" data-testid="push-outcome" className={outcome?.tone === "error" ? "field-error" : "text-sm font-semibold text-moss-700"}>
        {outcome?.text ?? ""}
      </p>
    </div>
  );
}

/** Stops alerts to one browser (this one or another the rider used). */
export function RemovePushButton({ id, parkName }: { id: string; parkName: string }) {
  const router = useRouter();
  const [error, setError] = useState("");
  const [pending, setPending] = useState(false);
  async function remove() {
    setPending(true);
    const result = await sendJson("DELETE", `/api/me/push-subscriptions/${id}`);
    setPending(false);
    if (!result.ok && result.status !== 404) return setError(result.error.message);
    router.refresh();
  }
  return (
    <div>
      <p className="field-error" aria-live="polite">{error}</p>
      <button type="button" className="btn-quiet" onClick={remove} disabled={pending} aria-label={`Stop browser alerts from ${parkName}`}>
        {pending ? "Removing…" : "Remove"}
      </button>
    </div>
  );
}
