"use client";
/**
 * The board's live part: starts from the server render and refreshes every minute with SWR.
 * Filters come from the URL (plain links), so the list is right before any script runs.
 */
import type { ReactNode } from "react";
import type { BoardFilters } from "@/lib/conditions/pure/board-filters";
import { boardCounts, firstGlance } from "@/lib/conditions/pure/board-glance";
import { filterTrails } from "@/lib/conditions/pure/filter-trails";
import type { Board } from "@/lib/conditions/board";
import { useBoard } from "@/lib/client/use-board";
import { parkLocalTime } from "@/lib/shared/park-clock";
import { HazardList } from "./hazard-list";
import { ParkStateBanner } from "./park-state-banner";
import { StatusLabel } from "./status-label";
import { TrailCard } from "./trail-card";

function TrailGrid({ trails, timeZone, label }: { trails: Board["trails"]; timeZone: string; label: string }) {
  return (
    <ul className="grid gap-3 md:grid-cols-2 xl:grid-cols-3" aria-label={label}>
      {trails.map((trail) => (
        <TrailCard key={trail.id} trail={trail} timeZone={timeZone} />
      ))}
    </ul>
  );
}

/** "6 open · 1 caution · 2 closed · 1 not yet checked": the answer to "what can I ride today", first. */
function Summary({ board }: { board: Board }) {
  const counts = boardCounts(board.trails);
  const parts = [
    { status: "open" as const, n: counts.open, word: "open" },
    { status: "caution" as const, n: counts.caution, word: "caution" },
    { status: "closed" as const, n: counts.closed, word: "closed" },
    { status: null, n: counts.notChecked, word: "not yet checked" },
  ].filter((p) => p.n > 0);
  return (
    <p className="flex flex-wrap items-center gap-x-3 gap-y-1 text-base font-semibold" data-testid="board-summary">
      {parts.map((p) => (
        <span key={p.word} className="inline-flex items-center gap-1.5">
          <span className="tabular-nums text-lg font-bold">{p.n}</span>
          <span className="sr-only">{p.word}</span>
          <StatusLabel status={p.status} size="sm" />
        </span>
      ))}
    </p>
  );
}

/**
 * The board, answer first: the park-wide notice and a one-line count, then the trails that
 * changed since yesterday or are not open, then the rest; the filters folded below the answer.
 */
export function BoardLive({ initial, filters, filterLinks }: { initial: Board; filters: BoardFilters; filterLinks?: ReactNode }) {
  const { data, error } = useBoard(initial.park.slug, initial);
  const board = data ?? initial;
  const { timeZone } = board.park;
  const trails = filterTrails(board.trails, filters);
  const { attention, rest } = firstGlance(trails);
  return (
    <div className="space-y-4">
      {board.parkState && <ParkStateBanner state={board.parkState} timeZone={timeZone} />}
      <Summary board={board} />
      <p className="text-sm text-loam-700" aria-live="polite">
        {board.trails.length > 0 && (
          <>
            <span data-testid="inspected-count">
              {board.inspectedCount} of {board.trails.length} trails inspected today
            </span>
            {" · "}
          </>
        )}
        updated {parkLocalTime(new Date(board.generatedAt), timeZone)}
        {error && <span className="font-semibold text-brick-600"> · offline, showing the last board</span>}
      </p>
      {board.trails.length > 0 && filterLinks}
      {board.trails.length === 0 ? (
        <p className="card" data-testid="no-trails-yet">
          {board.park.name} has not published its trails yet. Check back soon, or ask for closure e-mails to hear when it opens.
        </p>
      ) : trails.length === 0 ? (
        <p className="card">No trail matches these filters.</p>
      ) : (
        <>
          {attention.length > 0 && (
            <section aria-labelledby="board-attention" className="space-y-2">
              <h2 id="board-attention" className="text-lg font-bold">
                Changed since yesterday or not open ({attention.length})
              </h2>
              <TrailGrid trails={attention} timeZone={timeZone} label="Trails changed or not open" />
            </section>
          )}
          {rest.length > 0 && (
            <section aria-labelledby="board-rest" className="space-y-2">
              <h2 id="board-rest" className="text-lg font-bold">
                Open, as yesterday ({rest.length})
              </h2>
              <TrailGrid trails={rest} timeZone={timeZone} label="Trails open as yesterday" />
            </section>
          )}
        </>
      )}
      {board.parkHazards.length > 0 && (
        <section className="card space-y-2" aria-labelledby="off-trail-hazards">
          <h2 id="off-trail-hazards" className="text-lg font-bold">
            Hazards off the trails ({board.parkHazards.length})
          </h2>
          <HazardList hazards={board.parkHazards} />
        </section>
      )}
    </div>
  );
}
