// @vitest-environment node
import { createHash } from "node:crypto";
import { readdirSync } from "node:fs";
import { tmpdir } from "node:os";
import { eq } from "drizzle-orm";
import sharp from "sharp";
import { beforeAll, describe, expect, it } from "vitest";
import { insertProject } from "@/db/queries/projects";
import { attachments } from "@/db/schema";
import type { Actor } from "@/lib/access/actor";
import { openAttachment } from "@/lib/attachments/download";
import { receiveUpload } from "@/lib/attachments/receive-upload";
import { getTraceView } from "@/lib/attachments/trace-view";
import { plotViewKey } from "@/lib/attachments/trace-plot-view";
import { uploadAttachments } from "@/lib/attachments/upload";
import { signedContentHash } from "@/lib/document/signed-content";
import { AppError } from "@/lib/errors";
import { createEntry } from "@/lib/notebook/entries";
import { countersignEntry, submitEntry } from "@/lib/notebook/review";
import { getCurrentContent } from "@/lib/notebook/revisions";
import { saveEntryContent } from "@/lib/notebook/save-entry";
import { verifyRevision } from "@/lib/notebook/verification";
import { getDb } from "@/lib/server/database";
import { getStorage, originalKey } from "@/lib/storage";
import { cvTrace, simulateReversibleCv, writeTraceFile } from "@/lib/traces/simulate";
import { createLabWithMembers, TEST_PASSWORD } from "../support/db";

function uploadRequest(files: { name: string; bytes: Uint8Array; type?: string }[]): Request {
  const form = new FormData();
  for (const f of files)
    form.append(
      "file",
      new Blob([f.bytes as Uint8Array<ArrayBuffer>], {
        type: f.type ?? "application/octet-stream",
      }),
      f.name,
    );
  return new Request("http://localhost/api/upload", { method: "POST", body: form });
}

async function errorOf(promise: Promise<unknown>): Promise<AppError> {
  const e = await promise.then(
    () => null,
    (x: unknown) => x,
  );
  expect(e).toBeInstanceOf(AppError);
  return e as AppError;
}

const sha = (bytes: Uint8Array) => createHash("sha256").update(bytes).digest("hex");
const tempUploads = () =>
  readdirSync(tmpdir()).filter((n) => n.startsWith("ionleaf-upload-")).length;

async function readAll(stream: NodeJS.ReadableStream): Promise<Buffer> {
  const chunks: Buffer[] = [];
  for await (const c of stream) chunks.push(c as Buffer);
  return Buffer.concat(chunks);
}

