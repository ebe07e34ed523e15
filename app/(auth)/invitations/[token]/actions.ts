"use server";
import { redirect } from "next/navigation";
import { runFormAction, type ActionState } from "@/lib/http/action";
import { acceptInvitation } from "@/lib/labs/invitations";

export async function acceptInvitationAction(
  _prev: ActionState,
  form: FormData,
): Promise<ActionState> {
  const state = await runFormAction(
    form,
    async (values) => {
      await acceptInvitation(values);
    },
    (values) => ({ name: values.name ?? "", email: values.email ?? "" }),
  );
  if (state.ok) redirect("/sign-in?joined=1");
  return state;
}
