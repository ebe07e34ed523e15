"use client";

import type { ReactNode } from "react";
import { cx } from "@/lib/ui/class-names";

interface ToolbarButtonProps {
  label: string;
  shortcut?: string;
  active?: boolean;
  disabled?: boolean;
  onClick: () => void;
  children: ReactNode;
  accent?: boolean;
}

export function ToolbarButton({
  label,
  shortcut,
  active,
  disabled,
  onClick,
  children,
  accent,
}: ToolbarButtonProps) {
  return (
    <button
      type="button"
      aria-pressed={active === undefined ? undefined : active}
      title={shortcut ? `${label} (${shortcut})` : label}
      disabled={disabled}
      // Keep the editor's selection: a mousedown on the button would otherwise blur it.
      onMouseDown={(event) => event.preventDefault()}
      onClick={onClick}
      className={cx(
        "inline-flex h-7 min-w-7 items-center justify-center gap-1 rounded px-1.5 text-xs font-medium",
        "focus:outline-none focus-visible:ring-2 focus-visible:ring-copper-500 disabled:opacity-40",
        accent
          ? "border border-copper-300 bg-copper-50 text-copper-700 hover:bg-copper-100"
          : active
            ? "bg-ink text-paper"
            : "text-ink-soft hover:bg-paper-deep hover:text-ink",
      )}
    >
      {/* The glyph is what sighted users read; the name is the words (so "H2" is announced
          as "Heading 2" without a label that contradicts the visible text). */}
      <span aria-hidden className="contents">
        {children}
      </span>
      <span className="sr-only">{label}</span>
    </button>
  );
}

export function ToolbarDivider() {
  return <span aria-hidden className="mx-1 h-5 w-px bg-ink-faint/40" />;
}
