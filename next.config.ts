import type { NextConfig } from "next";

const nextConfig: NextConfig = {
  // Native and Node-only packages stay out of the server bundle.
  serverExternalPackages: ["@node-rs/argon2", "postgres", "pdfkit", "nodemailer", "piscina", "esbuild"],
  poweredByHeader: false,
};

export default nextConfig;
