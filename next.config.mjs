import fs from "node:fs";
import path from "node:path";

// Worktrees may share one install through a node_modules link; Turbopack only reads files
// under its root, so the root is the nearest folder holding both the app and the real install.
function turbopackRoot() {
  const here = process.cwd();
  let modules;
  try {
    modules = path.dirname(fs.realpathSync(path.join(here, "node_modules")));
  } catch {
    return here;
  }
  let root = here;
  while (!(modules + path.sep).startsWith(root + path.sep) && path.dirname(root) !== root) root = path.dirname(root);
  return root;
}

/** @type {import('next').NextConfig} */
const nextConfig = {
  // Sequelize loads its dialect with a dynamic require that bundlers cannot follow.
  // esbuild bundles the service worker at build time (app/serwist/[path]/route.ts).
  serverExternalPackages: ["sequelize", "pg", "pg-hstore", "sharp", "nodemailer", "pino", "esbuild", "esbuild-wasm", "mailparser"],
  poweredByHeader: false,
  reactStrictMode: true,
  turbopack: { root: turbopackRoot() },
  experimental: {
    serverActions: { bodySizeLimit: "25mb" },
    // proxy.ts runs before API routes and buffers their bodies up to this size, cutting the rest
    // off silently: keep it above a trail upload (20 MB file + form margin, lib/trails/pure/limits.ts)
    // A hazard with its 4 photos of 8 MB (lib/photos/pure/limits.ts, MAX_HAZARD_BODY_BYTES) is the largest body.
    proxyClientMaxBodySize: "33mb",
    // forbidden() answers 403 with app/forbidden.tsx, so refused staff and admin pages are not a 200.
    authInterrupts: true,
  },
};

export default nextConfig;
