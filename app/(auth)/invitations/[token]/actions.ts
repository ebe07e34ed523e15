"use server";
import { redirect } from "next/navigation";
import { runAction, type ActionState } from "@/lib/http/action";
import { acceptInvitation } from "@/lib/labs/invitations";
import { formDataToObject } from "@/lib/validation/parse";

export async function acceptInvitationAction(
  _prev: ActionState,
  form: FormData,
): Promise<ActionState> {
  const values = formDataToObject(form);
  const state = await runAction(
    async () => {
      await acceptInvitation(values);
    },
    { name: values.name ?? "" },
  );
  if (state.ok) redirect("/sign-in?joined=1");
  return state;
}
