import { diffWords } from "diff";
import { formatSignificant } from "@/lib/ui/format-number";
import { canonicalJson } from "./canonical-hash";

/**
 * What changed between the entry's last countersigned revision and the one under review, for
 * the reviewer: the text word by word, and each solution and cell block with its inputs and
 * the server's stored results side by side, every changed value marked.
 */
export interface ReviewSide {
  title: string;
  content: unknown;
  /** The stored result JSON of each solution block, by block id. */
  results: ReadonlyMap<string, Record<string, unknown>>;
}

interface TextPart {
  value: string;
  change: "added" | "removed" | "same";
}

interface ValueRow {
  label: string;
  before: string | null;
  after: string | null;
  changed: boolean;
}

interface BlockComparison {
  blockId: string;
  kind: "solution" | "cell";
  name: string;
  status: "added" | "removed" | "changed" | "unchanged";
  inputs: ValueRow[];
  results: ValueRow[];
}

export interface RevisionComparison {
  title: { before: string | null; after: string; changed: boolean };
  text: TextPart[];
  textChanged: boolean;
  blocks: BlockComparison[];
}

interface JsonNode {
  type?: string;
  text?: string;
  attrs?: Record<string, unknown>;
  content?: JsonNode[];
}

const BLOCK_TYPES = new Set(["solutionBlock", "cellBlock"]);

/** The document's prose, one line per top-level node; live blocks are compared separately. */
function proseLines(doc: unknown): string {
  const top = (doc as JsonNode)?.content ?? [];
  return top
    .filter((node) => !BLOCK_TYPES.has(node.type ?? ""))
    .map((node) => textOf(node).trim())
    .filter(Boolean)
    .join("\n");
}

function textOf(node: JsonNode): string {
  const parts: string[] = [];
  const stack: JsonNode[] = [node];
  while (stack.length) {
    const n = stack.pop()!;
    if (n.type === "text" && typeof n.text === "string") parts.push(n.text);
    if ((n.type === "inlineMath" || n.type === "blockMath") && typeof n.attrs?.latex === "string")
      parts.push(`$${n.attrs.latex}$`);
    if (Array.isArray(n.content))
      for (let i = n.content.length - 1; i >= 0; i--) stack.push(n.content[i]);
  }
  return parts.join(" ");
}

function blocksOf(doc: unknown): Map<string, JsonNode & { attrs: Record<string, unknown> }> {
  const found = new Map<string, JsonNode & { attrs: Record<string, unknown> }>();
  const stack: JsonNode[] = [doc as JsonNode];
  while (stack.length) {
    const node = stack.pop();
    if (!node || typeof node !== "object") continue;
    if (BLOCK_TYPES.has(node.type ?? "") && typeof node.attrs?.blockId === "string")
      found.set(node.attrs.blockId, node as JsonNode & { attrs: Record<string, unknown> });
    if (Array.isArray(node.content))
      for (let i = node.content.length - 1; i >= 0; i--) stack.push(node.content[i]);
  }
  return found;
}

/** Inputs as typed (numbers unrounded); results to four significant figures, as the block shows. */
const show = (value: unknown): string | null => {
  if (value === null || value === undefined || value === "") return null;
  if (typeof value === "number") return String(value);
  if (typeof value === "string") return value;
  if (Array.isArray(value))
    return (
      value
        .map((v) => show(v) ?? "")
        .filter(Boolean)
        .join("; ") || null
    );
  return canonicalJson(value);
};

/** Inputs as labelled rows: a solution's settings and one row per component; a cell's fields. */
function inputRows(attrs: Record<string, unknown> | undefined): Map<string, string | null> {
  const rows = new Map<string, string | null>();
  if (!attrs) return rows;
  for (const [key, value] of Object.entries(attrs)) {
    if (key === "blockId") continue;
    if (key === "components" && Array.isArray(value)) {
      value.forEach((c: Record<string, unknown>, i) => {
        const per =
          c.perAmount !== null && c.perAmount !== undefined
            ? ` per ${show(c.perAmount)} ${show(c.perUnit) ?? ""}`
            : "";
        rows.set(
          `Component ${i + 1}`,
          `${show(c.formula) ?? "—"} ${show(c.amount) ?? "—"} ${show(c.unit) ?? ""}${per}`.trim(),
        );
      });
    } else if (value && typeof value === "object" && !Array.isArray(value)) {
      for (const [sub, subValue] of Object.entries(value as Record<string, unknown>))
        rows.set(`${key}.${sub}`, show(subValue));
    } else {
      rows.set(key, show(value));
    }
  }
  return rows;
}

