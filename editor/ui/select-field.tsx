"use client";

import { useId } from "react";
import { cx } from "@/lib/ui/class-names";
import { FieldError } from "./field-error";
import { inputClass, invalidClass, labelClass } from "./field-styles";

export interface SelectOption {
  value: string;
  label: string;
}

interface SelectFieldProps {
  label: string;
  value: string;
  options: readonly SelectOption[];
  onValueChange: (value: string) => void;
  error?: string;
  hideLabel?: boolean;
  disabled?: boolean;
  className?: string;
}

export function SelectField({
  label,
  value,
  options,
  onValueChange,
  error,
  hideLabel,
  disabled,
  className,
}: SelectFieldProps) {
  const id = useId();
  return (
    <div className={className}>
      <label htmlFor={id} className={hideLabel ? "sr-only" : cx(labelClass, "mb-0.5")}>
        {label}
      </label>
      <select
        id={id}
        value={value}
        disabled={disabled}
        aria-invalid={error ? true : undefined}
        aria-describedby={error ? `${id}-error` : undefined}
        className={cx(inputClass, "pr-6", error && invalidClass)}
        onChange={(event) => onValueChange(event.target.value)}
      >
        {options.map((option) => (
          <option key={option.value} value={option.value}>
            {option.label}
          </option>
        ))}
      </select>
      <FieldError id={`${id}-error`} message={error} />
    </div>
  );
}
