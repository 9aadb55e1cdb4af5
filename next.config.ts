import type { NextConfig } from "next";

const nextConfig: NextConfig = {
  poweredByHeader: false,
  // Parallel builds (a test run beside a demo) can each use their own folder.
  distDir: process.env.NEXT_DIST_DIR || ".next",
  // The type check runs once, as its own step of the test command (tsc --noEmit), not again inside every build.
  typescript: { ignoreBuildErrors: true },
  // forbidden() and unauthorized() for pages a role may not open.
  experimental: { authInterrupts: true },
  // Node-only server packages stay out of the bundle.
  serverExternalPackages: ["smtp-server", "nodemailer", "mailparser", "@libsql/client", "libsql", "pdfkit", "fontkit"],
};

export default nextConfig;
