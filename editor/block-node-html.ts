import type { z } from "zod";

/**
 * How a live block travels as HTML (copy and paste, drag): one `data-block` attribute with
 * the block's inputs as JSON. On the way back in, the JSON is validated with the block's
 * own zod schema, so pasted HTML cannot smuggle odd attributes into a block.
 */
function readBlockData<T>(element: HTMLElement, schema: z.ZodType<T>): Partial<T> {
  const raw = element.getAttribute("data-block");
  if (!raw) return {};
  try {
    const parsed = schema.safeParse(JSON.parse(raw));
    return parsed.success ? parsed.data : {};
  } catch {
    return {};
  }
}

/** addAttributes() entries for a block: each key persists in the JSON but not as its own HTML attribute. */
export function blockAttributes<T extends Record<string, unknown>>(
  defaults: () => T,
  schema: z.ZodType<T>,
) {
  const fresh = defaults();
  return Object.fromEntries(
    Object.keys(fresh).map((key) => [
      key,
      {
        // blockId is left null here so the id guard gives every inserted block its own id.
        default: key === "blockId" ? null : fresh[key],
        rendered: false,
        parseHTML: (element: HTMLElement) =>
          (readBlockData(element, schema) as Record<string, unknown>)[key] ??
          (key === "blockId" ? null : fresh[key]),
      },
    ]),
  );
}
