"use server";
import { revalidatePath } from "next/cache";
import { redirect } from "next/navigation";
import { requireActor } from "@/lib/access/actor";
import { runFormAction, type ActionState } from "@/lib/http/action";
import { createEntry } from "@/lib/notebook/entries";

export async function createEntryAction(_prev: ActionState, form: FormData): Promise<ActionState> {
  let createdId = "";
  const state = await runFormAction(
    form,
    async (values) => {
      const actor = await requireActor();
      const { id } = await createEntry(actor, {
        projectId: values.projectId,
        title: values.title,
        template: values.template || null,
      });
      createdId = id;
    },
    (values) => values,
  );
  if (!state.ok) return state;
  revalidatePath("/entries");
  redirect(`/entries/${createdId}`);
}
