import { describeError, describeErrorDetails } from '../../../lib/describe-error';
import { roleSchema, roles } from '../../../lib/roles';
import type { ManagedUser } from '../api/get-users';
import { useUpdateUserRole } from '../api/update-user-role';

type RoleSelectProps = {
  user: ManagedUser;
  onSaved?: ((user: ManagedUser) => void) | undefined;
};

/** One person's role, saved as soon as it is changed; the server's refusal is shown beside it. */
export function RoleSelect({ user, onSaved }: RoleSelectProps) {
  const update = useUpdateUserRole({ onSaved });
  const selectId = `role-${user.id}`;
  const shownRole = update.isPending ? update.variables.role : user.role;
  const details = describeErrorDetails(update.error);
  return (
    <div>
      <label htmlFor={selectId} className="sr-only">
        Role of {user.login}
      </label>
      <div className="flex items-center gap-2">
        <select
          id={selectId}
          value={shownRole}
          disabled={update.isPending}
          onChange={(event) => update.mutate({ id: user.id, role: roleSchema.parse(event.target.value) })}
          className="rounded-md border border-rule bg-paper-raised px-2 py-1 text-ink hover:border-ink disabled:opacity-60"
        >
          {roles.map((role) => (
            <option key={role} value={role}>
              {role}
            </option>
          ))}
        </select>
        {update.isPending ? <span className="text-xs text-ink-soft">Saving…</span> : null}
      </div>
      {update.isError ? (
        <div role="alert" className="mt-1 max-w-xs text-sm leading-snug text-copper">
          <p>Not saved: {describeError(update.error)}</p>
          {details.length > 0 ? (
            <ul className="list-disc pl-4">
              {details.map((line) => (
                <li key={line}>{line}</li>
              ))}
            </ul>
          ) : null}
        </div>
      ) : null}
    </div>
  );
}
