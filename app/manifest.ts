import type { MetadataRoute } from "next";
import { webAppManifest } from "@/lib/reach/pure/manifest";

/** The site's manifest; a park's board links its own (app/parks/[parkSlug]/manifest.webmanifest). */
export default function manifest(): MetadataRoute.Manifest {
  return webAppManifest();
}
