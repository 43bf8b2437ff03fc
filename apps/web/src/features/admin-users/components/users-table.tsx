import { EmptyState } from '../../../components/ui/empty-state';
import { LoadingState } from '../../../components/ui/loading-state';
import { ErrorNotice } from '../../../components/errors/error-notice';
import { formatDateTime } from '../../../lib/format-date-time';
import { useUsers, type ManagedUser } from '../api/get-users';
import { RoleSelect } from './role-select';

type UsersTableProps = {
  /** The signed-in admin, marked "you" in the list. */
  currentUserId?: string | undefined;
  onRoleSaved?: ((user: ManagedUser) => void) | undefined;
};

const headerCell = 'px-3 py-2 text-left text-xs font-bold uppercase tracking-wider text-ink-soft';
const bodyCell = 'px-3 py-2 align-top';

/** Everyone who has signed in, with a role select per person. */
export function UsersTable({ currentUserId, onRoleSaved }: UsersTableProps) {
  const users = useUsers();
  if (users.isPending) return <LoadingState label="Loading users…" />;
  if (users.isError) {
    return <ErrorNotice title="The users could not be loaded" error={users.error} onRetry={() => void users.refetch()} />;
  }
  if (users.data.length === 0) {
    return (
      <EmptyState title="No one has signed in yet">
        People appear here after their first sign-in, as readers.
      </EmptyState>
    );
  }
  return (
    <div className="overflow-x-auto rounded-lg border border-rule-faint bg-paper-raised">
      <table className="w-full border-collapse text-sm leading-7">
        <caption className="sr-only">Users and their roles</caption>
        <thead className="border-b border-rule bg-paper-sunk">
          <tr>
            <th scope="col" className={headerCell}>Login</th>
            <th scope="col" className={headerCell}>Name</th>
            <th scope="col" className={headerCell}>E-mail</th>
            <th scope="col" className={headerCell}>Role</th>
            <th scope="col" className={headerCell}>Created</th>
            <th scope="col" className={headerCell}>Last sign-in</th>
          </tr>
        </thead>
        <tbody>
          {users.data.map((user) => (
            <tr key={user.id} className="border-b border-rule-faint last:border-b-0 hover:bg-paper-sunk/60">
              <th scope="row" className={`${bodyCell} text-left font-bold text-ink`}>
                {user.login}
                {user.id === currentUserId ? <span className="ml-2 font-normal text-ink-soft">(you)</span> : null}
              </th>
              <td className={bodyCell}>{user.displayName}</td>
              <td className={`${bodyCell} text-ink-soft`}>{user.email ?? '—'}</td>
              <td className={bodyCell}>
                <RoleSelect user={user} onSaved={onRoleSaved} />
              </td>
              <td className={`${bodyCell} tabular-nums text-ink-soft`}>
                <time dateTime={user.createdAt}>{formatDateTime(user.createdAt)}</time>
              </td>
              <td className={`${bodyCell} tabular-nums text-ink-soft`}>
                {user.lastSignInAt ? <time dateTime={user.lastSignInAt}>{formatDateTime(user.lastSignInAt)}</time> : 'never'}
              </td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
