import type { NextConfig } from "next";
import { staticSecurityHeaders } from "./lib/security/csp";

const nextConfig: NextConfig = {
  poweredByHeader: false,
  // Parallel test runs build into their own folder (tests/e2e/config.ts).
  distDir: process.env.BARWRIGHT_DIST_DIR ?? ".next",
  // The argon2 native binding must stay a runtime require, not be bundled.
  serverExternalPackages: ["@node-rs/argon2"],
  // `npm test` typechecks the whole project (tsc --noEmit) as its own step and fails there;
  // the build does not repeat it.
  typescript: { ignoreBuildErrors: true },
  async headers() {
    return [{ source: "/:path*", headers: staticSecurityHeaders }];
  },
};

export default nextConfig;
