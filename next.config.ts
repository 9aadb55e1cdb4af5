import type { NextConfig } from "next";

// The browser may run only the app's own scripts (Next's inline bootstrap scripts need 'unsafe-inline'; no
// eval), draw WebGL and SVG, and reach the app itself plus the object store for photos (its address is set
// at run time, so any https origin and the local fake on loopback). No one may frame the app.
const CONTENT_SECURITY_POLICY = [
  "default-src 'self'",
  "script-src 'self' 'unsafe-inline'",
  "style-src 'self' 'unsafe-inline'",
  "img-src 'self' data: blob: https: http://localhost:* http://127.0.0.1:*",
  "font-src 'self' data:",
  "connect-src 'self' https: http://localhost:* http://127.0.0.1:*",
  "worker-src 'self' blob:",
  "media-src 'self' blob:",
  "object-src 'none'",
  "base-uri 'self'",
  "form-action 'self'",
  "frame-ancestors 'none'",
].join("; ");

const SECURITY_HEADERS = [
  { key: "Content-Security-Policy", value: CONTENT_SECURITY_POLICY },
  { key: "X-Content-Type-Options", value: "nosniff" },
  { key: "Referrer-Policy", value: "strict-origin-when-cross-origin" },
  { key: "X-Frame-Options", value: "DENY" },
  { key: "Permissions-Policy", value: "camera=(), microphone=(), geolocation=()" },
];

const nextConfig: NextConfig = {
  poweredByHeader: false,
  // Parallel builds (a test run beside a demo) can each use their own folder.
  distDir: process.env.NEXT_DIST_DIR || ".next",
  // The type check runs once, as its own step of the test command (tsc --noEmit), not again inside every build.
  typescript: { ignoreBuildErrors: true },
  // forbidden() and unauthorized() for pages a role may not open.
  experimental: { authInterrupts: true },
  // Node-only server packages stay out of the bundle.
  async headers() {
    return [
      { source: "/:path*", headers: SECURITY_HEADERS },
      { source: "/api/:path*", headers: [{ key: "Cache-Control", value: "no-store" }] },
    ];
  },
  serverExternalPackages: ["smtp-server", "nodemailer", "mailparser", "@libsql/client", "libsql", "pdfkit", "fontkit"],
};

export default nextConfig;
