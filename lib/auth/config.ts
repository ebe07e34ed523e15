import type { NextAuthConfig } from "next-auth";

/**
 * The part of the Auth.js configuration that needs no database or native module, shared
 * by proxy.ts (optimistic redirects only) and the full configuration in ./index.ts.
 */
const PUBLIC_PATHS = ["/sign-in", "/invitations", "/api/auth", "/api/health"];

export const authConfig = {
  pages: { signIn: "/sign-in" },
  session: { strategy: "jwt", maxAge: 12 * 60 * 60 },
  trustHost: true,
  providers: [],
  callbacks: {
    jwt({ token, user }) {
      if (user) {
        const u = user as { id?: string; labId?: string; role?: string; sessionVersion?: number };
        token.uid = u.id;
        token.labId = u.labId;
        token.role = u.role;
        token.sv = u.sessionVersion;
      }
      return token;
    },
    session({ session, token }) {
      // Display hints only: the server reloads the member from the database for every
      // decision (lib/auth/session.ts), so a role change or deactivation takes effect at once.
      session.user.id = typeof token.uid === "string" ? token.uid : "";
      // The member's session version when this token was issued: compared with the database
      // on every request (lib/access/actor.ts), so a revoked session stops working at once.
      (session.user as { sessionVersion?: number }).sessionVersion =
        typeof token.sv === "number" ? token.sv : 0;
      (session.user as { labId?: string }).labId = token.labId as string | undefined;
      (session.user as { role?: string }).role = token.role as string | undefined;
      return session;
    },
    authorized({ auth, request }) {
      const path = request.nextUrl.pathname;
      if (PUBLIC_PATHS.some((p) => path === p || path.startsWith(`${p}/`))) return true;
      // API routes answer 401 JSON themselves rather than redirecting a client's fetch.
      if (path.startsWith("/api/")) return true;
      return Boolean(auth?.user);
    },
  },
} satisfies NextAuthConfig;
