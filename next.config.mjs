/** @type {import('next').NextConfig} */
const nextConfig = {
  // PGlite ships wasm and data files it loads from its own folder; bundling it would copy
  // them into the public static output. pg and nodemailer are plain Node packages.
  serverExternalPackages: ["@electric-sql/pglite", "pg", "nodemailer", "bcryptjs"],
  // A second server (e.g. a check run beside a dev server) needs its own build folder.
  distDir: process.env.NEXT_DIST_DIR || ".next",
  poweredByHeader: false,
  reactStrictMode: true,
};

export default nextConfig;
