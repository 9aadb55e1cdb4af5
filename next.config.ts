import type { NextConfig } from "next";

const nextConfig: NextConfig = {
  poweredByHeader: false,
  // forbidden() and unauthorized() for pages a role may not open.
  experimental: { authInterrupts: true },
  // Node-only server packages stay out of the bundle.
  serverExternalPackages: ["smtp-server", "nodemailer", "mailparser", "@libsql/client", "libsql"],
};

export default nextConfig;
