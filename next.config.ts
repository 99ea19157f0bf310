import type { NextConfig } from "next";

const nextConfig: NextConfig = {
  poweredByHeader: false,
  // The argon2 native binding must stay a runtime require, not be bundled.
  serverExternalPackages: ["@node-rs/argon2"],
};

export default nextConfig;