/** The headline numbers of a stored solution result, labelled as the block shows them. */
function resultRows(stored: Record<string, unknown> | undefined): Map<string, string | null> {
  const rows = new Map<string, string | null>();
  if (!stored) return rows;
  if (stored.status !== "ok") {
    rows.set(
      "Result",
      stored.status === "error" ? `refused: ${String(stored.message)}` : "no components",
    );
    return rows;
  }
  const r = stored as {
    ionicStrength?: { molal?: number; molar?: number };
    debyeLengthNm?: number | null;
    model?: { used?: string };
    osmoticCoefficient?: number;
    waterActivity?: number;
    salts?: { formula: string; meanGamma: number }[];
    ions?: { formula: string; gamma: number; activity: number }[];
    validity?: { ok?: boolean };
  };
  const num = (x: number | null | undefined) =>
    typeof x === "number" ? formatSignificant(x) : null;
  rows.set("I / mol kg⁻¹", num(r.ionicStrength?.molal));
  rows.set("I / mol L⁻¹", num(r.ionicStrength?.molar));
  rows.set("Debye length / nm", num(r.debyeLengthNm));
  rows.set("Model used", show(r.model?.used));
  rows.set("Inside the model's range", r.validity?.ok === false ? "no" : "yes");
  if (r.osmoticCoefficient !== undefined) rows.set("φ", num(r.osmoticCoefficient));
  if (r.waterActivity !== undefined) rows.set("a(H₂O)", num(r.waterActivity));
  for (const salt of r.salts ?? []) rows.set(`γ± ${salt.formula}`, num(salt.meanGamma));
  for (const ion of r.ions ?? []) {
    rows.set(`γ ${ion.formula}`, num(ion.gamma));
    rows.set(`a ${ion.formula}`, num(ion.activity));
  }
  return rows;
}

function sideBySide(
  before: Map<string, string | null>,
  after: Map<string, string | null>,
): ValueRow[] {
  const labels = [...new Set([...before.keys(), ...after.keys()])];
  return labels.map((label) => {
    const b = before.get(label) ?? null;
    const a = after.get(label) ?? null;
    return { label, before: b, after: a, changed: b !== a };
  });
}

export function compareRevisions(before: ReviewSide | null, after: ReviewSide): RevisionComparison {
  const parts = diffWords(before ? proseLines(before.content) : "", proseLines(after.content));
  const text: TextPart[] = parts.map((p) => ({
    value: p.value,
    change: p.added ? "added" : p.removed ? "removed" : "same",
  }));
  const oldBlocks = before
    ? blocksOf(before.content)
    : new Map<string, JsonNode & { attrs: Record<string, unknown> }>();
  const newBlocks = blocksOf(after.content);
  const ids = [...newBlocks.keys(), ...[...oldBlocks.keys()].filter((id) => !newBlocks.has(id))];
  const blocks = ids.map((blockId): BlockComparison => {
    const o = oldBlocks.get(blockId);
    const n = newBlocks.get(blockId);
    const node = (n ?? o)!;
    const inputs = sideBySide(inputRows(o?.attrs), inputRows(n?.attrs));
    const results =
      node.type === "solutionBlock"
        ? sideBySide(
            resultRows(o ? before?.results.get(blockId) : undefined),
            resultRows(n ? after.results.get(blockId) : undefined),
          )
        : [];
    const anyChange = inputs.some((r) => r.changed) || results.some((r) => r.changed);
    return {
      blockId,
      kind: node.type === "solutionBlock" ? "solution" : "cell",
      name: typeof node.attrs.name === "string" && node.attrs.name ? node.attrs.name : "(unnamed)",
      status: !o ? "added" : !n ? "removed" : anyChange ? "changed" : "unchanged",
      inputs,
      results,
    };
  });
  return {
    title: {
      before: before?.title ?? null,
      after: after.title,
      changed: before?.title !== after.title,
    },
    text,
    textChanged: text.some((p) => p.change !== "same"),
    blocks,
  };
}
