"use client";
/**
 * The morning check: every trail on one screen, yesterday's values offered as the start,
 * and one Save that sends every marked trail to POST /api/parks/{slug}/morning-check (one
 * transaction: all saved or none, problems and conflicts listed per trail).
 */
import { useRouter } from "next/navigation";
import { useMemo, useState } from "react";
import { draftFromStart, entryFromDraft, type CheckDraft } from "@/lib/conditions/pure/check-draft";
import type { MorningCheckStart } from "@/lib/conditions/morning-check-start";
import { CheckTrailRow, type TrailMessage } from "./check-trail";

type Problem = { trailId: string | null; field: string; message: string };
type Conflict = { trailId: string; trailName: string; current: { revision: number; status: string; reason: string | null; surfaces: string[]; features: Record<string, string>; note: string | null } | null };
type Outcome = { ok: true; saved: number; closureNoticeHref: string | null } | { ok: false; message: string };

const initialDrafts = (start: MorningCheckStart) => Object.fromEntries(start.trails.map((t) => [t.id, draftFromStart(t.start, t.baseRevision)]));

export function MorningCheckForm({ parkSlug, start }: { parkSlug: string; start: MorningCheckStart }) {
  const router = useRouter();
  const [drafts, setDrafts] = useState<Record<string, CheckDraft>>(() => initialDrafts(start));
  const [messages, setMessages] = useState<Record<string, TrailMessage>>({});
  const [outcome, setOutcome] = useState<Outcome | null>(null);
  const [pending, setPending] = useState(false);

  const marked = useMemo(() => start.trails.filter((t) => drafts[t.id]?.mode !== "untouched"), [drafts, start.trails]);
  const inspectedToday = start.trails.filter((t) => t.inspectedToday || drafts[t.id]?.mode !== "untouched").length;
  const setDraft = (trailId: string, draft: CheckDraft) => setDrafts((all) => ({ ...all, [trailId]: draft }));

  function showRefusal(body: { error?: { message?: string; details?: { problems?: Problem[]; conflicts?: Conflict[] } } }) {
    const next: Record<string, TrailMessage> = {};
    for (const p of body.error?.details?.problems ?? []) if (p.trailId) next[p.trailId] = { kind: "problem", text: p.message };
    for (const c of body.error?.details?.conflicts ?? []) {
      const current = c.current;
      const theirs = current ? `${current.status}${current.reason ? ` (${current.reason})` : ""}${current.surfaces.length ? `, ${current.surfaces.join(", ")}` : ""}` : "no report";
      next[c.trailId] = {
        kind: "conflict",
        text: `Someone else saved ${c.trailName} meanwhile: ${theirs}.`,
        onAdopt: () => {
          const base = current?.revision ?? 0;
          setDraft(c.trailId, { ...draftFromStart(current as Parameters<typeof draftFromStart>[0], base), mode: "edited" });
          setMessages((all) => Object.fromEntries(Object.entries(all).filter(([id]) => id !== c.trailId)));
        },
      };
    }
    setMessages(next);
    setOutcome({ ok: false, message: body.error?.message ?? "Nothing was saved." });
  }

  async function submit(event: React.FormEvent) {
    event.preventDefault();
    const entries = start.trails.map((t) => entryFromDraft(t.id, drafts[t.id])).filter(Boolean);
    if (entries.length === 0) {
      setOutcome({ ok: false, message: "Mark at least one trail (change it, or tap Unchanged) before saving." });
      return;
    }
    setPending(true);
    setOutcome(null);
    try {
      const response = await fetch(`/api/parks/${encodeURIComponent(parkSlug)}/morning-check`, {
        method: "POST",
        headers: { "content-type": "application/json" },
        body: JSON.stringify({ date: start.date, entries }),
      });
      const body = await response.json().catch(() => ({}));
      if (!response.ok) return showRefusal(body);
      setMessages({});
      setOutcome({ ok: true, saved: body.saved.length, closureNoticeHref: body.closureNoticeHref });
      router.refresh();
    } catch {
      setOutcome({ ok: false, message: "No connection: nothing was saved. Your marks are still here; try again when you have signal." });
    } finally {
      setPending(false);
    }
  }

  // After a save, the server's fresh start values (new base revisions) replace the drafts.
  const [seenStart, setSeenStart] = useState(start);
  if (seenStart !== start) {
    setSeenStart(start);
    setDrafts(initialDrafts(start));
  }

  return (
    <form onSubmit={submit} className="space-y-4" noValidate>
      <p className="card font-semibold" aria-live="polite" data-testid="check-count">
        {inspectedToday} of {start.trails.length} trails inspected today · {marked.length} marked in this check
      </p>
      {outcome && (
        <div role={outcome.ok ? "status" : "alert"} className={`rounded-lg p-3 font-semibold ${outcome.ok ? "bg-moss-100 text-moss-700" : "bg-brick-100 text-brick-600"}`} data-testid="check-outcome">
          {outcome.ok ? <p>Saved {outcome.saved} trail{outcome.saved === 1 ? "" : "s"}. Riders see it on the board now.</p> : <p>{outcome.message}</p>}
          {outcome.ok && outcome.closureNoticeHref && (
            <a href={outcome.closureNoticeHref} className="btn-primary mt-2">
              Send a closure notice to riders
            </a>
          )}
        </div>
      )}
      <ul className="space-y-4">
        {start.trails.map((trail) => (
          <CheckTrailRow key={trail.id} trail={trail} draft={drafts[trail.id]} onChange={(d) => setDraft(trail.id, d)} message={messages[trail.id]} />
        ))}
      </ul>
      <div className="sticky bottom-0 -mx-4 border-t border-loam-200 bg-loam-50/95 px-4 py-3" data-sticky-bottom>
        <button type="submit" className="btn-primary w-full text-lg" disabled={pending}>
          {pending ? "Saving…" : `Save ${marked.length} trail${marked.length === 1 ? "" : "s"}`}
        </button>
      </div>
    </form>
  );
}
