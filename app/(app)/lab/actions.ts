"use server";
import { revalidatePath } from "next/cache";
import { requireActor } from "@/lib/access/actor";
import { runAction, runFormAction, type ActionState } from "@/lib/http/action";
import { inviteMember, withdrawInvitation } from "@/lib/labs/invitations";
import { changeMemberRole, setMemberActivation } from "@/lib/labs/members";
import { retryLabOutbox } from "@/lib/labs/outbox";

// Every action is a public POST endpoint: each one resolves the actor itself, and the
// service it calls checks the role and the lab.

export async function inviteMemberAction(_prev: ActionState, form: FormData): Promise<ActionState> {
  return runFormAction(
    form,
    async (values) => {
      const actor = await requireActor();
      await inviteMember(actor, values);
      revalidatePath("/lab");
      return { ok: true, message: `Invitation sent to ${values.email}.` };
    },
    (values) => values,
  );
}

export async function changeRoleAction(_prev: ActionState, form: FormData): Promise<ActionState> {
  return runFormAction(form, async (values) => {
    const actor = await requireActor();
    const member = await changeMemberRole(actor, values);
    revalidatePath("/lab");
    return { ok: true, message: `${member.name} is now ${member.role}.` };
  });
}

export async function setActivationAction(
  _prev: ActionState,
  form: FormData,
): Promise<ActionState> {
  return runFormAction(form, async (values) => {
    const actor = await requireActor();
    const member = await setMemberActivation(actor, values, values.active === "true");
    revalidatePath("/lab");
    return {
      ok: true,
      message: member.active
        ? `${member.name} can sign in again.`
        : `${member.name} is deactivated; their entries stay.`,
    };
  });
}

export async function withdrawInvitationAction(
  _prev: ActionState,
  form: FormData,
): Promise<ActionState> {
  return runFormAction(form, async (values) => {
    const actor = await requireActor();
    await withdrawInvitation(actor, values.invitationId ?? "");
    revalidatePath("/lab");
    return { ok: true, message: "Invitation withdrawn." };
  });
}

export async function retryOutboxAction(_prev: ActionState, _form: FormData): Promise<ActionState> {
  return runAction(async () => {
    const count = await retryLabOutbox(await requireActor());
    revalidatePath("/lab");
    return { ok: true, message: count ? `Sending ${count} mail(s) again.` : "Nothing to resend." };
  });
}
