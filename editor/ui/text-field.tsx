"use client";

import { useId, type InputHTMLAttributes } from "react";
import { cx } from "@/lib/ui/class-names";
import { FieldError } from "./field-error";
import { inputClass, invalidClass, labelClass } from "./field-styles";

interface TextFieldProps extends Omit<InputHTMLAttributes<HTMLInputElement>, "value" | "onChange"> {
  label: string;
  value: string;
  onValueChange: (value: string) => void;
  error?: string;
  hideLabel?: boolean;
}

export function TextField({
  label,
  value,
  onValueChange,
  error,
  hideLabel,
  className,
  ...rest
}: TextFieldProps) {
  const id = useId();
  return (
    <div className={className}>
      <label htmlFor={id} className={hideLabel ? "sr-only" : cx(labelClass, "mb-0.5")}>
        {label}
      </label>
      <input
        id={id}
        type="text"
        value={value}
        autoComplete="off"
        aria-invalid={error ? true : undefined}
        aria-describedby={error ? `${id}-error` : undefined}
        className={cx(inputClass, error && invalidClass)}
        onChange={(event) => onValueChange(event.target.value)}
        {...rest}
      />
      <FieldError id={`${id}-error`} message={error} />
    </div>
  );
}
