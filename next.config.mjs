/** @type {import('next').NextConfig} */
const nextConfig = {
  // argon2 and sharp are native modules: keep them out of the server bundle.
  serverExternalPackages: ["argon2", "sharp", "smtp-server", "mailparser"],
  poweredByHeader: false,
  typedRoutes: false,
};

export default nextConfig;
