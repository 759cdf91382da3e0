import type { Metadata } from "next";
import type { ReactNode } from "react";
import { figureFont, greekFont, textFont } from "./fonts";
import { Providers } from "./providers";
import "./globals.css";

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
