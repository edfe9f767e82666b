/**
 * The web app manifest (W3C Web App Manifest). One shape for the site and for each park: a rider
 * who installs from a park's board gets that board as the start page.
 */
/** The manifest members Loamcast writes (the shape of Next's MetadataRoute.Manifest, kept here so pure code needs no framework). */
export type WebAppManifest = {
  name: string;
  short_name: string;
  description?: string;
  id?: string;
  start_url: string;
  scope?: string;
  display: "standalone" | "browser" | "minimal-ui" | "fullscreen";
  orientation?: "any" | "portrait" | "landscape";
  background_color?: string;
  theme_color?: string;
  icons: { src: string; sizes: string; type: string; purpose: "any" | "maskable" }[];
};

const ICONS: WebAppManifest["icons"] = [
  { src: "/icons/icon-192.png", sizes: "192x192", type: "image/png", purpose: "any" },
  { src: "/icons/icon-512.png", sizes: "512x512", type: "image/png", purpose: "any" },
  { src: "/icons/maskable-512.png", sizes: "512x512", type: "image/png", purpose: "maskable" },
];

export const THEME_COLOUR = "#342b21";

export function webAppManifest(park?: { slug: string; name: string }): WebAppManifest {
  return {
    id: park ? `/parks/${park.slug}` : "/",
    name: park ? `${park.name} · Loamcast` : "Loamcast",
    short_name: park ? park.name.slice(0, 12) : "Loamcast",
    description: "Today's trail conditions, park map and tyre-pressure band for your bike park.",
    start_url: park ? `/parks/${park.slug}` : "/",
    scope: "/",
    display: "standalone",
    orientation: "portrait",
    background_color: "#f6f1ea",
    theme_color: THEME_COLOUR,
    icons: ICONS,
  };
}
