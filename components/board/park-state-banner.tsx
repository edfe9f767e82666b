import { PARK_STATE_LABELS } from "@/lib/conditions/pure/labels";
import type { BoardParkState } from "@/lib/conditions/board";
import { parkLocalTime } from "@/lib/shared/park-clock";

/** The park-wide state, shown above every trail while it lasts. */
export function ParkStateBanner({ state, timeZone }: { state: BoardParkState; timeZone: string }) {
  const overrides = state.state !== "advisory";
  return (
    <section
      role="status"
      aria-label="Park-wide notice"
      className={`rounded-xl border-2 p-4 ${overrides ? "border-brick-600 bg-brick-100 text-brick-600" : "border-dashed border-flare-500 bg-flare-100 text-loam-900"}`}
      data-testid="park-state"
    >
      <p className="text-lg font-bold">
        <span aria-hidden="true">{overrides ? "✕ " : "! "}</span>
        {PARK_STATE_LABELS[state.state]}
      </p>
      <p className="font-semibold">{state.message}</p>
      <p className="text-sm">
        {overrides ? "Every trail is closed while this lasts." : "Trails keep their own status."}
        {state.endsAt ? ` Until ${parkLocalTime(new Date(state.endsAt), timeZone)}.` : " Until staff clear it."}
      </p>
    </section>
  );
}
