/** The engine's message under the field it names. Linked to the input with aria-describedby. */
export function FieldError({ id, message }: { id: string; message?: string }) {
  if (!message) return null;
  return (
    <p id={id} role="alert" className="mt-1 text-xs leading-snug text-red-800">
      {message}
    </p>
  );
}
