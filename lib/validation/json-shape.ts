/**
 * The shape of untrusted JSON, measured without recursion: how deep it nests and how many
 * values it holds. Anything recursive (zod's lazy schemas, canonical JSON, tree walks) runs
 * only after this check, so a body nested thousands of levels deep is refused with a clear
 * message instead of overflowing the stack.
 */
export interface JsonShapeLimits {
  maxDepth: number;
  maxValues: number;
}

export type JsonShapeProblem = { kind: "too_deep" | "too_many"; limit: number } | null;

export function checkJsonShape(value: unknown, limits: JsonShapeLimits): JsonShapeProblem {
  const stack: [unknown, number][] = [[value, 0]];
  let values = 0;
  while (stack.length > 0) {
    const [current, depth] = stack.pop()!;
    values += 1;
    if (values > limits.maxValues) return { kind: "too_many", limit: limits.maxValues };
    if (current === null || typeof current !== "object") continue;
    if (depth >= limits.maxDepth) return { kind: "too_deep", limit: limits.maxDepth };
    const children = Array.isArray(current) ? current : Object.values(current);
    for (const child of children) stack.push([child, depth + 1]);
  }
  return null;
}
