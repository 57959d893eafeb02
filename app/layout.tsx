import type { Metadata, Viewport } from "next";
import localFont from "next/font/local";
import "./globals.css";
import { SiteHeader } from "@/components/shell/site-header";
import { WebFontSwitch } from "@/components/shell/web-font-switch";

const slipwaySans = localFont({
  src: [
    { path: "../fonts/inter-latin-400-normal.woff2", weight: "400", style: "normal" },
    { path: "../fonts/inter-latin-600-normal.woff2", weight: "600", style: "normal" },
    { path: "../fonts/inter-latin-700-normal.woff2", weight: "700", style: "normal" },
  ],
  // Only a variable: globals.css puts it in front of the fallback once WebFontSwitch has run.
  variable: "--font-slipway-web",
  display: "swap",
  // Not preloaded, and not used before hydration (WebFontSwitch): on a slow link three early font
  // downloads delay the first paint; the metric-matched "Slipway Fallback" shows the text meanwhile.
  preload: false,
  adjustFontFallback: false,
  fallback: ["Slipway Fallback"],
});

export const metadata: Metadata = {
  title: { default: "Slipway", template: "%s · Slipway" },
  description: "Learn to set and care for your own oars, and get signed off to rig unsupervised.",
};

export const viewport: Viewport = {
  width: "device-width",
  initialScale: 1,
  themeColor: "#15424f",
};

export default function RootLayout({ children }: Readonly<{ children: React.ReactNode }>) {
  return (
    <html lang="en-GB" className={slipwaySans.variable}>
      <body className="min-h-dvh font-sans">
        <a
          href="#main"
          className="sr-only focus:not-sr-only focus:absolute focus:left-2 focus:top-2 focus:z-50 focus:rounded focus:bg-white focus:px-3 focus:py-2"
        >
          Skip to content
        </a>
        <WebFontSwitch />
        <SiteHeader />
        <main id="main" className="mx-auto w-full max-w-3xl px-4 pb-16 pt-6">
          {children}
        </main>
      </body>
    </html>
  );
}
