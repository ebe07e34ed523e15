import { IonleafMark } from "@/components/ui/ionleaf-mark";

export default function AuthLayout({ children }: { children: React.ReactNode }) {
  return (
    <main className="grid min-h-screen place-items-center bg-[radial-gradient(ellipse_at_top_left,#eef8f7,transparent_55%),radial-gradient(ellipse_at_bottom_right,#fbf3ee,transparent_50%)] px-4 py-12">
      <div className="w-full max-w-md">
        <div className="mb-8 flex items-center gap-3">
          <IonleafMark className="h-9 w-9" />
          <div>
            <p className="text-xl font-semibold tracking-tight">Ionleaf</p>
            <p className="text-sm text-ink-soft">the electrochemistry notebook</p>
          </div>
        </div>
        {children}
      </div>
    </main>
  );
}
