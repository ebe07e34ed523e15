import { cx } from "@/lib/ui/class-names";

interface MessagesListProps {
  title: string;
  messages: readonly string[];
  tone: "validity" | "warning" | "note" | "hazard";
}

const TONES = {
  validity: "border-amber-300/70 bg-amber-50 text-amber-900",
  warning: "border-ink-faint/40 bg-paper-deep text-ink",
  note: "border-ink-faint/25 bg-paper text-ink-soft",
  hazard: "border-red-300 bg-red-50 text-red-900",
};

/** Validity messages, warnings and hazard notes: said plainly, never hidden. */
export function MessagesList({ title, messages, tone }: MessagesListProps) {
  if (messages.length === 0) return null;
  return (
    <section aria-label={title} className={cx("rounded-md border px-3 py-2 text-xs", TONES[tone])}>
      <h4 className="mb-0.5 font-semibold">{title}</h4>
      <ul className="list-disc space-y-0.5 pl-4">
        {messages.map((message) => (
          <li key={message}>{message}</li>
        ))}
      </ul>
    </section>
  );
}
