/** @type {import('next').NextConfig} */
const nextConfig = {
  // Sequelize loads its dialect with a dynamic require that bundlers cannot follow.
  serverExternalPackages: ["sequelize", "pg", "pg-hstore", "sharp", "pg-boss", "nodemailer"],
  poweredByHeader: false,
  reactStrictMode: true,
  experimental: {
    serverActions: { bodySizeLimit: "25mb" },
  },
};

export default nextConfig;
