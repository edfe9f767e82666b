/**
 * Staff pin moves as data: which endpoint a pin moves through, the body to send, and the move
 * that undoes one. Pure, so the undo rule is unit-tested; the page only sends what this returns.
 */
export type PinKind = "feature" | "hazard";
export type Pin = { key: string; kind: PinKind; id: string; lon: number; lat: number; label: string; lockVersion?: number };
export type PinMoveRequest = { url: string; body: { lon: number; lat: number; lockVersion?: number } };

/** What the server answered to a move: where the pin now is, and where it was. */
export type PinMoveResult = { pin: Pin; previous: { lon: number; lat: number } };

export const pinKey = (kind: PinKind, id: string) => `${kind}:${id}`;

export function moveRequest(pin: Pin, to: { lon: number; lat: number }): PinMoveRequest {
  const url = pin.kind === "hazard" ? `/api/hazards/${encodeURIComponent(pin.id)}/position` : `/api/trail-features/${encodeURIComponent(pin.id)}/position`;
  return { url, body: pin.kind === "hazard" ? { lon: to.lon, lat: to.lat, lockVersion: pin.lockVersion ?? 0 } : { lon: to.lon, lat: to.lat } };
}

/** Undo = move the pin back where it was, at the version the last move produced. */
export const undoRequest = (last: PinMoveResult): PinMoveRequest => moveRequest(last.pin, last.previous);

/** Reads a move's answer into the pin's new state. */
export function applyMoveAnswer(pin: Pin, answer: unknown): PinMoveResult {
  const body = answer as { feature?: { lon: number; lat: number }; hazard?: { lon: number; lat: number; lockVersion: number }; previous: { lon: number; lat: number } };
  const moved = pin.kind === "hazard" ? body.hazard : body.feature;
  if (!moved || !body.previous) throw new Error("The server's answer did not include the new position.");
  return { pin: { ...pin, lon: moved.lon, lat: moved.lat, ...(body.hazard ? { lockVersion: body.hazard.lockVersion } : {}) }, previous: body.previous };
}

/** Sends a move; a refusal becomes an Error carrying the server's own message. */
export async function sendMove(request: PinMoveRequest): Promise<unknown> {
  const response = await fetch(request.url, { method: "PATCH", headers: { "content-type": "application/json" }, body: JSON.stringify(request.body) });
  const answer = await response.json().catch(() => null);
  if (!response.ok) throw new Error((answer as { error?: { message?: string } })?.error?.message ?? `The move was refused (${response.status}).`);
  return answer;
}
