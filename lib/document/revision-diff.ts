import { canonicalJson } from "@/lib/document/canonical-hash";
import { documentPlainText } from "@/lib/document/plain-text";

/**
 * "What changed" between two revisions, in words a reader scans: the title, text added or
 * removed (counted in words), and each solution or cell block added, removed or changed.
 */
interface JsonNode {
  type?: string;
  attrs?: Record<string, unknown>;
  content?: JsonNode[];
}

interface BlockSnapshot {
  kind: "Solution block" | "Cell block";
  name: string;
  json: string;
}

function blocksOf(doc: unknown): Map<string, BlockSnapshot> {
  const found = new Map<string, BlockSnapshot>();
  const stack: JsonNode[] = [doc as JsonNode];
  while (stack.length) {
    const node = stack.pop();
    if (!node || typeof node !== "object") continue;
    if (
      (node.type === "solutionBlock" || node.type === "cellBlock") &&
      typeof node.attrs?.blockId === "string"
    ) {
      found.set(node.attrs.blockId, {
        kind: node.type === "solutionBlock" ? "Solution block" : "Cell block",
        name:
          typeof node.attrs.name === "string" && node.attrs.name ? node.attrs.name : "(unnamed)",
        json: canonicalJson(node.attrs),
      });
    }
    // Children pushed in reverse so blocks are met in document order.
    if (Array.isArray(node.content))
      for (let i = node.content.length - 1; i >= 0; i -= 1) stack.push(node.content[i]);
  }
  return found;
}

function wordCounts(doc: unknown): Map<string, number> {
  const counts = new Map<string, number>();
  for (const word of documentPlainText(doc)
    .toLowerCase()
    .split(/[\s.,;:!?()"“”]+/)
    .filter(Boolean))
    counts.set(word, (counts.get(word) ?? 0) + 1);
  return counts;
}

export function summariseChange(
  previous: { title: string; content: unknown } | null,
  next: { title: string; content: unknown },
): string[] {
  if (!previous) return ["First saved version"];
  const changes: string[] = [];
  if (previous.title !== next.title) changes.push(`Title changed to “${next.title}”`);

  const before = wordCounts(previous.content);
  const after = wordCounts(next.content);
  let added = 0;
  let removed = 0;
  for (const [word, n] of after) added += Math.max(0, n - (before.get(word) ?? 0));
  for (const [word, n] of before) removed += Math.max(0, n - (after.get(word) ?? 0));
  if (added || removed)
    changes.push(
      `Text: ${added ? `+${added}` : ""}${added && removed ? " / " : ""}${removed ? `−${removed}` : ""} word${added + removed === 1 ? "" : "s"}`,
    );

  const oldBlocks = blocksOf(previous.content);
  const newBlocks = blocksOf(next.content);
  for (const [id, block] of newBlocks) {
    const old = oldBlocks.get(id);
    if (!old) changes.push(`${block.kind} “${block.name}” added`);
    else if (old.json !== block.json) changes.push(`${block.kind} “${block.name}” changed`);
  }
  for (const [id, block] of oldBlocks)
    if (!newBlocks.has(id)) changes.push(`${block.kind} “${block.name}” removed`);

  return changes.length ? changes : ["Formatting only"];
}
