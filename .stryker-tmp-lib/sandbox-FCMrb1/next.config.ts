// @ts-nocheck
import type { NextConfig } from "next";
import path from "node:path";

const root = path.resolve(import.meta.dirname);

const nextConfig: NextConfig = {
  // Tests build into their own folder so a running `npm start` is left alone.
  distDir: process.env.NEXT_DIST_DIR || ".next",
  turbopack: { root },
  outputFileTracingRoot: root,
  poweredByHeader: false,
  serverExternalPackages: ["pg", "nodemailer", "bcryptjs"],
  // Pages get their Content-Security-Policy (with a per-request nonce) and HSTS in proxy.ts;
  // API answers are data and run nothing, so they get a fixed policy here.
  async headers() {
    return [
      {
        source: "/api/:path*",
        headers: [{ key: "Content-Security-Policy", value: "default-src 'self'; script-src 'none'; object-src 'none'; base-uri 'self'; form-action 'self'; frame-ancestors 'none'" }],
      },
      {
        source: "/:path*",
        headers: [
          { key: "Referrer-Policy", value: "strict-origin-when-cross-origin" },
          { key: "X-Content-Type-Options", value: "nosniff" },
          { key: "X-Frame-Options", value: "DENY" },
          { key: "Permissions-Policy", value: "camera=(), microphone=(), geolocation=()" },
        ],
      },
    ];
  },
};

export default nextConfig;
