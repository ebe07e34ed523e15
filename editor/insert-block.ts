import type { CommandProps, JSONContent } from "@tiptap/core";
import { NodeSelection } from "@tiptap/pm/state";

/**
 * Inserts a live block without replacing a selected one: when a block is selected (as it is
 * right after being inserted), the new one goes after it instead of over it.
 */
export function insertBlockContent({ tr, commands }: CommandProps, content: JSONContent): boolean {
  const { selection } = tr;
  if (selection instanceof NodeSelection) return commands.insertContentAt(selection.to, content);
  return commands.insertContent(content);
}
