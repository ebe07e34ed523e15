import { redirect } from "next/navigation";
import { QueryProvider } from "@/components/providers/query-provider";
import { AppHeader } from "@/components/shell/app-header";
import { getActor } from "@/lib/access/actor";
import { signOut } from "@/lib/auth";
import { endSessions } from "@/lib/auth/sign-out";
import { getLabName } from "@/lib/labs/members";
import { navigationFor } from "@/lib/shell/navigation";

export default async function AppLayout({ children }: { children: React.ReactNode }) {
  const actor = await getActor();
  if (!actor) redirect("/sign-in");
  const labName = await getLabName(actor);

  async function signOutAction() {
    "use server";
    const current = await getActor();
    if (current) await endSessions(current);
    await signOut({ redirectTo: "/sign-in" });
  }

  return (
    <div className="min-h-screen">
      <AppHeader
        labName={labName}
        userName={actor.name}
        role={actor.role}
        items={navigationFor(actor.role)}
        signOut={signOutAction}
      />
      <main className="mx-auto max-w-7xl px-5 py-8">
        <QueryProvider>{children}</QueryProvider>
      </main>
      <footer className="mx-auto max-w-7xl px-5 pb-8 text-xs text-ink-faint">
        Computed activities are model estimates: verify against measurement, read the safety data
        sheet of every reagent and follow your institution&apos;s chemical hygiene plan.
      </footer>
    </div>
  );
}
