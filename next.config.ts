import type { NextConfig } from "next";
import { STATIC_HEADERS } from "./lib/http/security-headers";

// The paths proxy.ts skips (built assets, fonts, the icon) get the static security headers here.
const staticHeaders = Object.entries(STATIC_HEADERS).map(([key, value]) => ({ key, value }));

const nextConfig: NextConfig = {
  // Native and Node-only packages stay out of the server bundle.
  serverExternalPackages: ["@node-rs/argon2", "postgres", "pdfkit", "nodemailer", "piscina", "esbuild"],
  poweredByHeader: false,
  async headers() {
    return ["/_next/static/:path*", "/_next/image", "/fonts/:path*", "/favicon.ico"].map((source) => ({ source, headers: staticHeaders }));
  },
};

export default nextConfig;
