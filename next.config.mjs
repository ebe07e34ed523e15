// The header values the pages get from proxy.ts (lib/http/security-headers.ts) are in
// lib/http/security-headers.json; this file is plain JavaScript and imports them from there.
import security from "./lib/http/security-headers.json" with { type: "json" };

const asHeaders = (/** @type {Record<string, string>} */ values) =>
  Object.entries(values).map(([key, value]) => ({ key, value }));

/** @type {import('next').NextConfig} */
const nextConfig = {
  // argon2 and sharp are native modules: keep them out of the server bundle.
  serverExternalPackages: ["argon2", "sharp", "smtp-server", "mailparser"],
  poweredByHeader: false,
  // `npm test` builds into its own folder so it never replaces the build a running
  // `npm start` is serving.
  distDir: process.env.NEXT_DIST_DIR || ".next",
  // Type-checking is its own step of `npm test` (tsc --noEmit); the build does not repeat it.
  typescript: { ignoreBuildErrors: true },
  // Static assets skip proxy.ts; they still say what they are and never get sniffed. API
  // answers skip it too (they check the session themselves, and running the proxy for them
  // cost a third of a signed-in call): they are JSON, CSV and stored files, never pages, so
  // their policy lets nothing run and nothing frame them.
  async headers() {
    return [
      { source: "/:path*", headers: asHeaders(security.everyAnswer) },
      {
        source: "/api/:path*",
        headers: [
          { key: "content-security-policy", value: security.apiContentSecurityPolicy },
          ...asHeaders(security.everyDocument),
        ],
      },
      {
        source: "/api/:path*",
        has: [{ type: "header", key: "x-forwarded-proto", value: "https" }],
        headers: asHeaders(security.overHttps),
      },
    ];
  },
};

export default nextConfig;
