/**
 * "components[2].amount": the `field` of a ChemInputError about one component. Built once
 * per index and leaf, because the hot path passes it on every call even when nothing fails.
 */
const cache: Record<string, string>[] = [];

export function componentField(index: number, leaf: string): string {
  const byLeaf = (cache[index] ??= {});
  return (byLeaf[leaf] ??= leaf ? `components[${index}].${leaf}` : `components[${index}]`);
}
