/**
 * Shared Tailwind classes of the block forms: thin ink borders on paper, a copper focus
 * ring, and a red-clay border plus message when the engine names the field as wrong.
 */
export const inputClass =
  "w-full min-w-0 rounded-md border border-ink-faint/50 bg-white px-2 py-1 text-sm text-ink " +
  "placeholder:text-ink-faint focus:border-copper-500 focus:outline-none focus:ring-2 focus:ring-copper-300/60 " +
  "disabled:bg-paper-deep disabled:text-ink-soft";

export const numberInputClass = `${inputClass} font-mono tabular-nums text-right`;

export const invalidClass =
  "border-red-700/70 bg-red-50 focus:border-red-700 focus:ring-red-300/60";

export const labelClass = "block text-[11px] font-medium uppercase tracking-wide text-ink-soft";

export const actionButtonClass =
  "inline-flex items-center gap-1 rounded-md border border-copper-300 bg-copper-50 px-2 py-1 text-xs font-medium " +
  "text-copper-700 hover:bg-copper-100 focus:outline-none focus-visible:ring-2 focus-visible:ring-copper-500 " +
  "disabled:opacity-50";

export const quietButtonClass =
  "inline-flex h-7 w-7 items-center justify-center rounded-md text-ink-soft hover:bg-paper-deep hover:text-ink " +
  "focus:outline-none focus-visible:ring-2 focus-visible:ring-copper-500";
