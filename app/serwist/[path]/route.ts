// GET /serwist/{path}: the service worker (sw.js) and its source map, bundled at build time by Serwist from lib/client/service-worker.ts (public).
import { createSerwistRoute } from "@serwist/turbopack";

const serwist = createSerwistRoute({
  swSrc: "lib/client/service-worker.ts",
  // The native esbuild that tsx already installs; no WebAssembly copy needed.
  useNativeEsbuild: true,
});

// Segment config as literals (Next reads them without running the module); the values Serwist's route uses.
export const dynamic = "force-static";
export const dynamicParams = false;
export const revalidate = false;
export const generateStaticParams = serwist.generateStaticParams;
export const GET = serwist.GET;
