import type { Metadata, Viewport } from "next";
import { connection } from "next/server";
import { bodyFont, figuresFont } from "./fonts";
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

export default async function RootLayout({ children }: { children: React.ReactNode }) {
  // Every page renders per request: Next.js puts that response's CSP nonce (set in proxy.ts) on its
  // own scripts and styles, which a page built ahead of time could not carry. We add no inline
  // script of our own; one that is ever needed reads the nonce from the x-nonce request header.
  await connection();
  return (
    <html lang="en" className={`${bodyFont.variable} ${figuresFont.variable}`}>
      <body className="min-h-dvh font-sans text-ink antialiased">{children}</body>
    </html>
  );
}
