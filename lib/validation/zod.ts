import { z } from "zod";

// Zod compiles object parsers with `new Function` when it may. In the browser it first probes
// for that with a `new Function("")` that it catches, but a strict Content-Security-Policy
// (no 'unsafe-eval', lib/http/security-headers.ts) reports the probe as a violation anyway.
// Every schema module imports `z` from here so the probe never runs; the interpreted parser
// is what the browser would use under the policy in any case.
z.config({ jitless: true });

export { z };
