import { Badge, Button, Group, Select, Stack, Table, Text, Tooltip, VisuallyHidden } from '@mantine/core';
import { notifications } from '@mantine/notifications';
import { roleLabels, roleSchema, type User, type UserStatus } from '@limitbook/contracts';
import { useState } from 'react';
import { errorMessage } from '@/components/form/server-errors';
import { formatDateTime } from '@/lib/format';
import { useUpdateUser } from '../api/update-user';
import { ConfirmStatusModal } from './confirm-status-modal';
import { roleOptions } from './role-options';
import classes from './users-table.module.css';

const statusBadge: Record<UserStatus, { label: string; color: string }> = {
  active: { label: 'Active', color: 'verdigris' },
  invited: { label: 'Invited', color: 'amber' },
  deactivated: { label: 'Deactivated', color: 'gray' },
};

type Props = { users: User[]; currentUserId: string };

export function UsersTable({ users, currentUserId }: Props) {
  const update = useUpdateUser();
  const [pending, setPending] = useState<{ user: User; active: boolean } | null>(null);

  const changeRole = (user: User, value: string | null) => {
    const role = roleSchema.safeParse(value);
    if (!role.success || role.data === user.role) return;
    update.mutate(
      { id: user.id, changes: { role: role.data } },
      {
        onSuccess: () => notifications.show({ color: 'verdigris', message: `${user.name} is now ${roleLabels[role.data]}.` }),
        onError: (error) => notifications.show({ color: 'redline', title: 'Role not changed', message: errorMessage(error) }),
      },
    );
  };

  const confirmStatus = () => {
    if (!pending) return;
    const { user, active } = pending;
    update.mutate(
      { id: user.id, changes: { active } },
      {
        onSuccess: () => {
          notifications.show({ color: 'verdigris', message: active ? `${user.name} can sign in again.` : `${user.name} is deactivated.` });
          setPending(null);
        },
        onError: (error) => notifications.show({ color: 'redline', title: 'Status not changed', message: errorMessage(error) }),
      },
    );
  };

  return (
    <>
      <Table.ScrollContainer minWidth={760}>
        <Table className={classes.table} highlightOnHover>
          <Table.Thead>
            <Table.Tr>
              <Table.Th>Person</Table.Th>
              <Table.Th w={170}>Role</Table.Th>
              <Table.Th w={130}>Status</Table.Th>
              <Table.Th w={190}>Last sign-in</Table.Th>
              <Table.Th w={130}>
                <VisuallyHidden>Actions</VisuallyHidden>
              </Table.Th>
            </Table.Tr>
          </Table.Thead>
          <Table.Tbody>
            {users.map((user) => {
              const self = user.id === currentUserId;
              const status = statusBadge[user.status];
              const busy = update.isPending && update.variables?.id === user.id;
              return (
                <Table.Tr key={user.id}>
                  <Table.Td>
                    <Stack gap={0}>
                      <Text fw={600} size="sm">
                        {user.name}
                        {self && (
                          <Text span c="dimmed" fw={400} size="sm">
                            {' '}
                            (you)
                          </Text>
                        )}
                      </Text>
                      <Text size="xs" c="dimmed">
                        {user.email}
                      </Text>
                    </Stack>
                  </Table.Td>
                  <Table.Td>
                    <Tooltip label="You cannot change your own role" disabled={!self}>
                      <div>
                        <Select
                          aria-label={`Role of ${user.name}`}
                          size="xs"
                          data={roleOptions}
                          value={user.role}
                          allowDeselect={false}
                          disabled={self || busy || user.status === 'deactivated'}
                          onChange={(value) => changeRole(user, value)}
                        />
                      </div>
                    </Tooltip>
                  </Table.Td>
                  <Table.Td>
                    <Badge color={status.color}>{status.label}</Badge>
                  </Table.Td>
                  <Table.Td>
                    <Text size="sm" className={classes.numeric}>
                      {user.lastSignInAt ? formatDateTime(user.lastSignInAt) : user.status === 'invited' ? 'Not yet' : 'Never'}
                    </Text>
                  </Table.Td>
                  <Table.Td>
                    <Group justify="flex-end">
                      {!self && user.status !== 'deactivated' && (
                        <Button size="xs" variant="subtle" color="redline" onClick={() => setPending({ user, active: false })} aria-label={`Deactivate ${user.name}`}>
                          Deactivate
                        </Button>
                      )}
                      {!self && user.status === 'deactivated' && (
                        <Button size="xs" variant="subtle" onClick={() => setPending({ user, active: true })} aria-label={`Reactivate ${user.name}`}>
                          Reactivate
                        </Button>
                      )}
                    </Group>
                  </Table.Td>
                </Table.Tr>
              );
            })}
          </Table.Tbody>
        </Table>
      </Table.ScrollContainer>
      <ConfirmStatusModal
        user={pending?.user ?? null}
        active={pending?.active ?? false}
        loading={update.isPending}
        onCancel={() => setPending(null)}
        onConfirm={confirmStatus}
      />
    </>
  );
}
