import type { Metadata, Viewport } from "next";
import { bodyFont, figuresFont } from "./fonts";
import { Providers } from "@/components/providers";
import "./globals.css";

export const metadata: Metadata = {
  title: { default: "Chillwright", template: "%s · Chillwright" },
  description: "Diagnostic casebook for vehicle air-conditioning service.",
};

export const viewport: Viewport = {
  width: "device-width",
  initialScale: 1,
  themeColor: "#05476b",
};

export default function RootLayout({ children }: { children: React.ReactNode }) {
  return (
    <html lang="en" className={`${bodyFont.variable} ${figuresFont.variable}`}>
      <body className="min-h-dvh font-sans text-ink antialiased">
        <Providers>{children}</Providers>
      </body>
    </html>
  );
}