describe("attachments", () => {
  let author: Actor;
  let supervisor: Actor;
  let projectId: string;

  beforeAll(async () => {
    const { members, lab } = await createLabWithMembers(["admin", "supervisor", "researcher"]);
    author = members.researcher;
    supervisor = members.supervisor;
    projectId = (
      await insertProject(getDb(), {
        labId: lab.id,
        name: "Files",
        createdById: members.admin.userId,
      })
    ).id;
  });

  const newEntry = async (title: string) => (await createEntry(author, { projectId, title })).id;

  it("keeps a photo's original byte for byte and makes upright WebP copies without its metadata", async () => {
    const id = await newEntry("Photo of the cell");
    // A 60×40 JPEG marked "rotate 90° clockwise to view" with a GPS position (EXIF).
    const photo = await sharp({
      create: { width: 60, height: 40, channels: 3, background: "#b8683d" },
    })
      .jpeg()
      .withExif({
        IFD0: { Make: "Bench camera" },
        IFD3: { GPSLatitudeRef: "N", GPSLatitude: "51/1 30/1 0/1" },
      })
      .withMetadata({ orientation: 6 })
      .toBuffer();
    const [dto] = await uploadAttachments(
      author,
      id,
      uploadRequest([{ name: "cell.jpg", bytes: photo }]),
    );
    expect(dto).toMatchObject({
      kind: "photo",
      detectedType: "image/jpeg",
      sha256: sha(photo),
      sizeBytes: photo.length,
    });
    expect(dto.photo).toEqual({ width: 40, height: 60 }); // upright: EXIF orientation 6 applied
    const original = await openAttachment(author, dto.id, null, null);
    expect(sha(await readAll(original.stream))).toBe(sha(photo));
    expect(original.disposition).toMatch(/^inline; filename="cell.jpg"/);
    const thumb = await openAttachment(author, dto.id, "thumb", null);
    const thumbBytes = await readAll(thumb.stream);
    const meta = await sharp(thumbBytes).metadata();
    expect(meta).toMatchObject({ format: "webp", width: 40, height: 60 });
    expect(meta.exif).toBeUndefined();
    expect(meta.orientation).toBeUndefined();
  });

  it("reads a simulated voltammogram export: a trace with ΔEp ≈ 58 mV (Bard & Faulkner 2001, Table 6.2.1)", async () => {
    const id = await newEntry("CV of ferricyanide");
    const text = writeTraceFile(cvTrace(simulateReversibleCv({ cycles: 2 })), {
      delimiter: ";",
      decimal: ",",
      headerStyle: "colon",
      nameStyle: "words",
      potentialUnit: "mV",
      currentUnit: "µA",
      cycleColumn: false,
      newline: "\r\n",
    });
    const [dto] = await uploadAttachments(
      author,
      id,
      uploadRequest([{ name: "cv-ferri.txt", bytes: new TextEncoder().encode(text) }]),
    );
    expect(dto.kind).toBe("trace");
    expect(dto.trace).toMatchObject({ technique: "cyclic-voltammetry", cycles: 2 });
    const view = await getTraceView(author, dto.id);
    expect(view.series).toHaveLength(2);
    const deltaEp = view.peaks[0].deltaEpV!;
    expect(deltaEp * 1000).toBeGreaterThan(56);
    expect(deltaEp * 1000).toBeLessThan(60);
  });

  it("keeps the plot view beside the original at upload, so opening the trace does not parse the export", async () => {
    const id = await newEntry("CV kept view");
    const text = writeTraceFile(cvTrace(simulateReversibleCv({ cycles: 1 })), {
      delimiter: ",",
      decimal: ".",
      headerStyle: "colon",
      nameStyle: "slash",
      potentialUnit: "V",
      currentUnit: "A",
      cycleColumn: false,
      newline: "\n",
    });
    const [dto] = await uploadAttachments(
      author,
      id,
      uploadRequest([{ name: "cv-kept.csv", bytes: new TextEncoder().encode(text) }]),
    );
    const storage = getStorage();
    expect(await storage.size(plotViewKey(dto.sha256, null))).toBeGreaterThan(0);
    // With the original gone, the view can only come from the kept one.
    await storage.remove(originalKey(dto.sha256));
    const view = await getTraceView(author, dto.id);
    expect(view.summary.technique).toBe("cyclic-voltammetry");
    expect(view.series).toHaveLength(1);
    expect(view.peaks[0].deltaEpV! * 1000).toBeGreaterThan(56);
    expect(view.peaks[0].deltaEpV! * 1000).toBeLessThan(60);
  });

  it("stores the same content once and says so", async () => {
    const id = await newEntry("Twice");
    const bytes = new TextEncoder().encode("E/V,I/A\n0.1,1e-6\n0.2,2e-6\n0.3,3e-6\n");
    const [first] = await uploadAttachments(author, id, uploadRequest([{ name: "a.csv", bytes }]));
    const [second] = await uploadAttachments(author, id, uploadRequest([{ name: "b.csv", bytes }]));
    expect(second).toMatchObject({ id: first.id, duplicate: true });
    expect(
      await getDb().select().from(attachments).where(eq(attachments.entryId, id)),
    ).toHaveLength(1);
  });

  it("refuses an empty file, a disallowed type and a bad name; nothing stays behind", async () => {
    const id = await newEntry("Refusals");
    const before = tempUploads();
    const empty = await errorOf(
      uploadAttachments(
        author,
        id,
        uploadRequest([{ name: "empty.txt", bytes: new Uint8Array() }]),
      ),
    );
    expect(empty.status).toBe(422);
    // An executable's magic number: not on the lab's list, whatever the client calls it.
    const elf = new Uint8Array([0x7f, 0x45, 0x4c, 0x46, 2, 1, 1, 0, ...new Array(60).fill(0)]);
    const binary = await errorOf(
      uploadAttachments(
        author,
        id,
        uploadRequest([{ name: "photo.jpg", bytes: elf, type: "image/jpeg" }]),
      ),
    );
    expect(binary.status).toBe(415);
    const slash = await errorOf(
      uploadAttachments(
        author,
        id,
        uploadRequest([{ name: "..\\..\\etc\\passwd", bytes: new Uint8Array([65]) }]),
      ),
    );
    expect(slash.status).toBe(422);
    expect(slash.message).toBe("A file name cannot contain / or \\.");
    const control = await errorOf(
      uploadAttachments(
        author,
        id,
        uploadRequest([{ name: "bad\u0007name.txt", bytes: new Uint8Array([65]) }]),
      ),
    );
    expect(control.message).toBe("A file name cannot contain control characters.");
    expect(
      await getDb().select().from(attachments).where(eq(attachments.entryId, id)),
    ).toHaveLength(0);
    expect(tempUploads()).toBe(before);
  });

  it("refuses a file over the limit (413) and an upload cut off mid-stream, removing every partial file", async () => {
    const before = tempUploads();
    const big = uploadRequest([{ name: "big.txt", bytes: new Uint8Array(4096).fill(65) }]);
    const over = await errorOf(receiveUpload(big, { maxFileBytes: 1024, maxFiles: 5 }));
    expect(over.status).toBe(413);
    // A client that goes away: the body stream errors after the first part of the file.
    const boundary = "----ionleaf-test";
    const head = new TextEncoder().encode(
      `--${boundary}\r\nContent-Disposition: form-data; name="file"; filename="cut.txt"\r\nContent-Type: text/plain\r\n\r\n${"x".repeat(70_000)}`,
    );
    const body = new ReadableStream<Uint8Array>({
      start(controller) {
        controller.enqueue(head);
        setTimeout(() => controller.error(new Error("client went away")), 20);
      },
    });
    const cut = new Request("http://localhost/api/upload", {
      method: "POST",
      body,
      headers: { "content-type": `multipart/form-data; boundary=${boundary}` },
      duplex: "half",
    } as RequestInit);
    const aborted = await errorOf(receiveUpload(cut, { maxFileBytes: 1 << 20, maxFiles: 5 }));
    expect(aborted.message).toBe("The upload was interrupted; nothing was stored.");
    expect(tempUploads()).toBe(before);
  });

  it("serves byte ranges, and never another lab's file", async () => {
    const id = await newEntry("Ranges");
    const bytes = new TextEncoder().encode("0123456789abcdef");
    const [dto] = await uploadAttachments(author, id, uploadRequest([{ name: "r.txt", bytes }]));
    const part = await openAttachment(author, dto.id, null, "bytes=4-9");
    expect(part.range).toEqual({ start: 4, end: 9 });
    expect((await readAll(part.stream)).toString()).toBe("456789");
    expect(part.disposition).toMatch(/^attachment;/);
    const tail = await openAttachment(author, dto.id, null, "bytes=-3");
    expect((await readAll(tail.stream)).toString()).toBe("def");
    expect((await errorOf(openAttachment(author, dto.id, null, "bytes=99-"))).status).toBe(416);
    const other = await createLabWithMembers(["researcher"]);
    expect(
      (await errorOf(openAttachment(other.members.researcher, dto.id, null, null))).status,
    ).toBe(404);
  });

  it("a document may show only its own entry's files, and a signature covers their hashes", async () => {
    const id = await newEntry("Signed with a trace");
    const otherEntry = await newEntry("Someone else's file");
    const bytes = new TextEncoder().encode("t/s,I/A\n0,1e-6\n1,0.9e-6\n2,0.8e-6\n3,0.7e-6\n");
    const [mine] = await uploadAttachments(author, id, uploadRequest([{ name: "ca.csv", bytes }]));
    const [theirs] = await uploadAttachments(
      author,
      otherEntry,
      uploadRequest([{ name: "x.csv", bytes: new TextEncoder().encode("t/s,I/A\n0,1\n1,2\n") }]),
    );
    const trace = (attachmentId: string) => ({
      type: "traceBlock",
      attrs: {
        blockId: `trace-${attachmentId.slice(0, 8)}`,
        attachmentId,
        name: "Step",
        cellBlockId: null,
        showCurrentDensity: false,
        potentialScale: null,
        cycles: null,
      },
    });
    const foreign = await errorOf(
      saveEntryContent(author, id, {
        baseRevision: 0,
        title: "Signed with a trace",
        content: { type: "doc", content: [trace(theirs.id)] },
      }),
    );
    expect(foreign.status).toBe(422);
    await saveEntryContent(author, id, {
      baseRevision: 0,
      title: "Signed with a trace",
      content: { type: "doc", content: [trace(mine.id)] },
    });
    await submitEntry(author, id);
    const signed = await countersignEntry(supervisor, id, {
      revision: 1,
      password: TEST_PASSWORD,
      meaning: "reviewed",
      comment: "",
    });
    const current = await getCurrentContent(author, id);
    expect(signed.contentHash).toBe(
      signedContentHash({
        title: current.title,
        content: current.content,
        attachments: [{ sha256: mine.sha256, name: "ca.csv" }],
      }),
    );
    expect((await verifyRevision(author, id, 1)).signatures[0].valid).toBe(true);
  });
});
