import type { NextConfig } from "next";

import { SECURITY_HEADERS } from "./lib/http/security-headers";

const nextConfig: NextConfig = {
  poweredByHeader: false,
  // The test run builds into its own folder so a developer's dev server keeps running.
  distDir: process.env.NEXT_DIST_DIR ?? ".next",
  // Native or Node-only packages stay outside the server bundle.
  // 'use cache' for the Library's pages only (components/library/cached-*.ts*), without turning on
  // cacheComponents, which would change how every other page of the app renders.
  experimental: { useCache: true },
  serverExternalPackages: ["@node-rs/argon2", "pg-boss", "knex", "pg", "smtp-server", "mailparser", "@react-pdf/renderer"],
  async headers() {
    return [
      {
        source: "/:path*",
        headers: SECURITY_HEADERS,
      },
    ];
  },
};

export default nextConfig;
