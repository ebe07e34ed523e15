import NextAuth from "next-auth";
import { authConfig } from "@/lib/auth/config";

// Optimistic redirects only (no database here): pages without a session go to sign-in.
// The real checks happen on the server beside the data (lib/access).
const { auth } = NextAuth(authConfig);

export default auth;

export const config = {
  matcher: [
    "/((?!_next/static|_next/image|favicon.ico|.*\\.(?:png|svg|jpg|ico|webmanifest|woff2?)$).*)",
  ],
};
