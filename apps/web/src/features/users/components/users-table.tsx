import { Badge, Button, Group, Paper, Select, Stack, Table, Text, Tooltip, VisuallyHidden } from '@mantine/core';
import { useMediaQuery } from '@mantine/hooks';
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
  const narrow = useMediaQuery('(max-width: 48em)', false, { getInitialValueInEffect: false });

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

  const cells = (user: User) => {
    const self = user.id === currentUserId;
    const status = statusBadge[user.status];
    const busy = update.isPending && update.variables?.id === user.id;
    return {
      person: (
        <Stack gap={0} miw={0}>
          <Text fw={600} size="sm">
            {user.name}
            {self && (
              <Text span c="dimmed" fw={400} size="sm">
                {' '}
                (you)
              </Text>
            )}
          </Text>
          <Text size="xs" c="dimmed" className={classes.email}>
            {user.email}
          </Text>
        </Stack>
      ),
      role: (
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
      ),
      status: <Badge color={status.color}>{status.label}</Badge>,
      lastSignIn: (
        <Text size="sm" className={classes.numeric}>
          {user.lastSignInAt ? formatDateTime(user.lastSignInAt) : user.status === 'invited' ? 'Not yet' : 'Never'}
        </Text>
      ),
      action: self ? null : user.status === 'deactivated' ? (
        <Button size="xs" variant="subtle" onClick={() => setPending({ user, active: true })} aria-label={`Reactivate ${user.name}`}>
          Reactivate
        </Button>
      ) : (
        <Button size="xs" variant="subtle" color="redline" onClick={() => setPending({ user, active: false })} aria-label={`Deactivate ${user.name}`}>
          Deactivate
        </Button>
      ),
    };
  };

  const list = narrow ? (
    <Stack gap="sm" component="ul" className={classes.cards} aria-label="Users">
      {users.map((user) => {
        const cell = cells(user);
        return (
          <Paper component="li" key={user.id} p="md" className={classes.card}>
            <Group justify="space-between" align="flex-start" wrap="nowrap" gap="sm">
              {cell.person}
              {cell.status}
            </Group>
            <Group justify="space-between" align="flex-end" mt="sm" gap="sm">
              <div className={classes.cardRole}>{cell.role}</div>
              {cell.action}
            </Group>
            <Text size="xs" c="dimmed" mt={8}>
              Last sign-in:{' '}
              {user.lastSignInAt ? formatDateTime(user.lastSignInAt) : user.status === 'invited' ? 'not yet' : 'never'}
            </Text>
          </Paper>
        );
      })}
    </Stack>
  ) : (
    <Paper className={classes.frame}>
      <Table.ScrollContainer minWidth={760} type="native">
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
              const cell = cells(user);
              return (
                <Table.Tr key={user.id}>
                  <Table.Td>{cell.person}</Table.Td>
                  <Table.Td>{cell.role}</Table.Td>
                  <Table.Td>{cell.status}</Table.Td>
                  <Table.Td>{cell.lastSignIn}</Table.Td>
                  <Table.Td>
                    <Group justify="flex-end">{cell.action}</Group>
                  </Table.Td>
                </Table.Tr>
              );
            })}
          </Table.Tbody>
        </Table>
      </Table.ScrollContainer>
    </Paper>
  );

  return (
    <>
      {list}
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
