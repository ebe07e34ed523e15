// API answers skip proxy.ts (it does no work for them that their own session check does not
// do again, and running it cost a third of a signed-in call), so their security headers are
// static and live here. They are JSON, CSV and stored files, never pages: the policy lets
// nothing run and nothing frame them. tests/unit/http/security-headers.test.ts keeps these
// values equal to lib/http/security-headers.ts, which the pages get from proxy.ts.
const apiSecurityHeaders = [
  {
    key: "Content-Security-Policy",
    value:
      "default-src 'none'; img-src 'self'; style-src 'unsafe-inline'; frame-ancestors 'none'; base-uri 'none'; form-action 'none'",
  },
  {
    key: "Permissions-Policy",
    value: "camera=(), microphone=(), geolocation=(), payment=(), usb=(), interest-cohort=()",
  },
  { key: "X-Frame-Options", value: "DENY" },
  { key: "Cross-Origin-Opener-Policy", value: "same-origin" },
];

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
  // Static assets skip proxy.ts; they still say what they are and never get sniffed.
  async headers() {
    return [
      {
        source: "/:path*",
        headers: [
          { key: "X-Content-Type-Options", value: "nosniff" },
          { key: "Referrer-Policy", value: "strict-origin-when-cross-origin" },
        ],
      },
      { source: "/api/:path*", headers: apiSecurityHeaders },
      {
        source: "/api/:path*",
        has: [{ type: "header", key: "x-forwarded-proto", value: "https" }],
        headers: [
          { key: "Strict-Transport-Security", value: "max-age=31536000; includeSubDomains" },
        ],
      },
    ];
  },
};

export default nextConfig;
