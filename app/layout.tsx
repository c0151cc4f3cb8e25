import type { Metadata, Viewport } from "next";
import { connection } from "next/server";
import { DARK, LIGHT } from "@/lib/theme/palette";
import { bodyFont, figureFont } from "./fonts";
import "./globals.css";

export const metadata: Metadata = {
  title: { default: "Glowbench", template: "%s · Glowbench" },
  description: "Bench calculators that show their working, and a job record for every set on the bench.",
};

export const viewport: Viewport = {
  themeColor: [
    { media: "(prefers-color-scheme: light)", color: LIGHT.paper },
    { media: "(prefers-color-scheme: dark)", color: DARK.paper },
  ],
};

export default async function RootLayout({ children }: { children: React.ReactNode }) {
  // Every page carries the per-request CSP nonce set in proxy.ts, so none may be prerendered without it.
  await connection();
  return (
    <html lang="en-GB" className={`${bodyFont.variable} ${figureFont.variable}`}>
      <body className="min-h-screen bg-paper text-ink font-sans">{children}</body>
    </html>
  );
}
