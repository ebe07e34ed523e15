/**
 * The searchable plain text of an entry document: text nodes, TeX of equations, and the
 * names and species of solution blocks, so the full-text index finds "NaCl" in a block.
 */
interface JsonNode {
  type?: string;
  text?: string;
  attrs?: Record<string, unknown>;
  content?: JsonNode[];
}

export function documentPlainText(doc: unknown, limit = 200_000): string {
  const parts: string[] = [];
  const stack: JsonNode[] = [doc as JsonNode];
  let length = 0;
  while (stack.length && length < limit) {
    const node = stack.pop();
    if (!node || typeof node !== "object") continue;
    const piece = pieceOf(node);
    if (piece) {
      parts.push(piece);
      length += piece.length + 1;
    }
    if (Array.isArray(node.content))
      for (let i = node.content.length - 1; i >= 0; i -= 1) stack.push(node.content[i]);
  }
  return parts.join(" ").slice(0, limit);
}

function pieceOf(node: JsonNode): string {
  if (node.type === "text" && typeof node.text === "string") return node.text;
  const attrs = node.attrs ?? {};
  if ((node.type === "inlineMath" || node.type === "blockMath") && typeof attrs.latex === "string")
    return attrs.latex;
  if (node.type === "solutionBlock") {
    const formulas = Array.isArray(attrs.components)
      ? attrs.components.map((c) => (c as { formula?: string }).formula ?? "")
      : [];
    return [attrs.name, ...formulas].filter((s) => typeof s === "string" && s).join(" ");
  }
  if (node.type === "cellBlock") return typeof attrs.name === "string" ? attrs.name : "";
  return "";
}
