"use server";
import { redirect } from "next/navigation";
import { revalidatePath } from "next/cache";
import { requireActor } from "@/lib/access/actor";
import { runAction, type ActionState } from "@/lib/http/action";
import { countersignEntry, returnEntry } from "@/lib/notebook/review";
import { formDataToObject } from "@/lib/validation/parse";

export async function countersignAction(_prev: ActionState, form: FormData): Promise<ActionState> {
  const { password, ...values } = formDataToObject(form);
  const entryId = values.entryId ?? "";
  const state = await runAction(async () => {
    await countersignEntry(await requireActor(), entryId, { ...values, password });
    revalidatePath(`/entries/${entryId}`);
    revalidatePath("/review");
  }, values); // the password never goes back to the form
  if (state.ok) redirect(`/entries/${entryId}`);
  return state;
}

export async function returnAction(_prev: ActionState, form: FormData): Promise<ActionState> {
  const values = formDataToObject(form);
  const entryId = values.entryId ?? "";
  const state = await runAction(async () => {
    await returnEntry(await requireActor(), entryId, values);
    revalidatePath(`/entries/${entryId}`);
    revalidatePath("/review");
  }, values);
  if (state.ok) redirect("/review");
  return state;
}
