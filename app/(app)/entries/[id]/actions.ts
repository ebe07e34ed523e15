"use server";
import { revalidatePath } from "next/cache";
import { requireActor } from "@/lib/access/actor";
import { runAction, type ActionState } from "@/lib/http/action";
import { setEntryArchived } from "@/lib/notebook/entries";
import { startAmendment, submitEntry } from "@/lib/notebook/review";
import { formDataToObject } from "@/lib/validation/parse";

export async function submitEntryAction(_prev: ActionState, form: FormData): Promise<ActionState> {
  const { entryId = "", reviewerId = "" } = formDataToObject(form);
  return runAction(async () => {
    await submitEntry(await requireActor(), entryId, { reviewerId });
    revalidatePath(`/entries/${entryId}`);
    return { ok: true, message: "Submitted for countersignature." };
  });
}

export async function amendEntryAction(_prev: ActionState, form: FormData): Promise<ActionState> {
  const values = formDataToObject(form);
  return runAction(async () => {
    await startAmendment(await requireActor(), values.entryId ?? "", { reason: values.reason });
    revalidatePath(`/entries/${values.entryId}`);
    return { ok: true, message: "Amendment started: your next edits are saved as an amendment." };
  }, values);
}

export async function archiveEntryAction(_prev: ActionState, form: FormData): Promise<ActionState> {
  const { entryId = "", archived } = formDataToObject(form);
  return runAction(async () => {
    await setEntryArchived(await requireActor(), entryId, archived === "true");
    revalidatePath(`/entries/${entryId}`);
    return {
      ok: true,
      message:
        archived === "true"
          ? "Archived. It stays readable and searchable by link."
          : "Restored to the lists.",
    };
  });
}
