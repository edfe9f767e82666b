import Link from "next/link";
import { notFound } from "next/navigation";
import { getActor } from "@/lib/server/auth/actor";
import { can } from "@/lib/server/auth/permissions";
import { getNotice, listDeliveries } from "@/lib/notices/notice-queries";
import { AppError } from "@/lib/shared/errors";
import { formatClosedUntil } from "@/lib/notices/compose";
import { parkLocalDate, parkLocalTime, formatParkDateTime } from "@/lib/shared/park-clock";
import { FollowDeliveries } from "@/components/notices/follow-deliveries";
import { CHANNEL_WORDS, deliveryLine, deliveryWord, waitingCount } from "@/lib/notices/pure/delivery-words";
import { KindLabel } from "../notice-bits";
import { RetryFailedForm } from "./retry-form";

export const metadata = { title: "Notice deliveries" };
export const dynamic = "force-dynamic";

const SHOWN = 200;

export default async function NoticePage({ params, searchParams }: { params: Promise<{ parkSlug: string; noticeId: string }>; searchParams: Promise<{ sent?: string }> }) {
  const [{ parkSlug, noticeId }, { sent }] = await Promise.all([params, searchParams]);
  const actor = await getActor();
  const notice = await getNotice(actor, noticeId).catch((error) => {
    if (error instanceof AppError && (error.status === 404 || error.status === 403)) notFound();
    throw error;
  });
  if (notice.park.slug !== parkSlug) notFound();
  const deliveries = await listDeliveries(notice.id, SHOWN);
  const tz = notice.park.timeZone;
  const when = (d: Date | null) => (d ? formatParkDateTime(d, tz) : "");
  const waiting = waitingCount(notice.deliveries);
  return (
    <section className="space-y-4">
      <p><Link href={`/staff/${parkSlug}/notices`} className="text-sm font-semibold text-moss-700 underline">← Notices</Link></p>
      <FollowDeliveries waiting={waiting} />
      {sent && waiting > 0 && (
        <p role="status" className="rounded-lg bg-moss-100 p-3 font-semibold text-moss-700" data-testid="sending-banner">
          Sending to {notice.recipientCount} {notice.recipientCount === 1 ? "rider" : "riders"}. This page follows the deliveries by itself.
        </p>
      )}
      <div className="card space-y-2">
        <p className="text-sm text-loam-600"><KindLabel kind={notice.kind} /> · {when(notice.createdAt)} · {notice.trails.length > 0 ? notice.trails.map((t) => t.name).join(", ") : "whole park"}</p>
        <h1 className="text-xl font-bold">{notice.subject}</h1>
        <p className="whitespace-pre-line">{notice.message}</p>
        {notice.closedUntil && <p><strong>Closed until:</strong> {formatClosedUntil(notice.closedUntil, tz)}</p>}
      </div>

      <div className="card space-y-3">
        <div className="flex flex-wrap items-center justify-between gap-2">
          <h2 className="text-lg font-bold">Deliveries</h2>
          <Link href={`/staff/${parkSlug}/notices/${notice.id}`} className="btn-quiet">Refresh</Link>
        </div>
        <p className="text-lg font-semibold" aria-live="polite" data-testid="delivery-summary">
          {deliveryLine(notice.deliveries)}
        </p>
        {notice.deliveries.failed > 0 && can(actor, "notice:send", { parkId: notice.park.id }) && <RetryFailedForm parkSlug={parkSlug} noticeId={notice.id} failed={notice.deliveries.failed} />}
        {deliveries.length === 0 ? (
          <p className="text-loam-700">Nobody matched this notice, so nothing was sent.</p>
        ) : (
          <div className="overflow-x-auto">
            <table className="w-full text-left text-sm">
              <caption className="sr-only">Deliveries, failed first</caption>
              <thead>
                <tr className="border-b border-loam-200">
                  <th scope="col" className="py-2 pr-2">Rider, by</th>
                  <th scope="col" className="py-2 pr-2">State</th>
                  <th scope="col" className="py-2 pr-2">Tries</th>
                  <th scope="col" className="py-2">Detail</th>
                </tr>
              </thead>
              <tbody>
                {deliveries.map((d) => (
                  <tr key={d.id} className="border-b border-loam-100 align-top">
                    <td className="py-2 pr-2">
                      <span className="break-all">{d.email}</span>
                      <span className="block text-loam-600">{CHANNEL_WORDS[d.channel]}</span>
                    </td>
                    <td className="py-2 pr-2 font-semibold">{deliveryWord(d.state, d.nextAttemptAt, tz)}</td>
                    <td className="py-2 pr-2">{d.attempts}</td>
                    <td className="py-2 text-loam-700">
                      {d.state === "sent" ? when(d.sentAt) : (d.lastError ?? "")}
                    </td>
                  </tr>
                ))}
              </tbody>
            </table>
            {notice.recipientCount > SHOWN && <p className="mt-2 text-sm text-loam-600">Showing {SHOWN} of {notice.recipientCount}, those needing attention first.</p>}
          </div>
        )}
      </div>
    </section>
  );
}
