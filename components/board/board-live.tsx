"use client";
/**
 * The board's live part: starts from the server render and refreshes every minute with SWR.
 * Filters come from the URL (plain links), so the list is right before any script runs.
 */
import type { BoardFilters } from "@/lib/conditions/pure/board-filters";
import { filterTrails } from "@/lib/conditions/pure/filter-trails";
import type { Board } from "@/lib/conditions/board";
import { useBoard } from "@/lib/client/use-board";
import { parkLocalTime } from "@/lib/shared/park-clock";
import { HazardList } from "./hazard-list";
import { ParkStateBanner } from "./park-state-banner";
import { TrailCard } from "./trail-card";

export function BoardLive({ initial, filters }: { initial: Board; filters: BoardFilters }) {
  const { data, error } = useBoard(initial.park.slug, initial);
  const board = data ?? initial;
  const { timeZone } = board.park;
  const trails = filterTrails(board.trails, filters);
  return (
    <div className="space-y-4">
      {board.parkState && <ParkStateBanner state={board.parkState} timeZone={timeZone} />}
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
      {board.trails.length === 0 ? (
        <p className="card" data-testid="no-trails-yet">
          {board.park.name} has not published its trails yet. Check back soon, or ask for closure e-mails to hear when it opens.
        </p>
      ) : trails.length === 0 ? (
        <p className="card">No trail matches these filters.</p>
      ) : (
        <ul className="space-y-3" aria-label="Trails">
          {trails.map((trail) => (
            <TrailCard key={trail.id} trail={trail} timeZone={timeZone} />
          ))}
        </ul>
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
