import { authedRoute } from "@/lib/http/route";

/**
 * A signed-in no-op: the cost of the session check and the route wrapper alone, which the
 * finder benchmark (bench/finder.ts) compares the finder route against.
 */
export const GET = authedRoute(() => Promise.resolve(Response.json({ ok: true })));
