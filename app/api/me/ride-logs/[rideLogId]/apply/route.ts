// POST /api/me/ride-logs/{rideLogId}/apply: apply the ride's suggestion to its setup's baseline (once; 409 after).
import { handler } from "@/lib/server/api/handler";
import { applyRideLogSuggestion } from "@/lib/setups/ride-logs";

export const POST = handler<{ rideLogId: string }>(async ({ params, actor }) => Response.json(await applyRideLogSuggestion(actor, params.rideLogId)));
