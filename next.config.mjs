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
    ];
  },
};

export default nextConfig;
