"use client";
/**
 * The morning check: every trail as a compact row, yesterday's values offered as the start,
 * and one Save that sends every marked trail to POST /api/parks/{slug}/morning-check (one
 * transaction: all saved or none, problems and conflicts listed per trail). Progress, Save,
 * "Mark the rest unchanged" and the result of the save sit in the bar at the bottom of the
 * screen, where the thumb is.
 */
import { useRouter } from "next/navigation";
import { useEffect, useMemo, useRef, useState } from "react";
import { draftFromStart, entryFromDraft, isChecked, markRestUnchanged, restToMark, type CheckDraft } from "@/lib/conditions/pure/check-draft";
import type { OfferedNoticeKind } from "@/lib/conditions/pure/notice-link";
import type { MorningCheckStart } from "@/lib/conditions/morning-check-start";
import { CheckTrailRow, type TrailMessage } from "./check-trail";

type Problem = { trailId: string | null; field: string; message: string };
type Conflict = { trailId: string; trailName: string; current: { revision: number; status: string; reason: string | null; surfaces: string[]; features: Record<string, string>; note: string | null } | null };
type Outcome = { ok: true; saved: number; notices: Record<OfferedNoticeKind, string | null> } | { ok: false; message: string };

const initialDrafts = (start: MorningCheckStart) => Object.fromEntries(start.trails.map((t) => [t.id, draftFromStart(t.start, t.baseRevision)]));
const plural = (n: number, word: string) => `${n} ${word}${n === 1 ? "" : "s"}`;

export function MorningCheckForm({ parkSlug, start }: { parkSlug: string; start: MorningCheckStart }) {
  const router = useRouter();
  const [drafts, setDrafts] = useState<Record<string, CheckDraft>>(() => initialDrafts(start));
  const [openRows, setOpenRows] = useState<Set<string>>(new Set());
  const [messages, setMessages] = useState<Record<string, TrailMessage>>({});
  const [outcome, setOutcome] = useState<Outcome | null>(null);
  const [pending, setPending] = useState(false);
  const outcomeRef = useRef<HTMLDivElement>(null);

  const facts = useMemo(() => start.trails.map((t) => ({ id: t.id, inspectedToday: t.inspectedToday, hasStart: Boolean(t.start) })), [start.trails]);
  const marked = start.trails.filter((t) => drafts[t.id]?.mode !== "untouched");
  const checked = facts.filter((t) => isChecked(t, drafts[t.id])).length;
  const rest = restToMark(facts, drafts);
  const setDraft = (trailId: string, draft: CheckDraft) => setDrafts((all) => ({ ...all, [trailId]: draft }));
  const setOpen = (trailId: string, open: boolean) =>
    setOpenRows((all) => {
      const next = new Set(all);
      if (open) next.add(trailId);
      else next.delete(trailId);
      return next;
    });

  // The result of a save is announced and brought into view with the focus, wherever the ranger was.
  useEffect(() => {
    if (!outcome) return;
    const firstTrouble = Object.keys(messages)[0];
    const target = !outcome.ok && firstTrouble ? document.getElementById(`trail-${firstTrouble}`) : outcomeRef.current;
    // A trail that needs attention goes to the middle of the screen, clear of the bar at the bottom.
    target?.scrollIntoView({ block: target === outcomeRef.current ? "nearest" : "center" });
    target?.focus({ preventScroll: true });
  }, [outcome, messages]);

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
    setOpenRows((all) => new Set([...all, ...Object.keys(next)]));
    setMessages(next);
    setOutcome({ ok: false, message: body.error?.message ?? "Nothing was saved." });
  }

  async function submit(event: React.FormEvent) {
    event.preventDefault();
    const entries = start.trails.map((t) => entryFromDraft(t.id, drafts[t.id])).filter(Boolean);
    if (entries.length === 0) {
      setOutcome({ ok: false, message: "Mark at least one trail (Change it, or tap Unchanged) before saving." });
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
      setOpenRows(new Set());
      setOutcome({ ok: true, saved: body.saved.length, notices: body.notices });
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
    <form onSubmit={submit} className="space-y-3" noValidate>
      <ul className="space-y-2">
        {start.trails.map((trail) => (
          <CheckTrailRow
            key={trail.id}
            trail={trail}
            draft={drafts[trail.id]}
            open={openRows.has(trail.id)}
            onOpen={(open) => setOpen(trail.id, open)}
            onChange={(d) => setDraft(trail.id, d)}
            message={messages[trail.id]}
          />
        ))}
      </ul>
      <div className="sticky bottom-0 -mx-4 space-y-2 border-t border-loam-200 bg-loam-50/95 px-4 py-2" data-sticky-bottom>
        <div ref={outcomeRef} tabIndex={-1} aria-live="polite" className="outline-none" data-testid="check-outcome">
          {outcome && (
            <div className={`rounded-lg p-2 font-semibold ${outcome.ok ? "bg-moss-100 text-moss-700" : "bg-brick-100 text-brick-600"}`} role={outcome.ok ? "status" : "alert"}>
              {outcome.ok ? <p>Saved {plural(outcome.saved, "trail")}. Riders see it on the board now.</p> : <p>{outcome.message}</p>}
              {outcome.ok && (outcome.notices.closure || outcome.notices.reopening) && (
                <p className="mt-1 flex flex-wrap gap-2">
                  {outcome.notices.closure && (
                    <a href={outcome.notices.closure} className="btn-primary">
                      Send a closure notice to riders
                    </a>
                  )}
                  {outcome.notices.reopening && (
                    <a href={outcome.notices.reopening} className="btn-primary">
                      Send a reopening notice to riders
                    </a>
                  )}
                </p>
              )}
            </div>
          )}
        </div>
        <p className="text-sm font-semibold" data-testid="check-count">
          {checked} of {plural(start.trails.length, "trail")} checked today · {marked.length} marked now
        </p>
        <div className="grid grid-cols-2 gap-2">
          <button type="button" className="btn-quiet border-2" disabled={rest === 0} onClick={() => setDrafts(markRestUnchanged(facts, drafts))}>
            Mark the rest unchanged{rest > 0 ? ` (${rest})` : ""}
          </button>
          <button type="submit" className="btn-primary text-lg" disabled={pending || marked.length === 0}>
            {pending ? "Saving…" : `Save ${plural(marked.length, "trail")}`}
          </button>
        </div>
      </div>
    </form>
  );
}
