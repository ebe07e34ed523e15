"use client";

import { useEffect, useId, useState, type InputHTMLAttributes } from "react";
import { cx } from "@/lib/ui/class-names";
import { parseTypedNumber } from "@/lib/ui/format-number";
import { FieldError } from "./field-error";
import { invalidClass, numberInputClass } from "./field-styles";

type NativeProps = Omit<InputHTMLAttributes<HTMLInputElement>, "value" | "onChange" | "type">;

interface NumberFieldProps extends NativeProps {
  value: number | null | undefined;
  onValueChange: (value: number | null) => void;
  /** Accessible name; shown as a visible label unless `hideLabel`. */
  label: string;
  hideLabel?: boolean;
  unit?: string;
  error?: string;
  /** What the document schema accepts; a value outside is kept as text and marked, not saved. */
  bounds?: { min: number; max: number };
}

const DEFAULT_BOUNDS = { min: -1e9, max: 1e9 };

/**
 * A number input that keeps what the person is typing ("0.", "1e-") as text and passes on a
 * number only when the text reads as one. Text that does not parse is kept and marked.
 */
export function NumberField({
  value,
  onValueChange,
  label,
  hideLabel,
  unit,
  error,
  className,
  bounds = DEFAULT_BOUNDS,
  ...rest
}: NumberFieldProps) {
  const id = useId();
  const [text, setText] = useState(() =>
    value === null || value === undefined ? "" : String(value),
  );
  // Follow outside changes (undo, a template) without fighting the person typing: the
  // text is replaced only when it no longer reads as the stored value.
  useEffect(() => {
    setText((current) =>
      parseTypedNumber(current) !== (value ?? null)
        ? value === null || value === undefined
          ? ""
          : String(value)
        : current,
    );
  }, [value]);
  const typed = parseTypedNumber(text);
  const unparsable = text.trim() !== "" && typed === null;
  const outOfBounds = typed !== null && (typed < bounds.min || typed > bounds.max);
  const message = unparsable
    ? "Not a number."
    : outOfBounds
      ? `Out of the range this field takes (${bounds.min} to ${bounds.max}).`
      : error;
  return (
    <div className={className}>
      <label
        htmlFor={id}
        className={
          hideLabel
            ? "sr-only"
            : "mb-0.5 block text-[11px] font-medium tracking-wide text-ink-soft uppercase"
        }
      >
        {label}
        {unit && !hideLabel ? (
          <span className="tracking-normal text-ink-faint normal-case"> ({unit})</span>
        ) : null}
      </label>
      <div className="flex items-center gap-1">
        <input
          id={id}
          type="text"
          inputMode="decimal"
          autoComplete="off"
          spellCheck={false}
          value={text}
          aria-invalid={message ? true : undefined}
          aria-describedby={message ? `${id}-error` : undefined}
          className={cx(numberInputClass, message && invalidClass)}
          onChange={(event) => {
            setText(event.target.value);
            const parsed = parseTypedNumber(event.target.value);
            const inBounds = parsed !== null && parsed >= bounds.min && parsed <= bounds.max;
            if (inBounds || event.target.value.trim() === "") onValueChange(parsed);
          }}
          {...rest}
        />
        {unit && hideLabel ? <span className="shrink-0 text-xs text-ink-soft">{unit}</span> : null}
      </div>
      <FieldError id={`${id}-error`} message={message} />
    </div>
  );
}
