import type { Metadata } from "next";
import localFont from "next/font/local";
import { headers } from "next/headers";
import "./globals.css";

const leewaySans = localFont({
  src: [
    { path: "../fonts/source-sans-3-latin-400-normal.woff2", weight: "400", style: "normal" },
    { path: "../fonts/source-sans-3-latin-600-normal.woff2", weight: "600", style: "normal" },
    { path: "../fonts/source-sans-3-latin-700-normal.woff2", weight: "700", style: "normal" },
  ],
  variable: "--font-leeway",
  display: "swap",
});

export const metadata: Metadata = {
  title: { default: "Leeway", template: "%s · Leeway" },
  description: "Earthquake early-warning planning workspace",
};

export default async function RootLayout({ children }: { children: React.ReactNode }) {
  // Reading the request's nonce makes every page render per request, so Next can put the nonce of
  // this response's Content-Security-Policy (set in proxy.ts) on its inline scripts.
  await headers();
  return (
    <html lang="en" className={leewaySans.variable}>
      <body className="min-h-screen antialiased">{children}</body>
    </html>
  );
}
