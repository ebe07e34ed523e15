import { sql } from "drizzle-orm";
import { getDb } from "@/lib/server/database";

export const dynamic = "force-dynamic";

/** Readiness ping for the start and test scripts: answers 200 once the database answers. */
export async function GET() {
  try {
    await getDb().execute(sql`select 1`);
    return Response.json({ ok: true });
  } catch {
    return Response.json(
      {
        ok: false,
        error: { code: "database_unavailable", message: "The database is not reachable." },
      },
      { status: 503 },
    );
  }
}
