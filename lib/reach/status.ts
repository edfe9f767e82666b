import "server-only";
import { boardForPark } from "@/lib/conditions/board";
import { statusFeed } from "@/lib/reach/pure/status-feed";
import { env } from "@/lib/server/env";
import { notFound } from "@/lib/shared/errors";

/** Open to every origin for reading only: the feed is public and carries no cookies' data. */
export const STATUS_FEED_CORS = {
  "access-control-allow-origin": "*",
  "access-control-allow-methods": "GET, OPTIONS",
  "access-control-allow-headers": "If-None-Match",
  "access-control-expose-headers": "ETag",
};

export async function statusFeedFor(slug: string) {
  const board = await boardForPark(slug);
  if (!board) throw notFound("Park not found.");
  return statusFeed(board, env().APP_URL);
}
