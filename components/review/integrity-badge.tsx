/** The stored content checked against its stored hash, as the verification endpoint reports. */
export function IntegrityBadge({
  intact,
  chainUnbroken,
  href,
}: {
  intact: boolean;
  chainUnbroken: boolean;
  href: string;
}) {
  const ok = intact && chainUnbroken;
  return (
    <a
      href={href}
      className={`chip ${ok ? "bg-lagoon-50 text-lagoon-700" : "bg-red-50 text-red-800"}`}
      data-testid="integrity"
      title="Recomputed from the stored content just now"
    >
      {ok ? "intact" : intact ? "history broken" : "altered"}
    </a>
  );
}
