import type { Metadata, Viewport } from "next";
import type { ReactNode } from "react";
import { figureFont, greekFont, textFont } from "./fonts";
import { Providers } from "./providers";
import "./globals.css";

// Every page carries a Content-Security-Policy nonce made for its request (proxy.ts), so none
// may be prerendered: a prerendered page's scripts would have no nonce and be refused.
export const dynamic = "force-dynamic";

// The icon, the web manifest and robots.txt are served from public/.
export const metadata: Metadata = {
  title: { default: "Cavitas", template: "%s · Cavitas" },
  applicationName: "Cavitas",
  description: "Resonant absorber panels: absorption, reverberation check, elevations and submittals.",
  manifest: "/manifest.webmanifest",
  icons: {
    icon: [
      { url: "/icon.svg", type: "image/svg+xml" },
      { url: "/icon-192.png", sizes: "192x192", type: "image/png" },
    ],
    apple: [{ url: "/apple-touch-icon.png", sizes: "180x180" }],
  },
};

export const viewport: Viewport = { themeColor: "#1a2740" };

export default function RootLayout({ children }: { children: ReactNode }) {
  return (
    <html lang="en" className={`${textFont.variable} ${greekFont.variable} ${figureFont.variable}`}>
      <body className="min-h-screen">
        <Providers>{children}</Providers>
      </body>
    </html>
  );
}
