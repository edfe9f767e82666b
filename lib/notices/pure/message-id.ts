/**
 * One Message-ID per (notice, rider), decided when the delivery is queued and stored on its
 * row: a resend after a crash carries the same id, so mail systems can recognise it.
 * The SQL that queues deliveries builds ids from these two parts around the user id.
 */
export function messageIdParts(noticeId: string, domain: string) {
  if (!/^[a-z0-9.-]+$/i.test(domain)) throw new Error(`Not a usable Message-ID domain: ${domain}`);
  return { prefix: `<notice-${noticeId}.`, suffix: `@${domain}>` };
}

export function noticeMessageId(noticeId: string, userId: string, domain: string): string {
  const { prefix, suffix } = messageIdParts(noticeId, domain);
  return `${prefix}${userId}${suffix}`;
}

/** The domain for our Message-IDs: the app's own host name. */
export const messageIdDomain = (appUrl: string) => new URL(appUrl).hostname || "loamcast.local";
