import type { Metadata, Viewport } from "next";
import { mono, sans } from "./fonts";
import "./globals.css";

export const metadata: Metadata = {
  title: { default: "Borewright", template: "%s · Borewright" },
  description: "Check a cylinder kit's skirt against a crankcase, plan the counterbore and set the boring rig before anything is cut.",
};

export const viewport: Viewport = {
  themeColor: [
    { media: "(prefers-color-scheme: light)", color: "#f6f3ec" },
    { media: "(prefers-color-scheme: dark)", color: "#1f2224" },
  ],
};

export default function RootLayout({ children }: { children: React.ReactNode }) {
  return (
    <html lang="en" className={`${sans.variable} ${mono.variable}`}>
      <body className="min-h-dvh bg-paper text-ink font-sans antialiased">{children}</body>
    </html>
  );
}
