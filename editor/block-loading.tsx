/** Placeholder while a live block's code (lib/chem and its catalogues) is fetched. */
export function BlockLoading({ kind }: { kind: "solution" | "cell" | "trace" | "figure" }) {
  return (
    <div
      data-live-block={kind}
      aria-busy="true"
      className="my-4 h-40 animate-pulse rounded-lg border border-ink-faint/30 bg-paper-deep/60"
      aria-label={`Loading ${kind} block`}
    />
  );
}
