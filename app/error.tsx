"use client";

/** Shown for unexpected server errors: a plain message, never a stack trace. */
export default function ErrorPage({
  reset,
}: {
  error: Error & { digest?: string };
  reset: () => void;
}) {
  return (
    <main className="mx-auto max-w-lg px-5 py-24 text-center">
      <h1 className="text-2xl font-semibold">Something went wrong</h1>
      <p className="mt-2 text-sm text-ink-soft">
        Nothing you saved before this was lost. Try again; if it keeps happening, tell your lab
        admin.
      </p>
      <button type="button" onClick={reset} className="mt-6 btn-primary">
        Try again
      </button>
    </main>
  );
}
