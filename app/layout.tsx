import type { Metadata } from "next";
import type { ReactNode } from "react";
import { figureFont, greekFont, textFont } from "./fonts";
import { Providers } from "./providers";
import "./globals.css";

// Every page carries a Content-Security-Policy nonce made for its request (proxy.ts), so none
// may be prerendered: a prerendered page's scripts would have no nonce and be refused.
export const dynamic = "force-dynamic";

export const metadata: Metadata = {
  title: { default: "Cavitas", template: "%s · Cavitas" },
  description: "Resonant absorber panels: absorption, reverberation check, elevations and submittals.",
};

export default function RootLayout({ children }: { children: ReactNode }) {
  return (
    <html lang="en" className={`${textFont.variable} ${greekFont.variable} ${figureFont.variable}`}>
      <body className="min-h-screen">
        <Providers>{children}</Providers>
      </body>
    </html>
  );
}
