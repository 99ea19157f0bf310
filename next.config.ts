import type { NextConfig } from "next";

const nextConfig: NextConfig = {
  poweredByHeader: false,
  // Parallel test runs build into their own folder (tests/e2e/config.ts).
  distDir: process.env.BARWRIGHT_DIST_DIR ?? ".next",
  // The argon2 native binding must stay a runtime require, not be bundled.
  serverExternalPackages: ["@node-rs/argon2"],
};

export default nextConfig;
