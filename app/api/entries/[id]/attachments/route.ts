import { listAttachments } from "@/lib/attachments/download";
import { uploadAttachments } from "@/lib/attachments/upload";
import { authedRoute } from "@/lib/http/route";

export const runtime = "nodejs";

/** The entry's attachments. */
export const GET = authedRoute<{ id: string }>(async (_request, actor, { id }) =>
  Response.json({ attachments: await listAttachments(actor, id) }),
);

/** multipart/form-data with one or more files: streamed, hashed, typed from their bytes. */
export const POST = authedRoute<{ id: string }>(async (request, actor, { id }) =>
  Response.json({ attachments: await uploadAttachments(actor, id, request) }, { status: 201 }),
);
