import type { NextConfig } from "next";
import path from "node:path";

const root = path.resolve(import.meta.dirname);

// One policy for every response. Next's runtime injects small inline scripts, so script-src
// keeps 'unsafe-inline'; everything is served from our own origin, and nothing may frame us.
const csp = [
  "default-src 'self'",
  "script-src 'self' 'unsafe-inline'",
  "style-src 'self' 'unsafe-inline'",
  "img-src 'self' data: blob:",
  "font-src 'self' data:",
  "connect-src 'self'",
  "object-src 'none'",
  "base-uri 'self'",
  "form-action 'self'",
  "frame-ancestors 'none'",
].join("; ");

const nextConfig: NextConfig = {
  // Tests build into their own folder so a running `npm start` is left alone.
  distDir: process.env.NEXT_DIST_DIR || ".next",
  turbopack: { root },
  outputFileTracingRoot: root,
  poweredByHeader: false,
  serverExternalPackages: ["pg", "nodemailer", "bcryptjs"],
  async headers() {
    return [
      {
        source: "/:path*",
        headers: [
          { key: "Content-Security-Policy", value: csp },
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
