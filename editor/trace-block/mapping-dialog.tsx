"use client";

import { useState } from "react";
import type { TraceViewDto } from "@/lib/contract/traces";
import { ApiError, apiFetch } from "@/lib/ui/api-client";

const ROLES = [
  { quantity: "potential", label: "Potential", units: ["V", "mV"] },
  { quantity: "current", label: "Current", units: ["A", "mA", "µA", "nA"] },
  { quantity: "time", label: "Time", units: ["s", "ms", "min"] },
  { quantity: "cycle", label: "Cycle number", units: [] },
  { quantity: "impedanceReal", label: "Z′ (real)", units: ["Ohm", "kOhm"] },
  {
    quantity: "impedanceImaginaryNegated",
    label: "−Z″ (imaginary, negated)",
    units: ["Ohm", "kOhm"],
  },
  { quantity: "frequency", label: "Frequency", units: ["Hz", "kHz"] },
] as const;

/**
 * For a layout the reader could not understand: which column is which quantity, in which
 * unit. Saved for the lab, so every later file with the same columns is read this way.
 */
export function MappingDialog({
  view,
  onClose,
  onSaved,
}: {
  view: TraceViewDto;
  onClose: () => void;
  onSaved: () => void;
}) {
  const columns = view.summary.columns.map((c) => c.name);
  const [choice, setChoice] = useState<Record<string, { column: string; unit: string }>>(() => {
    const initial: Record<string, { column: string; unit: string }> = {};
    for (const [quantity, index] of Object.entries(view.summary.roles)) {
      const column = view.summary.columns[index];
      if (column) initial[quantity] = { column: column.name, unit: "" };
    }
    return initial;
  });
  const [error, setError] = useState<string | null>(null);
  const [saving, setSaving] = useState(false);

  async function save() {
    setSaving(true);
    setError(null);
    const mapping = Object.fromEntries(
      Object.entries(choice)
        .filter(([, v]) => v.column)
        .map(([q, v]) => [q, v.unit ? { column: v.column, unit: v.unit } : { column: v.column }]),
    );
    try {
      await apiFetch(`/api/attachments/${view.attachmentId}/mapping`, {
        method: "PUT",
        body: JSON.stringify({ mapping }),
      });
      onSaved();
    } catch (e) {
      setError(e instanceof ApiError ? e.message : "The mapping could not be saved.");
    } finally {
      setSaving(false);
    }
  }

  return (
    <div
      role="dialog"
      aria-modal="false"
      aria-labelledby="mapping-title"
      className="space-y-3 rounded-md border border-copper-300 bg-copper-50/50 p-3"
    >
      <p id="mapping-title" className="font-medium">
        Which column is which?
      </p>
      <p className="text-xs text-ink-soft">
        Saved for your lab: files with the same columns are read this way from now on.
      </p>
      <div className="grid gap-2 sm:grid-cols-2">
        {ROLES.map((role) => (
          <div key={role.quantity} className="flex items-end gap-2">
            <label className="flex-1 text-xs">
              <span className="mb-1 block font-medium">{role.label}</span>
              <select
                className="input py-1"
                value={choice[role.quantity]?.column ?? ""}
                onChange={(e) =>
                  setChoice((c) => ({
                    ...c,
                    [role.quantity]: { column: e.target.value, unit: c[role.quantity]?.unit ?? "" },
                  }))
                }
              >
                <option value="">—</option>
                {columns.map((name) => (
                  <option key={name} value={name}>
                    {name}
                  </option>
                ))}
              </select>
            </label>
            {role.units.length ? (
              <label className="w-24 text-xs">
                <span className="mb-1 block font-medium">Unit</span>
                <select
                  className="input py-1"
                  value={choice[role.quantity]?.unit ?? ""}
                  onChange={(e) =>
                    setChoice((c) => ({
                      ...c,
                      [role.quantity]: {
                        column: c[role.quantity]?.column ?? "",
                        unit: e.target.value,
                      },
                    }))
                  }
                >
                  <option value="">as named</option>
                  {role.units.map((u) => (
                    <option key={u} value={u}>
                      {u}
                    </option>
                  ))}
                </select>
              </label>
            ) : null}
          </div>
        ))}
      </div>
      {error ? (
        <p role="alert" className="text-xs text-red-700">
          {error}
        </p>
      ) : null}
      <div className="flex gap-2">
        <button
          type="button"
          className="btn-primary py-1"
          disabled={saving}
          onClick={() => void save()}
        >
          Read the file this way
        </button>
        <button type="button" className="btn-quiet py-1" onClick={onClose}>
          Cancel
        </button>
      </div>
    </div>
  );
}
