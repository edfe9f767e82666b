import type { Metadata, Viewport } from "next";
import { headers } from "next/headers";
import localFont from "next/font/local";
import { OfflineWriteGuard } from "@/components/offline/offline-write-guard";
import { SiteHeader } from "./site-header";
import "./globals.css";

const sans = localFont({ src: "./fonts/inter-latin-var.woff2", weight: "100 900", variable: "--font-sans", display: "swap" });
const mono = localFont({ src: "./fonts/mono-latin-var.woff2", weight: "100 800", variable: "--font-mono", display: "swap" });

export const metadata: Metadata = {
  title: { default: "Loamcast", template: "%s · Loamcast" },
  description: "Today's trail conditions, park map and tyre-pressure band for your bike park.",
  icons: { icon: "/icons/icon-192.png", apple: "/icons/apple-touch-icon.png" },
};

export const viewport: Viewport = { width: "device-width", initialScale: 1, themeColor: "#342b21" };

export default async function RootLayout({ children }: { children: React.ReactNode }) {
  // Reading the request makes every page dynamic, so each gets the CSP nonce proxy.ts issued.
  await headers();
  return (
    <html lang="en" className={`${sans.variable} ${mono.variable}`}>
      <body className="min-h-screen font-sans">
        <a href="#main" className="sr-only focus:not-sr-only focus:absolute focus:left-2 focus:top-2 focus:z-50 focus:bg-white focus:p-2">
          Skip to content
        </a>
        <SiteHeader />
        <OfflineWriteGuard />
        <main id="main" className="mx-auto max-w-5xl px-4 py-6">
          {children}
        </main>
        <footer className="mx-auto max-w-5xl px-4 pb-8 text-xs text-loam-600 print:hidden">
          Loamcast · conditions are posted by park staff; always follow park signage and staff on the day.
        </footer>
      </body>
    </html>
  );
}
