import {
  cellBlockInputSchema,
  solutionBlockInputSchema,
  type CellBlockInput,
  type SolutionBlockInput,
} from "./block-schemas";

/**
 * The inputs of every solution and cell block in an entry document, in document order.
 * The server recomputes solution blocks from these with lib/chem on save; client-computed
 * numbers are never read from the document. Blocks whose attributes do not parse are left
 * out here: validate the whole document with `entryDocumentSchema` first.
 */

interface JsonNode {
  type?: unknown;
  attrs?: unknown;
  content?: unknown;
}

export function extractSolutionBlocks(doc: unknown): SolutionBlockInput[] {
  return collect(doc, "solutionBlock").flatMap((attrs) => {
    const parsed = solutionBlockInputSchema.safeParse(attrs);
    return parsed.success ? [parsed.data] : [];
  });
}

export function extractCellBlocks(doc: unknown): CellBlockInput[] {
  return collect(doc, "cellBlock").flatMap((attrs) => {
    const parsed = cellBlockInputSchema.safeParse(attrs);
    return parsed.success ? [parsed.data] : [];
  });
}

/** Every attachment the document refers to (photo figures, file links, trace blocks), once each. */
export function extractAttachmentIds(doc: unknown): string[] {
  const ids = new Set<string>();
  for (const type of ["attachmentFigure", "attachmentFile", "traceBlock"]) {
    for (const attrs of collect(doc, type)) {
      const id = (attrs as { attachmentId?: unknown } | null)?.attachmentId;
      if (typeof id === "string") ids.add(id);
    }
  }
  return [...ids];
}

/** The attachments the document's trace blocks plot, once each. */
export function extractTraceAttachmentIds(doc: unknown): string[] {
  const ids = new Set<string>();
  for (const attrs of collect(doc, "traceBlock")) {
    const id = (attrs as { attachmentId?: unknown } | null)?.attachmentId;
    if (typeof id === "string") ids.add(id);
  }
  return [...ids];
}

function collect(doc: unknown, type: string): unknown[] {
  const found: unknown[] = [];
  // An explicit stack, so a deeply nested document cannot overflow the call stack.
  const stack: unknown[] = [doc];
  while (stack.length > 0) {
    const node = stack.pop() as JsonNode | null | undefined;
    if (!node || typeof node !== "object") continue;
    if (node.type === type) found.push(node.attrs);
    if (Array.isArray(node.content)) {
      for (let i = node.content.length - 1; i >= 0; i--) stack.push(node.content[i]);
    }
  }
  return found;
}
