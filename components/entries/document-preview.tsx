import type { ReactNode } from "react";
import { TracePreview } from "@/components/traces/trace-preview";
import type { TraceViewDto } from "@/lib/contract/traces";
import { isSafeHref } from "@/lib/document/safe-href";

interface DocNode {
  type?: string;
  text?: string;
  attrs?: Record<string, unknown>;
  marks?: { type: string; attrs?: Record<string, unknown> }[];
  content?: DocNode[];
}

const str = (v: unknown) => (typeof v === "string" ? v : "");

function Marked({ node }: { node: DocNode }) {
  let out: ReactNode = node.text ?? "";
  for (const mark of node.marks ?? []) {
    if (mark.type === "bold") out = <strong>{out}</strong>;
    else if (mark.type === "italic") out = <em>{out}</em>;
    else if (mark.type === "strike") out = <s>{out}</s>;
    else if (mark.type === "code") out = <code>{out}</code>;
    else if (mark.type === "underline") out = <u>{out}</u>;
    else if (mark.type === "link" && isSafeHref(str(mark.attrs?.href)))
      out = (
        <a href={str(mark.attrs?.href)} rel="noopener noreferrer nofollow" target="_blank">
          {out}
        </a>
      );
  }
  return <>{out}</>;
}

/** A live block's place, with its name, until the editor draws the block itself. */
function BlockCard({ kind, name, children }: { kind: string; name: string; children?: ReactNode }) {
  return (
    <div
      className="my-4 rounded-lg border border-ink-faint/30 bg-paper-deep/40 p-4"
      data-preview-block={kind}
    >
      <p className="text-sm font-medium">
        {name || kind} <span className="text-xs font-normal text-ink-soft">{kind}</span>
      </p>
      {children}
    </div>
  );
}

function PreviewNode({
  node,
  traces,
}: {
  node: DocNode;
  traces: ReadonlyMap<string, TraceViewDto>;
}) {
  const inner = (node.content ?? []).map((child, i) => (
    <PreviewNode key={i} node={child} traces={traces} />
  ));
  switch (node.type) {
    case "text":
      return <Marked node={node} />;
    case "paragraph":
      return <p>{inner}</p>;
    case "heading": {
      const level = Math.min(3, Math.max(1, Number(node.attrs?.level ?? 2)));
      return level === 1 ? <h1>{inner}</h1> : level === 2 ? <h2>{inner}</h2> : <h3>{inner}</h3>;
    }
    case "bulletList":
    case "taskList":
      return <ul>{inner}</ul>;
    case "orderedList":
      return <ol>{inner}</ol>;
    case "listItem":
    case "taskItem":
      return <li>{inner}</li>;
    case "blockquote":
      return <blockquote>{inner}</blockquote>;
    case "codeBlock":
      return <pre>{inner}</pre>;
    case "horizontalRule":
      return <hr />;
    case "hardBreak":
      return <br />;
    case "inlineMath":
    case "blockMath":
      return <code>{str(node.attrs?.latex)}</code>;
    case "solutionBlock":
      return <BlockCard kind="solution" name={str(node.attrs?.name)} />;
    case "cellBlock":
      return <BlockCard kind="cell" name={str(node.attrs?.name)} />;
    case "traceBlock": {
      const view = traces.get(str(node.attrs?.attachmentId));
      return (
        <BlockCard kind="trace" name={str(node.attrs?.name) || (view?.name ?? "")}>
          {view ? <TracePreview view={view} /> : null}
        </BlockCard>
      );
    }
    case "attachmentFigure":
    case "attachmentFile":
      return <BlockCard kind="attachment" name={str(node.attrs?.caption)} />;
    default:
      return <>{inner}</>;
  }
}

/**
 * The entry as the server has it, drawn without the editor: text, the names of live blocks and
 * the still pictures of trace blocks. It is what the reader sees while the editor's code loads
 * (the editor then takes its place), so an entry is readable at the page's first paint.
 */
export function DocumentPreview({
  content,
  traceViews,
}: {
  content: unknown;
  traceViews: readonly TraceViewDto[];
}) {
  const traces = new Map(traceViews.map((v) => [v.attachmentId, v]));
  return (
    <div
      className="ionleaf-editor rounded-lg border border-ink-faint/40 bg-paper px-6 py-4 text-ink"
      data-testid="document-preview"
      aria-busy="true"
    >
      <div className="ionleaf-prose">
        <PreviewNode node={content as DocNode} traces={traces} />
      </div>
    </div>
  );
}
