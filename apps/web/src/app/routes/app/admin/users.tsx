import { Button, Skeleton, Stack, Text } from '@mantine/core';
import { useDisclosure, useDocumentTitle } from '@mantine/hooks';
import { IconUserPlus } from '@tabler/icons-react';
import { PanelError } from '@/components/errors/panel-error';
import { PageHeader } from '@/components/layout/page-header';
import { useUsers } from '@/features/users/api/get-users';
import { InviteUserModal } from '@/features/users/components/invite-user-modal';
import { UsersTable } from '@/features/users/components/users-table';
import { useSessionUser } from '@/lib/session';

export function UsersRoute() {
  useDocumentTitle('Users · Limitbook');
  const me = useSessionUser();
  const users = useUsers();
  const [inviting, invite] = useDisclosure(false);

  return (
    <>
      <PageHeader
        eyebrow="Admin"
        title="Users"
        description="Who can sign in, and what each person may do."
        actions={
          <Button leftSection={<IconUserPlus size={18} />} onClick={invite.open}>
            Invite user
          </Button>
        }
      />
      {users.isPending ? (
        <Stack gap={6} aria-busy="true">
          {[0, 1, 2, 3].map((row) => (
            <Skeleton key={row} h={52} />
          ))}
        </Stack>
      ) : users.isError ? (
        <PanelError error={users.error} onRetry={() => void users.refetch()} title="Users could not be loaded" />
      ) : (
        <>
          <UsersTable users={users.data.items} currentUserId={me.id} />
          <Text size="sm" c="dimmed" mt="sm">
            {users.data.items.length < users.data.total
              ? `Showing ${users.data.items.length} of ${users.data.total} people.`
              : users.data.total === 1
                ? '1 person'
                : `${users.data.total} people`}
          </Text>
        </>
      )}
      <InviteUserModal opened={inviting} onClose={invite.close} />
    </>
  );
}
