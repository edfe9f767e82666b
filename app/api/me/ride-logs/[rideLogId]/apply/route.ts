// POST /api/me/ride-logs/{rideLogId}/apply: apply the ride's suggestion to its setup's baseline (once; 409 after).
import { handler } from "@/lib/api/handler";
import { applyRideLogSuggestion } from "@/lib/riders/ride-logs";

export const POST = handler<{ rideLogId: string }>(async ({ params, actor }) => Response.json(await applyRideLogSuggestion(actor, params.rideLogId)));
