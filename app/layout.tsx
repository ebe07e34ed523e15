import type { Metadata } from "next";
import { headers } from "next/headers";
import "@fontsource-variable/inter";
import "@fontsource-variable/jetbrains-mono";
import "katex/dist/katex.min.css";
import "./globals.css";

export const metadata: Metadata = {
  title: { default: "Ionleaf", template: "%s · Ionleaf" },
  description: "The electrochemistry lab's notebook: solutions, cells and countersigned records.",
  manifest: "/manifest.webmanifest",
  icons: {
    icon: [
      { url: "/favicon.ico", sizes: "32x32" },
      { url: "/favicon.svg", type: "image/svg+xml" },
    ],
    apple: "/apple-touch-icon.png",
  },
};

export default async function RootLayout({ children }: { children: React.ReactNode }) {
  // Every page is rendered per request: its inline scripts carry this request's CSP nonce
  // (proxy.ts), which a page prerendered at build time could not.
  await headers();
  return (
    <html lang="en">
      <body>{children}</body>
    </html>
  );
}
