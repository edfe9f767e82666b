// GET /serwist/{path}: the service worker (sw.js) and its source map, bundled at build time by Serwist from lib/client/service-worker.ts (public).
import { createSerwistRoute } from "@serwist/turbopack";

const serwist = createSerwistRoute({
  swSrc: "lib/client/service-worker.ts",
  // The native esbuild that tsx already installs; no WebAssembly copy needed.
  useNativeEsbuild: true,
  // The app shell is precached on the first visit; MapLibre and its worker (over 500 KB each)
  // are not, so installing never competes with a map that is loading: they are kept the first
  // time a map page fetches them (the "build-files" cache in the worker).
  maximumFileSizeToCacheInBytes: 400 * 1024,
});

// Segment config as literals (Next reads them without running the module); the values Serwist's route uses.
export const dynamic = "force-static";
export const dynamicParams = false;
export const revalidate = false;
export const generateStaticParams = serwist.generateStaticParams;
export const GET = serwist.GET;
