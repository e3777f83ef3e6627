import type { NextConfig } from "next";

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
        headers: [
          { key: "X-Content-Type-Options", value: "nosniff" },
          { key: "Referrer-Policy", value: "strict-origin-when-cross-origin" },
          { key: "X-Frame-Options", value: "DENY" },
          { key: "Permissions-Policy", value: "camera=(), microphone=(), geolocation=()" },
        ],
      },
    ];
  },
};

export default nextConfig;
