import { Extension } from "@tiptap/core";
import { Plugin, PluginKey } from "@tiptap/pm/state";
import { newBlockId } from "@/lib/document/block-id";

const BLOCK_TYPES = new Set(["solutionBlock", "cellBlock", "traceBlock"]);

/**
 * Keeps block ids unique. Copying a solution block and pasting it duplicates its
 * attributes, id included; the copy gets a fresh id, so cell blocks that point at the
 * original keep pointing at it and the server's one-row-per-block rule holds.
 */
export const BlockIdGuard = Extension.create({
  name: "blockIdGuard",
  addProseMirrorPlugins() {
    return [
      new Plugin({
        key: new PluginKey("blockIdGuard"),
        appendTransaction(transactions, _old, state) {
          if (!transactions.some((tr) => tr.docChanged)) return null;
          const seen = new Set<string>();
          const fixes: { pos: number; id: string }[] = [];
          state.doc.descendants((node, pos) => {
            // Blocks never sit inside a paragraph: skip the text of textblocks.
            if (!BLOCK_TYPES.has(node.type.name)) return !node.isTextblock;
            const id = node.attrs.blockId as string | null;
            if (!id || seen.has(id)) fixes.push({ pos, id: newBlockId() });
            else seen.add(id);
            return false;
          });
          if (fixes.length === 0) return null;
          const tr = state.tr;
          for (const fix of fixes) tr.setNodeAttribute(fix.pos, "blockId", fix.id);
          return tr.setMeta("addToHistory", false);
        },
      }),
    ];
  },
});
