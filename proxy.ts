import NextAuth from "next-auth";
import { NextResponse } from "next/server";
import { authConfig, isPublicPath } from "@/lib/auth/config";
import { contentSecurityPolicy, securityHeaders } from "@/lib/http/security-headers";

// Optimistic redirects only (no database here): pages without a session go to sign-in. The
// real checks happen on the server beside the data (lib/access). Every answer gets the
// security headers and a Content-Security-Policy with a fresh nonce.
const { auth } = NextAuth(authConfig);

export default auth((request) => {
  const nonce = btoa(String.fromCharCode(...crypto.getRandomValues(new Uint8Array(16))));
  const csp = contentSecurityPolicy(nonce, process.env.NODE_ENV === "development");
  const path = request.nextUrl.pathname;
  let response: NextResponse;
  if (!request.auth && !isPublicPath(path) && !path.startsWith("/api/")) {
    const signIn = request.nextUrl.clone();
    signIn.pathname = "/sign-in";
    signIn.search = "";
    signIn.searchParams.set("callbackUrl", request.nextUrl.pathname + request.nextUrl.search);
    response = NextResponse.redirect(signIn);
  } else {
    // Next.js reads the nonce from the request's policy and puts it on its inline scripts.
    const headers = new Headers(request.headers);
    headers.set("x-nonce", nonce);
    headers.set("content-security-policy", csp);
    response = NextResponse.next({ request: { headers } });
  }
  const https =
    request.nextUrl.protocol === "https:" || request.headers.get("x-forwarded-proto") === "https";
  response.headers.set("content-security-policy", csp);
  for (const [name, value] of Object.entries(securityHeaders(https)))
    response.headers.set(name, value);
  return response;
});

export const config = {
  matcher: [
    "/((?!_next/static|_next/image|favicon.ico|.*\\.(?:png|svg|jpg|ico|webmanifest|woff2?)$).*)",
  ],
};
