/** A labelled form field with its error messages, wired for screen readers. */
export function Field(props: {
  id: string;
  label: string;
  errors?: string[];
  hint?: string;
  children: (aria: {
    id: string;
    "aria-invalid": boolean;
    "aria-describedby"?: string;
  }) => React.ReactNode;
}) {
  const { id, label, errors, hint, children } = props;
  const describedBy =
    [hint ? `${id}-hint` : null, errors?.length ? `${id}-error` : null].filter(Boolean).join(" ") ||
    undefined;
  return (
    <div className="space-y-1.5">
      <label htmlFor={id} className="label">
        {label}
      </label>
      {children({ id, "aria-invalid": Boolean(errors?.length), "aria-describedby": describedBy })}
      {hint ? (
        <p id={`${id}-hint`} className="text-xs text-ink-soft">
          {hint}
        </p>
      ) : null}
      {errors?.length ? (
        <p id={`${id}-error`} role="alert" className="text-xs font-medium text-red-700">
          {errors.join(" ")}
        </p>
      ) : null}
    </div>
  );
}
