import { z } from "zod";
import { noteCheck } from "@/lib/shared/text";

/** Notices and subscriptions: the shapes forms, actions and route handlers all accept. */
export const NOTICE_KINDS = ["closure", "reopening", "advisory"] as const;
export type NoticeKind = (typeof NOTICE_KINDS)[number];

export const MESSAGE_MAX = 2000;
export const MAX_TRAILS_PER_NOTICE = 100;

// Control characters other than tab, LF and CR have no place in a message riders read.

const kind = z.enum(NOTICE_KINDS, { message: "Choose closure, reopening or advisory." });

/** null = the whole park; otherwise a non-empty list of distinct trail ids. */
const trailIds = z
  .array(z.uuid("Choose trails from the list."))
  .min(1, "Choose at least one trail, or the whole park.")
  .max(MAX_TRAILS_PER_NOTICE, `Choose at most ${MAX_TRAILS_PER_NOTICE} trails.`)
  .transform((ids) => [...new Set(ids)])
  .nullable();

export const noticeFields = z
  .strictObject({
    kind,
    trailIds: trailIds.default(null),
    message: z
      .string({ message: "Write the message riders will read." })
      .trim()
      .min(1, "Write the message riders will read.")
      .max(MESSAGE_MAX, `Keep the message under ${MESSAGE_MAX} characters.`)
      .superRefine(noteCheck("The message")),
    closedUntil: z.iso
      .datetime({ offset: true, message: "Give 'closed until' as a date and time." })
      .transform((text) => new Date(text))
      .refine((date) => date.getTime() > Date.now(), "'Closed until' must be in the future.")
      .nullable()
      .default(null),
  })
  .superRefine((notice, ctx) => {
    if (notice.closedUntil && notice.kind !== "closure") {
      ctx.addIssue({ code: "custom", path: ["closedUntil"], message: "Only a closure has a 'closed until' time." });
    }
  });
export type NoticeFields = z.infer<typeof noticeFields>;

export const subscriptionFields = z.strictObject({
  parkSlug: z.string().trim().min(1, "Choose a park.").max(60),
  trailIds: trailIds.default(null),
  kinds: z
    .array(kind)
    .min(1, "Choose at least one kind of notice.")
    .transform((kinds) => NOTICE_KINDS.filter((k) => kinds.includes(k))),
});
export type SubscriptionFields = z.infer<typeof subscriptionFields>;

/** Signed link tokens arrive in a query string; anything else is refused before verifying. */
export const linkToken = z.string().trim().min(20, "This link is incomplete.").max(1000, "This link is not valid.");

/** base64url text of exactly `bytes` bytes (no padding), as browsers give push keys (RFC 8291 §3). */
const base64urlOf = (bytes: number, what: string) =>
  z.string().regex(/^[A-Za-z0-9_-]+$/, `${what} is not base64url.`).length(Math.ceil((bytes * 4) / 3), `${what} must be ${bytes} bytes.`);

/** What PushSubscription.toJSON() gives in a browser: endpoint and the two keys. */
export const browserPushSubscription = z.object({
  endpoint: z.url({ message: "The browser gave no usable push address." }).max(1000, "The browser's push address is too long."),
  keys: z.strictObject({
    // An uncompressed P-256 point (65 bytes) and a 16-byte auth secret (RFC 8291 §3.1, §3.2).
    p256dh: base64urlOf(65, "The browser's push key"),
    auth: base64urlOf(16, "The browser's push secret"),
  }),
  // Browsers add this; we do not use it.
  expirationTime: z.number().nullable().optional(),
});

/** Subscribe one browser: the park and its choice of trails and kinds, as for e-mail. */
export const pushSubscriptionFields = z.strictObject({
  parkSlug: subscriptionFields.shape.parkSlug,
  trailIds: trailIds.default(null),
  kinds: subscriptionFields.shape.kinds,
  subscription: browserPushSubscription,
});
export type PushSubscriptionFields = z.infer<typeof pushSubscriptionFields>;
