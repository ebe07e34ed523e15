import staticHeaders from "./security-headers.json";

/**
 * The Content-Security-Policy of every page (proxy.ts): scripts only from the app itself with
 * this response's nonce (Next.js puts it on its own inline scripts), no eval in production, no framing, no plugins. KaTeX and React set inline
 * styles, so styles allow 'unsafe-inline' (styles cannot run code).
 */
export function contentSecurityPolicy(nonce: string, development: boolean): string {
  return [
    "default-src 'self'",
    `script-src 'self' 'nonce-${nonce}' 'strict-dynamic'${development ? " 'unsafe-eval'" : ""}`,
    "style-src 'self' 'unsafe-inline'",
    "img-src 'self' data: blob:",
    "font-src 'self' data:",
    `connect-src 'self'${development ? " ws: wss:" : ""}`,
    "worker-src 'self' blob:",
    "object-src 'none'",
    "base-uri 'self'",
    "form-action 'self'",
    "frame-ancestors 'none'",
  ].join("; ");
}

/**
 * The security headers of a page or API answer. The values live in security-headers.json,
 * which next.config.mjs (plain JavaScript, outside the proxy) reads for the API's and the
 * static files' answers.
 */
export function securityHeaders(https: boolean): Record<string, string> {
  return {
    ...staticHeaders.everyAnswer,
    ...staticHeaders.everyDocument,
    ...(https ? staticHeaders.overHttps : {}),
  };
}
