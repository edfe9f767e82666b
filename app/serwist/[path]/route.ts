// GET /serwist/{path}: the service worker (sw.js) and its source map, bundled at build time by Serwist from lib/client/service-worker.ts (public).
import { createSerwistRoute } from "@serwist/turbopack";

export const { dynamic, dynamicParams, revalidate, generateStaticParams, GET } = createSerwistRoute({
  swSrc: "lib/client/service-worker.ts",
  // The native esbuild that tsx already installs; no WebAssembly copy needed.
  useNativeEsbuild: true,
  // Build files and public/ are precached, except what only staff pages or the seed use.
  globIgnores: ["public/demo/**"],
});
