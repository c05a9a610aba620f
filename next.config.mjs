/** @type {import('next').NextConfig} */
const nextConfig = {
  // Knex loads every dialect driver dynamically; bundling it breaks the build.
  serverExternalPackages: ["knex", "mysql2", "@node-rs/argon2", "sharp"],
  // npm test builds into its own folder so it can run beside `npm start`.
  distDir: process.env.NEXT_DIST_DIR || ".next",
  poweredByHeader: false,
  reactStrictMode: true,
  typedRoutes: false,
  // forbidden() and app/forbidden.tsx: a real 403 page for a member whose role lacks a permission.
  experimental: { authInterrupts: true },
};

export default nextConfig;
