"use client";

import { usePathname } from "next/navigation";

/**
 * "Similar solutions" for a saved solution block: a link to the finder's similar-solutions
 * page for this block of the entry (or revision) on screen. Shown only on an entry's page,
 * where the URL says which entry, and for a block with an id.
 */
export function SimilarLink({ blockId }: { blockId: string | undefined }) {
  const path = usePathname() ?? "";
  const match = /^\/entries\/([0-9a-f-]{36})(?:\/revisions\/(\d+))?/.exec(path);
  if (!match || !blockId) return null;
  const params = new URLSearchParams({ entry: match[1], block: blockId });
  if (match[2]) params.set("revision", match[2]);
  return (
    <a
      href={`/solutions/similar?${params.toString()}`}
      className="text-xs whitespace-nowrap text-copper-700 hover:underline"
    >
      Similar solutions
    </a>
  );
}
