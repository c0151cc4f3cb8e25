import type { Metadata, Viewport } from "next";
import { bodyFont, figureFont } from "./fonts";
import "./globals.css";

export const metadata: Metadata = {
  title: { default: "Glowbench", template: "%s · Glowbench" },
  description: "Bench calculators that show their working, and a job record for every set on the bench.",
};

export const viewport: Viewport = {
  themeColor: [
    { media: "(prefers-color-scheme: light)", color: "#faf6ee" },
    { media: "(prefers-color-scheme: dark)", color: "#161412" },
  ],
};

export default function RootLayout({ children }: { children: React.ReactNode }) {
  return (
    <html lang="en-GB" className={`${bodyFont.variable} ${figureFont.variable}`}>
      <body className="min-h-screen bg-paper text-ink font-sans">{children}</body>
    </html>
  );
}
