import "@fontsource/atkinson-hyperlegible/400.css";
import "@fontsource/atkinson-hyperlegible/700.css";
import "@fontsource/jetbrains-mono/400.css";
import "@fontsource/jetbrains-mono/700.css";
import "./globals.css";
import type { Metadata, Viewport } from "next";
import { SiteFooter } from "@/components/layout/site-footer";
import { SiteHeader } from "@/components/layout/site-header";
import { OfflineSupport } from "@/components/layout/offline-support";

export const metadata: Metadata = {
  title: { default: "Understudy: standard parts for old machines", template: "%s · Understudy" },
  description:
    "Find the modern standard bearing, lip seal or V-belt that takes the " +
    "place of an obsolete factory number on an old tractor, crawler or " +
    "stationary engine.",
};

export const viewport: Viewport = { width: "device-width", initialScale: 1, themeColor: "#f6f2ea" };

export default function RootLayout({ children }: { children: React.ReactNode }) {
  return (
    <html lang="en">
      <body className="flex min-h-screen flex-col">
        <a
          href="#main"
          className="sr-only focus:not-sr-only focus:absolute focus:top-2 focus:left-2 focus:bg-ground-raised focus:p-2"
        >
          Skip to content
        </a>
        <SiteHeader />
        <OfflineSupport />
        <main id="main" className="mx-auto w-full max-w-5xl flex-1 px-4 py-8 sm:px-6">
          {children}
        </main>
        <SiteFooter />
      </body>
    </html>
  );
}
