import type { Metadata, Viewport } from "next";
import { headers } from "next/headers";
import type { ReactNode } from "react";
import { sans } from "./fonts";
import "./globals.css";

export const metadata: Metadata = {
  title: { default: "Farfield", template: "%s · Farfield" },
  description: "Hear the drill from the press box before you get stadium time.",
};

export const viewport: Viewport = { width: "device-width", initialScale: 1, themeColor: "#1f4d31" };

export default async function RootLayout({ children }: { children: ReactNode }) {
  // Reading the request headers makes every page dynamic, so Next.js stamps proxy.ts's CSP nonce on its scripts.
  (await headers()).get("x-nonce");
  return (
    <html lang="en" className={sans.variable}>
      <body>{children}</body>
    </html>
  );
}
