import Link from "next/link";

export default function NotFound() {
  return (
    <main className="mx-auto max-w-lg px-5 py-24 text-center">
      <p className="font-mono text-sm text-copper-600">404</p>
      <h1 className="mt-2 text-2xl font-semibold">Nothing here</h1>
      <p className="mt-2 text-sm text-ink-soft">
        The page does not exist, or it belongs to a lab you are not a member of.
      </p>
      <Link href="/" className="mt-6 btn-quiet">
        Back to the bench
      </Link>
    </main>
  );
}
