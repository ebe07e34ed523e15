import type { Metadata } from "next";
import { redirect } from "next/navigation";
import { getActor } from "@/lib/access/actor";
import { SignInForm } from "./sign-in-form";

export const metadata: Metadata = { title: "Sign in" };

export default async function SignInPage({
  searchParams,
}: {
  searchParams: Promise<{ callbackUrl?: string; next?: string; joined?: string }>;
}) {
  if (await getActor()) redirect("/");
  const params = await searchParams;
  let next = params.next ?? "/";
  if (params.callbackUrl) {
    try {
      next = new URL(params.callbackUrl, "http://localhost").pathname;
    } catch {
      next = "/";
    }
  }
  return (
    <section className="card p-7">
      <h1 className="text-lg font-semibold">Sign in to your lab</h1>
      <p className="mt-1 mb-6 text-sm text-ink-soft">
        New members join through the invitation link their lab admin sends.
      </p>
      {params.joined ? (
        <p
          role="status"
          className="mb-4 rounded-md border border-lagoon-100 bg-lagoon-50 px-3 py-2 text-sm text-lagoon-700"
        >
          Welcome to the lab. Sign in with your new password.
        </p>
      ) : null}
      <SignInForm next={next} />
    </section>
  );
}
