import "server-only";
import { signToken, verifyToken } from "@/lib/server/auth/tokens";
import { env } from "@/lib/server/env";

/**
 * Signed links that work without signing in. Each carries its purpose, so a confirmation
 * link cannot be replayed as an unsubscribe link or the other way round.
 */
export const CONFIRM_LINK_DAYS = 7;
/** Unsubscribe links must keep working long after the e-mail arrived. */
export const UNSUBSCRIBE_LINK_DAYS = 400;

type ConfirmPayload = { purpose: "confirm-subscription"; subscriptionId: string; email: string };
type UnsubscribePayload = { purpose: "unsubscribe"; userId: string; parkId: string };

export const confirmToken = (subscriptionId: string, email: string) =>
  signToken({ purpose: "confirm-subscription", subscriptionId, email } satisfies ConfirmPayload, CONFIRM_LINK_DAYS * 86_400);

export const unsubscribeToken = (userId: string, parkId: string) =>
  signToken({ purpose: "unsubscribe", userId, parkId } satisfies UnsubscribePayload, UNSUBSCRIBE_LINK_DAYS * 86_400);

/** The payload of a valid, unexpired confirmation token, or null. */
export function readConfirmToken(token: string): ConfirmPayload | null {
  const payload = verifyToken<ConfirmPayload>(token);
  return payload?.purpose === "confirm-subscription" && typeof payload.subscriptionId === "string" ? payload : null;
}

export function readUnsubscribeToken(token: string): UnsubscribePayload | null {
  const payload = verifyToken<UnsubscribePayload>(token);
  return payload?.purpose === "unsubscribe" && typeof payload.userId === "string" && typeof payload.parkId === "string" ? payload : null;
}

export function subscriptionLinks(appUrl = env().APP_URL) {
  return {
    confirm: (token: string) => `${appUrl}/api/subscriptions/confirm?token=${encodeURIComponent(token)}`,
    unsubscribePage: (token: string) => `${appUrl}/unsubscribe?token=${encodeURIComponent(token)}`,
    oneClick: (token: string) => `${appUrl}/api/unsubscribe?token=${encodeURIComponent(token)}`,
  };
}
