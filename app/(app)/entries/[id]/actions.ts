"use server";
import { revalidatePath } from "next/cache";
import { requireActor } from "@/lib/access/actor";
import { runFormAction, type ActionState } from "@/lib/http/action";
import { setEntryArchived } from "@/lib/notebook/entries";
import { updateStock } from "@/lib/notebook/lineage/stocks";
import { startAmendment, submitEntry } from "@/lib/notebook/review";

export async function submitEntryAction(_prev: ActionState, form: FormData): Promise<ActionState> {
  return runFormAction(form, async ({ entryId = "", reviewerId = "" }) => {
    await submitEntry(await requireActor(), entryId, { reviewerId });
    revalidatePath(`/entries/${entryId}`);
    return { ok: true, message: "Submitted for countersignature." };
  });
}

export async function amendEntryAction(_prev: ActionState, form: FormData): Promise<ActionState> {
  return runFormAction(
    form,
    async (values) => {
      await startAmendment(await requireActor(), values.entryId ?? "", { reason: values.reason });
      revalidatePath(`/entries/${values.entryId}`);
      return {
        ok: true,
        message: "Amendment started: your next edits are saved as an amendment.",
      };
    },
    (values) => values,
  );
}

export async function archiveEntryAction(_prev: ActionState, form: FormData): Promise<ActionState> {
  return runFormAction(form, async ({ entryId = "", archived }) => {
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

export async function updateStockAction(_prev: ActionState, form: FormData): Promise<ActionState> {
  return runFormAction(
    form,
    async ({ entryId = "", ...values }) => {
      const saved = await updateStock(await requireActor(), entryId, values);
      revalidatePath(`/entries/${entryId}`);
      return { ok: true, message: `Saved as revision ${saved.revision} with the newer stock.` };
    },
    (values) => values,
  );
}
