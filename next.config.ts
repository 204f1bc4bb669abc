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
  // The Content-Security-Policy (with a per-request nonce) and HSTS are set in proxy.ts.
  async headers() {
    return [
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
