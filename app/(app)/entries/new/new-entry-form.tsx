"use client";
import { useActionState } from "react";
import { Field } from "@/components/ui/field";
import { FormMessage } from "@/components/ui/form-message";
import { SubmitButton } from "@/components/ui/submit-button";
import { initialActionState } from "@/lib/contract/action-state";
import { createEntryAction } from "./actions";

export interface TemplateChoice {
  id: string;
  title: string;
  description: string;
}

export function NewEntryForm({
  projects,
  templates,
}: {
  projects: { id: string; name: string }[];
  templates: TemplateChoice[];
}) {
  const [state, formAction] = useActionState(createEntryAction, initialActionState);
  const chosen = state.values?.template ?? templates[0]?.id ?? "";
  return (
    <form action={formAction} className="space-y-5" noValidate>
      <FormMessage message={state.fieldErrors ? undefined : state.message} />
      <Field id="title" label="Title" errors={state.fieldErrors?.title}>
        {(aria) => (
          <input
            {...aria}
            name="title"
            className="input"
            placeholder="e.g. Cu disc in 0.1 m NaCl, run 3"
            defaultValue={state.values?.title ?? ""}
          />
        )}
      </Field>
      <Field id="projectId" label="Project" errors={state.fieldErrors?.projectId}>
        {(aria) => (
          <select
            {...aria}
            name="projectId"
            className="input"
            defaultValue={state.values?.projectId ?? projects[0]?.id}
          >
            {projects.map((p) => (
              <option key={p.id} value={p.id}>
                {p.name}
              </option>
            ))}
          </select>
        )}
      </Field>
      <fieldset className="space-y-2">
        <legend className="mb-1 label">Start from</legend>
        {[...templates, { id: "", title: "Blank page", description: "An empty entry." }].map(
          (t) => (
            <label
              key={t.id || "blank"}
              className="flex cursor-pointer gap-3 rounded-lg border border-ink/10 bg-white p-3 has-[:checked]:border-copper-500 has-[:checked]:bg-copper-50"
            >
              <input
                type="radio"
                name="template"
                value={t.id}
                defaultChecked={t.id === chosen}
                className="mt-1"
              />
              <span>
                <span className="block text-sm font-medium">{t.title}</span>
                <span className="block text-xs text-ink-soft">{t.description}</span>
              </span>
            </label>
          ),
        )}
        {state.fieldErrors?.template ? (
          <p role="alert" className="text-xs text-red-700">
            {state.fieldErrors.template.join(" ")}
          </p>
        ) : null}
      </fieldset>
      <SubmitButton pendingLabel="Creating…">Create entry</SubmitButton>
    </form>
  );
}
