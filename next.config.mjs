import { realpathSync } from "node:fs";
import path from "node:path";

/**
 * node_modules may be a link to an install shared by side-by-side clones; Turbopack only
 * reads files under its root, so the root is the folder holding both this app and the
 * real node_modules (the app's own folder when node_modules is a plain folder).
 */
function turbopackRoot() {
  const app = process.cwd();
  const modules = path.dirname(realpathSync(path.join(app, "node_modules")));
  let root = app;
  while (path.relative(root, modules).startsWith("..")) root = path.dirname(root);
  return root;
}

/** @type {import('next').NextConfig} */
const nextConfig = {
  // Sequelize loads its dialect with a dynamic require that bundlers cannot follow.
  serverExternalPackages: ["sequelize", "pg", "pg-hstore", "sharp", "pg-boss", "nodemailer"],
  poweredByHeader: false,
  reactStrictMode: true,
  turbopack: { root: turbopackRoot() },
  experimental: {
    serverActions: { bodySizeLimit: "25mb" },
  },
};

export default nextConfig;
