"use client";

import { useEffect, useId, useRef, useState, type ReactNode } from "react";
import { actionButtonClass, inputClass, labelClass } from "../ui/field-styles";

interface PromptPopoverProps {
  title: string;
  label: string;
  initialValue: string;
  submitLabel: string;
  onSubmit: (value: string) => void;
  onCancel: () => void;
  onRemove?: () => void;
  multiline?: boolean;
  /** Extra controls and a live preview under the field. */
  children?: (value: string) => ReactNode;
  validate?: (value: string) => string | undefined;
}

/** A small dialog under the toolbar for a link address or an equation's TeX. */
export function PromptPopover({
  title,
  label,
  initialValue,
  submitLabel,
  onSubmit,
  onCancel,
  onRemove,
  multiline,
  children,
  validate,
}: PromptPopoverProps) {
  const id = useId();
  const [value, setValue] = useState(initialValue);
  const field = useRef<HTMLInputElement & HTMLTextAreaElement>(null);
  useEffect(() => field.current?.focus(), []);
  const problem = validate?.(value);
  const submit = () => {
    if (!problem) onSubmit(value);
  };
  const common = {
    id,
    ref: field,
    value,
    spellCheck: false,
    className: `${inputClass} font-mono`,
    "aria-invalid": problem ? true : undefined,
    onChange: (event: { target: { value: string } }) => setValue(event.target.value),
    onKeyDown: (event: React.KeyboardEvent) => {
      if (event.key === "Escape") onCancel();
      if (event.key === "Enter" && (!multiline || event.ctrlKey || event.metaKey)) {
        event.preventDefault();
        submit();
      }
    },
  };
  return (
    <div
      role="dialog"
      aria-label={title}
      className="absolute top-full left-2 z-30 mt-1 w-[26rem] max-w-[calc(100vw-2rem)] rounded-lg border border-ink-faint/40 bg-white p-3 shadow-xl"
    >
      <label htmlFor={id} className={`${labelClass} mb-1`}>
        {label}
      </label>
      {multiline ? <textarea rows={3} {...common} /> : <input type="text" {...common} />}
      {problem ? <p className="mt-1 text-xs text-red-800">{problem}</p> : null}
      {children?.(value)}
      <div className="mt-3 flex items-center justify-end gap-2">
        {onRemove ? (
          <button
            type="button"
            className="mr-auto text-xs text-ink-soft underline hover:text-ink"
            onClick={onRemove}
          >
            Remove
          </button>
        ) : null}
        <button type="button" className="text-xs text-ink-soft hover:text-ink" onClick={onCancel}>
          Cancel
        </button>
        <button
          type="button"
          className={actionButtonClass}
          disabled={Boolean(problem)}
          onClick={submit}
        >
          {submitLabel}
        </button>
      </div>
    </div>
  );
}
