import "server-only";
import NextAuth, { CredentialsSignin } from "next-auth";
import Credentials from "next-auth/providers/credentials";
import { getDb } from "@/lib/server/database";
import { authConfig } from "./config";
import { verifyCredentials } from "./verify-credentials";

/** The client's address as the reverse proxy or the server saw it: the per-client throttle key. */
function clientKeyOf(request: Request | undefined): string {
  const forwarded = request?.headers.get("x-forwarded-for")?.split(",")[0]?.trim();
  return (forwarded || request?.headers.get("x-real-ip") || "direct").slice(0, 100);
}

class ThrottledSignIn extends CredentialsSignin {
  code = "throttled";
}

export const { handlers, signIn, signOut } = NextAuth({
  ...authConfig,
  logger: {
    // A wrong password is an expected event, not a server error worth a stack trace.
    error(error) {
      if (
        error.name === "CredentialsSignin" ||
        (error as { type?: string }).type === "CredentialsSignin"
      )
        return;
      console.error("[auth]", error);
    },
  },
  providers: [
    Credentials({
      credentials: {
        email: { label: "E-mail", type: "email" },
        password: { label: "Password", type: "password" },
      },
      async authorize(credentials, request) {
        const result = await verifyCredentials(getDb(), credentials, clientKeyOf(request));
        if (result.kind === "throttled") {
          const error = new ThrottledSignIn();
          error.code = `throttled:${result.retryAfterSeconds}`;
          throw error;
        }
        return result.kind === "ok" ? result.user : null;
      },
    }),
  ],
});
