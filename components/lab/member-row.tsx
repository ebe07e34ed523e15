"use client";
import { useActionState } from "react";
import { initialActionState, type ActionState } from "@/lib/contract/action-state";
import { ROLE_LABELS, ROLES } from "@/lib/contract/vocabulary";

type Action = (prev: ActionState, form: FormData) => Promise<ActionState>;

export interface MemberRowProps {
  member: { id: string; name: string; email: string; role: string; active: boolean };
  isSelf: boolean;
  changeRole: Action;
  setActivation: Action;
}

export function MemberRow({ member, isSelf, changeRole, setActivation }: MemberRowProps) {
  const [roleState, roleAction] = useActionState(changeRole, initialActionState);
  const [activeState, activeAction] = useActionState(setActivation, initialActionState);
  const message = roleState.message ?? activeState.message;
  const failed = (roleState.message && !roleState.ok) || (activeState.message && !activeState.ok);
  return (
    <tr className={member.active ? "" : "text-ink-faint"} data-testid={`member-${member.email}`}>
      <td className="py-3 pr-4">
        <p className="font-medium">
          {member.name}
          {isSelf ? <span className="ml-2 text-xs text-ink-soft">(you)</span> : null}
        </p>
        <p className="text-xs text-ink-soft">{member.email}</p>
      </td>
      <td className="py-3 pr-4">
        <form action={roleAction} className="flex items-center gap-2">
          <input type="hidden" name="userId" value={member.id} />
          <label className="sr-only" htmlFor={`role-${member.id}`}>
            Role of {member.name}
          </label>
          <select
            id={`role-${member.id}`}
            name="role"
            defaultValue={member.role}
            className="input w-36 py-1.5"
            disabled={!member.active}
          >
            {ROLES.map((role) => (
              <option key={role} value={role}>
                {ROLE_LABELS[role].name}
              </option>
            ))}
          </select>
          <button type="submit" className="btn-quiet py-1.5" disabled={!member.active}>
            Save role
          </button>
        </form>
      </td>
      <td className="py-3 pr-4">
        <span
          className={`chip ${member.active ? "bg-lagoon-50 text-lagoon-700" : "bg-ink/5 text-ink-soft"}`}
        >
          {member.active ? "active" : "deactivated"}
        </span>
      </td>
      <td className="py-3 text-right">
        {!isSelf ? (
          <form action={activeAction}>
            <input type="hidden" name="userId" value={member.id} />
            <input type="hidden" name="active" value={member.active ? "false" : "true"} />
            <button
              type="submit"
              className={member.active ? "btn-danger py-1.5" : "btn-quiet py-1.5"}
            >
              {member.active ? "Deactivate" : "Reactivate"}
            </button>
          </form>
        ) : null}
        {message ? (
          <p
            role={failed ? "alert" : "status"}
            className={`mt-1 text-xs ${failed ? "text-red-700" : "text-lagoon-700"}`}
          >
            {message}
          </p>
        ) : null}
      </td>
    </tr>
  );
}
