/**
 * A notice's deliveries in the words a park's staff use: waiting, delivered, couldn't deliver,
 * trying again at 07:42. The queue's five states (queued, sending, retrying, sent, failed) are
 * the worker's business; staff see three outcomes and when the next try is.
 */
import { parkLocalTime } from "@/lib/shared/park-clock";

export type DeliveryStateName = "queued" | "sending" | "retrying" | "sent" | "failed";
export type Counts = Record<DeliveryStateName, number>;

export const waitingCount = (c: Counts) => c.queued + c.sending + c.retrying;

/** One delivery's state: "trying again at 07:42" names the park's clock. */
export function deliveryWord(state: DeliveryStateName, nextAttemptAt: Date | null, timeZone: string): string {
  if (state === "sent") return "delivered";
  if (state === "failed") return "couldn't deliver";
  if (state === "retrying" && nextAttemptAt) return `trying again at ${parkLocalTime(nextAttemptAt, timeZone)}`;
  return "waiting";
}

/** "8 delivered · 2 waiting · 1 couldn't deliver", leaving out what is zero. */
export function deliveryLine(c: Counts): string {
  const parts = [
    [c.sent, "delivered"],
    [waitingCount(c), "waiting"],
    [c.failed, "couldn't deliver"],
  ] as const;
  const shown = parts.filter(([n]) => n > 0).map(([n, word]) => `${n} ${word}`);
  return shown.length ? shown.join(" · ") : "nothing to deliver";
}

export type DeliveryChannelName = "email" | "push";

/** How a delivery travels, in the words beside each row on the staff page. */
export const CHANNEL_WORDS: Record<DeliveryChannelName, string> = { email: "e-mail", push: "alert on a browser" };
