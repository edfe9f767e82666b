import Link from "next/link";
import { getActor } from "@/lib/server/auth/actor";
import { parkTrailChoices } from "@/lib/notices/notice-queries";
import { MESSAGE_MAX, NOTICE_KINDS, type NoticeKind } from "@/lib/notices/pure/schemas";
import { NoticeForm, type NoticeDraft } from "./notice-form";
import { requireParkAccess } from "@/lib/parks/queries";

export const metadata = { title: "New notice" };
export const dynamic = "force-dynamic";

type Search = { kind?: string; trailIds?: string; message?: string };

/** Other pages link here prefilled: ?kind=closure&trailIds=a,b&message=… (unknown trails are dropped). */
export default async function NewNoticePage({ params, searchParams }: { params: Promise<{ parkSlug: string }>; searchParams: Promise<Search> }) {
  const [{ parkSlug }, search] = await Promise.all([params, searchParams]);
  const [actor, park] = await Promise.all([getActor(), requireParkAccess(parkSlug, "notice:send")]);
  const trails = await parkTrailChoices(park.id);
  const known = new Set(trails.map((t) => t.id));
  const trailIds = String(search.trailIds ?? "").split(",").map((s) => s.trim()).filter((id) => known.has(id));
  const draft: NoticeDraft = {
    kind: NOTICE_KINDS.includes(search.kind as NoticeKind) ? (search.kind as NoticeKind) : "closure",
    scope: trailIds.length > 0 ? "trails" : "park",
    trailIds,
    message: String(search.message ?? "").slice(0, MESSAGE_MAX),
    closedUntil: "",
  };
  return (
    <section className="space-y-4">
      <p><Link href={`/staff/${park.slug}/notices`} className="text-sm font-semibold text-moss-700 underline">← Notices</Link></p>
      <h1 className="text-2xl font-bold">{park.name}: new notice</h1>
      <p className="text-loam-700">Riders who subscribed (and confirmed their address) get it by e-mail. Preview it first: you will see exactly what they receive and how many will.</p>
      <NoticeForm parkSlug={park.slug} timeZone={park.timeZone} trails={trails} draft={draft} />
    </section>
  );
}
