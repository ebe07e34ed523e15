"use server";
import { redirect } from "next/navigation";
import { revalidatePath } from "next/cache";
import { requireActor } from "@/lib/access/actor";
import { runFormAction, type ActionState } from "@/lib/http/action";
import { countersignEntry, returnEntry } from "@/lib/notebook/review";

export async function countersignAction(_prev: ActionState, form: FormData): Promise<ActionState> {
  let entryId = "";
  const state = await runFormAction(
    form,
    async (values) => {
      entryId = values.entryId ?? "";
      await countersignEntry(await requireActor(), entryId, values);
      revalidatePath(`/entries/${entryId}`);
      revalidatePath("/review");
    },
    ({ password: _password, ...values }) => values, // the password never goes back to the form
  );
  if (state.ok) redirect(`/entries/${entryId}`);
  return state;
}

export async function returnAction(_prev: ActionState, form: FormData): Promise<ActionState> {
  const state = await runFormAction(
    form,
    async (values) => {
      const entryId = values.entryId ?? "";
      await returnEntry(await requireActor(), entryId, values);
      revalidatePath(`/entries/${entryId}`);
      revalidatePath("/review");
    },
    (values) => values,
  );
  if (state.ok) redirect("/review");
  return state;
}
