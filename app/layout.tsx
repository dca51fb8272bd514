import type { Metadata, Viewport } from "next";
import { connection } from "next/server";
import type { ReactNode } from "react";
import { inter, interItalic } from "./fonts";
import "./globals.css";

export const metadata: Metadata = {
  title: { default: "Sagwise", template: "%s · Sagwise" },
  description: "Suspension setup requests, spring sizing and setup sheets for off-road riders.",
};

export const viewport: Viewport = { width: "device-width", initialScale: 1, themeColor: "#123f36" };

// Rendered per request: each page's scripts carry that response's CSP nonce (proxy.ts), which a
// page prerendered at build time could not.
export default async function RootLayout({ children }: { children: ReactNode }) {
  await connection();
  return (
    <html lang="en" className={`${inter.variable} ${interItalic.variable}`}>
      <body className="min-h-dvh font-sans">{children}</body>
    </html>
  );
}
