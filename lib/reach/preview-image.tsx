import "server-only";
/**
 * The link-preview image (Open Graph, Twitter card) drawn by next/og: the park's name and
 * today's counts, and the trail's own status on a trail page. 1200 × 630 is the size Open
 * Graph consumers crop least. Satori lays out flexbox only and counts a number child as
 * several nodes, so each element gets one string. Text stays within the Latin glyphs of next/og's
 * bundled font: any other glyph (✓, ✕) makes it fetch a font from the internet at render time.
 */
import { ImageResponse } from "next/og";
import { z } from "zod";
import { boardForPark } from "@/lib/conditions/board";
import { STATUS_LABELS } from "@/lib/conditions/pure/labels";
import { statusCounts } from "@/lib/reach/pure/status-feed";
import { AppError, notFound } from "@/lib/shared/errors";
import { longDate } from "@/lib/shared/park-clock";

export const PREVIEW_SIZE = { width: 1200, height: 630 };
const querySchema = z.object({ trail: z.uuid({ message: "trail must be a trail id." }).optional() });

const INK = { open: "#245522", caution: "#8a5a00", closed: "#98301f" } as const;

function Count({ n, label, colour }: { n: number; label: string; colour: string }) {
  return (
    <div style={{ display: "flex", flexDirection: "column", alignItems: "center", padding: "16px 28px", borderRadius: 20, background: "#ffffff", border: `6px solid ${colour}` }}>
      <div style={{ fontSize: 96, lineHeight: 1, color: colour }}>{String(n)}</div>
      <div style={{ fontSize: 34, color: colour }}>{label}</div>
    </div>
  );
}

export async function previewImage(slug: string, search: URLSearchParams): Promise<ImageResponse> {
  const parsed = querySchema.safeParse(Object.fromEntries(search));
  if (!parsed.success) throw new AppError(400, parsed.error.issues[0].message, "trail");
  const board = await boardForPark(slug);
  if (!board) throw notFound("Park not found.");
  const trail = parsed.data.trail ? board.trails.find((t) => t.id === parsed.data.trail) : undefined;
  if (parsed.data.trail && !trail) throw notFound("Trail not found.");
  const counts = statusCounts(board.trails);
  const status = trail?.effectiveStatus;
  return new ImageResponse(
    (
      <div style={{ width: "100%", height: "100%", display: "flex", flexDirection: "column", justifyContent: "space-between", padding: 60, background: "#f6f1ea", color: "#221c16" }}>
        <div style={{ display: "flex", flexDirection: "column" }}>
          <div style={{ fontSize: 34, color: "#5b4a3a" }}>{`Loamcast · ${longDate(board.date)}`}</div>
          <div style={{ fontSize: 80, lineHeight: 1.05, marginTop: 8 }}>{trail ? trail.name : board.park.name}</div>
          <div style={{ fontSize: 40, marginTop: 8, color: status ? INK[status] : "#5b4a3a" }}>
            {trail ? (status ? `${STATUS_LABELS[status]} today · ${board.park.name}` : `Not inspected yet today · ${board.park.name}`) : "Today's trail conditions"}
          </div>
        </div>
        <div style={{ display: "flex", gap: 28 }}>
          <Count n={counts.open} label="open" colour={INK.open} />
          <Count n={counts.caution} label="caution" colour={INK.caution} />
          <Count n={counts.closed} label="closed" colour={INK.closed} />
        </div>
      </div>
    ),
    { ...PREVIEW_SIZE, headers: { "Cache-Control": "public, max-age=300" } },
  );
}

/** The metadata that points link previews at the image. */
export function previewMetadata({ title, description, url, imageUrl }: { title: string; description: string; url: string; imageUrl: string }) {
  const images = [{ url: imageUrl, ...PREVIEW_SIZE, alt: description }];
  return {
    openGraph: { title, description, url, siteName: "Loamcast", type: "website" as const, images },
    twitter: { card: "summary_large_image" as const, title, description, images },
  };
}
