// MapLibre's worker cannot be resolved by Turbopack: serve our own copy from public/.
import { copyFileSync, existsSync, mkdirSync } from "node:fs";
const source = "node_modules/maplibre-gl/dist/maplibre-gl-worker.mjs";
if (existsSync(source)) {
  mkdirSync("public/vendor", { recursive: true });
  copyFileSync(source, "public/vendor/maplibre-gl-worker.mjs");
}
