"use server";
import { revalidatePath } from "next/cache";
import { redirect } from "next/navigation";
import { requireActor } from "@/lib/access/actor";
import { runAction, type ActionState } from "@/lib/http/action";
import { createEntry } from "@/lib/notebook/entries";
import { formDataToObject } from "@/lib/validation/parse";

export async function createEntryAction(_prev: ActionState, form: FormData): Promise<ActionState> {
  const values = formDataToObject(form);
  let createdId = "";
  const state = await runAction(async () => {
    const actor = await requireActor();
    const { id } = await createEntry(actor, {
      projectId: values.projectId,
      title: values.title,
      template: values.template || null,
    });
    createdId = id;
  }, values);
  if (!state.ok) return state;
  revalidatePath("/entries");
  redirect(`/entries/${createdId}`);
}
