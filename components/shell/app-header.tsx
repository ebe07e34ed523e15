import Link from "next/link";
import { IonleafMark } from "@/components/ui/ionleaf-mark";
import { NavLinks, type NavItem } from "./nav-links";

const ROLE_TONE: Record<string, string> = {
  researcher: "bg-lagoon-50 text-lagoon-700",
  supervisor: "bg-copper-50 text-copper-700",
  admin: "bg-ink/5 text-ink",
};

export function AppHeader(props: {
  labName: string;
  userName: string;
  role: string;
  items: NavItem[];
  signOut: () => Promise<void>;
}) {
  return (
    <header className="border-b border-ink/10 bg-paper-deep/70 backdrop-blur">
      <div className="mx-auto flex max-w-7xl flex-wrap items-center gap-x-6 gap-y-2 px-5 py-3">
        <Link href="/" className="flex items-center gap-2.5" title="Your bench">
          <IonleafMark />
          <span className="leading-tight">
            <span className="block text-[15px] font-semibold tracking-tight">Ionleaf</span>
            <span className="block text-xs text-ink-soft">{props.labName}</span>
          </span>
        </Link>
        <NavLinks items={props.items} />
        <div className="ml-auto flex items-center gap-3 text-sm">
          <span className="text-right leading-tight">
            <span className="block font-medium" data-testid="current-user">
              {props.userName}
            </span>
            <span className={`chip ${ROLE_TONE[props.role] ?? ""}`} data-testid="current-role">
              {props.role}
            </span>
          </span>
          <form action={props.signOut}>
            <button type="submit" className="btn-quiet py-1.5">
              Sign out
            </button>
          </form>
        </div>
      </div>
    </header>
  );
}
