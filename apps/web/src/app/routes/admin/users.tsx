import { useQueryClient } from '@tanstack/react-query';
import { PanelErrorBoundary } from '../../../components/errors/error-boundary';
import { PageHeader } from '../../../components/ui/page-header';
import { meQueryKey, useMe } from '../../../features/auth/api/get-me';
import { UsersTable } from '../../../features/admin-users/components/users-table';

export default function AdminUsersPage() {
  const me = useMe();
  const queryClient = useQueryClient();
  const currentUserId = me.data?.id;
  return (
    <section>
      <PageHeader
        title="Users and roles"
        description="Everyone who has signed in. A role change is saved at once; the last admin cannot be demoted."
      />
      <PanelErrorBoundary title="The users table">
        <UsersTable
          currentUserId={currentUserId}
          onRoleSaved={(user) => {
            // Changing one's own role changes what the header and navigation may show.
            if (user.id === currentUserId) void queryClient.invalidateQueries({ queryKey: meQueryKey });
          }}
        />
      </PanelErrorBoundary>
    </section>
  );
}
