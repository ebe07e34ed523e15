import { z } from "@/lib/validation/zod";
import { checkJsonShape } from "@/lib/validation/json-shape";
import {
  attachmentFigureSchema,
  attachmentFileSchema,
  cellBlockInputSchema,
  solutionBlockInputSchema,
  traceBlockInputSchema,
} from "./block-schemas";
import { isSafeHref } from "./safe-href";

/**
 * The tiptap document as the server accepts it on save. The editor's ProseMirror schema
 * already drops unknown nodes when content is pasted; this schema is the server's own
 * check, because a request body can be anything.
 */

const LIMITS = { maxNodes: 20000, maxDepth: 40, maxTextLength: 100000, maxLatex: 4000 };

/** Attribute schemas of each allowed node type. tiptap writes defaults, so most keys are optional. */
const NODE_ATTRS = {
  doc: z.strictObject({}),
  paragraph: z.strictObject({}),
  text: z.strictObject({}),
  heading: z.strictObject({ level: z.number().int().min(1).max(4) }),
  bulletList: z.strictObject({}),
  orderedList: z.strictObject({
    start: z.number().int().min(0).max(100000).optional(),
    type: z.string().max(8).nullable().optional(),
  }),
  listItem: z.strictObject({}),
  taskList: z.strictObject({}),
  taskItem: z.strictObject({ checked: z.boolean().optional() }),
  blockquote: z.strictObject({}),
  codeBlock: z.strictObject({
    language: z
      .string()
      .max(40)
      .regex(/^[\w+#.-]*$/)
      .nullable()
      .optional(),
  }),
  horizontalRule: z.strictObject({}),
  hardBreak: z.strictObject({}),
  table: z.strictObject({}),
  tableRow: z.strictObject({}),
  tableCell: z.strictObject({
    colspan: z.number().int().min(1).max(100).optional(),
    rowspan: z.number().int().min(1).max(1000).optional(),
    colwidth: z.array(z.number().int().min(0).max(10000)).max(100).nullable().optional(),
    align: z.enum(["left", "center", "right"]).nullable().optional(),
  }),
  tableHeader: z.strictObject({
    colspan: z.number().int().min(1).max(100).optional(),
    rowspan: z.number().int().min(1).max(1000).optional(),
    colwidth: z.array(z.number().int().min(0).max(10000)).max(100).nullable().optional(),
    align: z.enum(["left", "center", "right"]).nullable().optional(),
  }),
  inlineMath: z.strictObject({ latex: z.string().max(LIMITS.maxLatex) }),
  blockMath: z.strictObject({ latex: z.string().max(LIMITS.maxLatex) }),
  solutionBlock: solutionBlockInputSchema,
  cellBlock: cellBlockInputSchema,
  traceBlock: traceBlockInputSchema,
  attachmentFigure: attachmentFigureSchema,
  attachmentFile: attachmentFileSchema,
} as const;

const ALLOWED_NODE_TYPES = Object.keys(NODE_ATTRS) as (keyof typeof NODE_ATTRS)[];
type EntryNodeType = keyof typeof NODE_ATTRS;

const MARK_ATTRS = {
  bold: z.strictObject({}),
  italic: z.strictObject({}),
  strike: z.strictObject({}),
  underline: z.strictObject({}),
  code: z.strictObject({}),
  // A link stores where it goes and nothing else: `rel` and `target` are added by the app
  // when it is drawn, and a stored `class` or `style` could lay a link over the whole page.
  link: z.strictObject({
    href: z.string().max(2048).refine(isSafeHref, "Links may only use http, https or mailto."),
  }),
} as const;

const ALLOWED_MARK_TYPES = Object.keys(MARK_ATTRS) as (keyof typeof MARK_ATTRS)[];

const markSchema = z
  .strictObject({
    type: z.enum(ALLOWED_MARK_TYPES),
    attrs: z.record(z.string(), z.unknown()).optional(),
  })
  .superRefine((mark, ctx) => {
    const parsed = MARK_ATTRS[mark.type].safeParse(mark.attrs ?? {});
    if (!parsed.success) addIssues(ctx, parsed.error, ["attrs"]);
  });

export interface EntryNode {
  type: EntryNodeType;
  attrs?: Record<string, unknown>;
  content?: EntryNode[];
  marks?: z.infer<typeof markSchema>[];
  text?: string;
}

const nodeSchema: z.ZodType<EntryNode> = z.lazy(() =>
  z
    .strictObject({
      type: z.enum(ALLOWED_NODE_TYPES),
      attrs: z.record(z.string(), z.unknown()).optional(),
      content: z.array(nodeSchema).max(5000).optional(),
      marks: z.array(markSchema).max(10).optional(),
      text: z.string().max(LIMITS.maxTextLength).optional(),
    })
    .superRefine((node, ctx) => {
      const parsed = NODE_ATTRS[node.type].safeParse(node.attrs ?? {});
      if (!parsed.success) addIssues(ctx, parsed.error, ["attrs"]);
      if (node.type === "text" && (!node.text || node.content)) {
        ctx.addIssue({
          code: "custom",
          message: "A text node holds non-empty text and no content.",
        });
      }
      if (node.type !== "text" && node.text !== undefined) {
        ctx.addIssue({
          code: "custom",
          message: `A ${node.type} node cannot hold text directly.`,
          path: ["text"],
        });
      }
    }),
);

function addIssues(ctx: z.RefinementCtx, error: z.ZodError, prefix: (string | number)[]) {
  for (const issue of error.issues) {
    ctx.addIssue({
      code: "custom",
      message: issue.message,
      path: [...prefix, ...issue.path.map((p) => (typeof p === "symbol" ? String(p) : p))],
    });
  }
}

/** Walks the tree once for the whole-document rules: size, depth and unique block ids. */
function checkWholeDocument(doc: EntryNode, ctx: z.RefinementCtx) {
  let count = 0;
  const seenIds = new Set<string>();
  const walk = (node: EntryNode, depth: number) => {
    count += 1;
    if (depth > LIMITS.maxDepth) {
      ctx.addIssue({
        code: "custom",
        message: `The document nests deeper than ${LIMITS.maxDepth} levels.`,
      });
      return;
    }
    if (node.type === "solutionBlock" || node.type === "cellBlock" || node.type === "traceBlock") {
      const blockId = node.attrs?.blockId;
      const id = typeof blockId === "string" ? blockId : "";
      if (seenIds.has(id))
        ctx.addIssue({ code: "custom", message: `Two blocks share the id "${id}".` });
      seenIds.add(id);
    }
    node.content?.forEach((child) => walk(child, depth + 1));
  };
  walk(doc, 0);
  if (count > LIMITS.maxNodes) {
    ctx.addIssue({
      code: "custom",
      message: `The document has more than ${LIMITS.maxNodes} nodes.`,
    });
  }
}

export const entryDocumentSchema = z
  .strictObject({
    type: z.literal("doc"),
    attrs: z.record(z.string(), z.unknown()).optional(),
    content: z.array(nodeSchema).max(5000),
  })
  .superRefine((doc, ctx) => checkWholeDocument(doc, ctx));

export type EntryDocument = z.infer<typeof entryDocumentSchema>;

/**
 * JSON nesting allowed before the schema runs: a document node sits two JSON levels below its
 * parent (the node object and its content array), and attributes add a few more.
 */
const JSON_SHAPE_LIMITS = { maxDepth: LIMITS.maxDepth * 2 + 12, maxValues: LIMITS.maxNodes * 40 };

/**
 * Parses an untrusted document: its shape is measured without recursion first, so a tree
 * nested thousands of levels deep is refused instead of overflowing the stack in zod.
 */
export function safeParseEntryDocument(
  raw: unknown,
): { success: true; data: EntryDocument } | { success: false; problems: string[] } {
  const shape = checkJsonShape(raw, JSON_SHAPE_LIMITS);
  if (shape) {
    return {
      success: false,
      problems: [
        shape.kind === "too_deep"
          ? `document: The document nests deeper than ${LIMITS.maxDepth} levels.`
          : `document: The document has more than ${LIMITS.maxNodes} nodes.`,
      ],
    };
  }
  const parsed = entryDocumentSchema.safeParse(raw);
  return parsed.success
    ? { success: true, data: parsed.data }
    : { success: false, problems: describeDocumentErrors(parsed.error) };
}

/** Field-level messages for a refused save, e.g. "content.3.attrs.temperatureC: …". */
export function describeDocumentErrors(error: z.ZodError): string[] {
  return error.issues
    .slice(0, 20)
    .map((issue) => `${issue.path.join(".") || "document"}: ${issue.message}`);
}
