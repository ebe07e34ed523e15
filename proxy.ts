import NextAuth from "next-auth";
import { NextResponse, type NextMiddleware, type NextRequest } from "next/server";
import { authConfig, isPublicPath } from "@/lib/auth/config";
import { contentSecurityPolicy, securityHeaders } from "@/lib/http/security-headers";

// Optimistic redirects only (no database here): pages without a session go to sign-in. The
// real checks happen on the server beside the data (lib/access). Every page gets the
// security headers and a Content-Security-Policy with a fresh nonce.
const { auth } = NextAuth(authConfig);

// auth() returns an overloaded wrapper typed for route handlers too; as a proxy it is this.
export default auth((request) => {
  const nonce = createNonce();
  const csp = contentSecurityPolicy(nonce, process.env.NODE_ENV === "development");
  const path = request.nextUrl.pathname;
  let response: NextResponse;
  if (!request.auth && !isPublicPath(path)) {
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
  return secured(response, request, csp);
}) as unknown as NextMiddleware;

/** The policy and the security headers on an answer. */
function secured(response: NextResponse, request: NextRequest, csp: string): NextResponse {
  response.headers.set("content-security-policy", csp);
  for (const [name, value] of Object.entries(securityHeaders(isHttps(request))))
    response.headers.set(name, value);
  return response;
}

function createNonce(): string {
  return btoa(String.fromCharCode(...crypto.getRandomValues(new Uint8Array(16))));
}

function isHttps(request: NextRequest): boolean {
  return (
    request.nextUrl.protocol === "https:" || request.headers.get("x-forwarded-proto") === "https"
  );
}

// API routes bypass the proxy. They check the session themselves beside the data (and
// answer 401 JSON, not a redirect), so running the proxy for them decided nothing and cost a
// third of a signed-in call's time (bench/finder.ts: 482 → 762 requests per second on the
// no-op route). Uploads must bypass it anyway: Next.js buffers a request body that passes
// through the proxy and cuts it at 10 MB. API answers get the static headers of
// next.config.mjs.
export const config = {
  matcher: [
    "/((?!_next/static|_next/image|favicon.ico|api/|.*\\.(?:png|svg|jpg|ico|webmanifest|woff2?)$).*)",
  ],
};
