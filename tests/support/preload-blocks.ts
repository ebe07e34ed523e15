import { configure } from "@testing-library/react";

// The machine these run on is shared: give findBy/waitFor room beyond the 1 s default, so a
// busy moment is not mistaken for a broken editor. A real failure still fails, later.
configure({ asyncUtilTimeout: 5000 });

// jsdom does no layout: ranges have no client rects, which ProseMirror reads when it scrolls
// the selection into view. An empty answer is what a zero-size layout would give.
if (typeof Range !== "undefined" && !Range.prototype.getClientRects) {
  const empty = () => Object.assign([], { item: () => null }) as unknown as DOMRectList;
  Range.prototype.getClientRects = empty;
  Range.prototype.getBoundingClientRect = () => new DOMRect(0, 0, 0, 0);
}

/**
 * The block panels are lazy chunks in the app. Tests import them once up front so the
 * first `findBy…` does not spend its whole timeout transforming lib/chem.
 */
export async function preloadBlockPanels() {
  await Promise.all([
    import("@/editor/solution-block/solution-block-panel"),
    import("@/editor/cell-block/cell-block-panel"),
  ]);
}
