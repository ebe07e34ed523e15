/** Ionleaf's mark: a leaf whose vein is a charge sign, drawn for us. */
export function IonleafMark({ className = "h-7 w-7" }: { className?: string }) {
  return (
    <svg viewBox="0 0 32 32" className={className} aria-hidden="true">
      <path d="M5 27C5 14 13 5 27 5c0 14-9 22-22 22Z" fill="#22807a" />
      <path d="M8 24 22 10" stroke="#fbfaf7" strokeWidth="1.6" strokeLinecap="round" />
      <path d="M13.5 15.5h5M16 13v5" stroke="#dfa27d" strokeWidth="1.8" strokeLinecap="round" />
    </svg>
  );
}
