/**
 * The block panels are lazy chunks in the app. Tests import them once up front so the
 * first `findBy…` does not spend its whole timeout transforming lib/chem.
 */
export async function preloadBlockPanels() {
  await Promise.all([import("@/editor/solution-block/solution-block-panel"), import("@/editor/cell-block/cell-block-panel")]);
}
