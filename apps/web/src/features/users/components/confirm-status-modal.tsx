import { Button, Group, Modal, Text } from '@mantine/core';
import type { User } from '@limitbook/contracts';

type Props = { user: User | null; active: boolean; loading: boolean; onCancel: () => void; onConfirm: () => void };

export function ConfirmStatusModal({ user, active, loading, onCancel, onConfirm }: Props) {
  const verb = active ? 'Reactivate' : 'Deactivate';
  return (
    <Modal opened={user !== null} onClose={onCancel} title={user ? `${verb} ${user.name}?` : verb} size="sm">
      <Text size="sm">
        {active
          ? 'They can sign in again with their existing password, in the role shown in the list.'
          : 'They are signed out everywhere and cannot sign in until an admin reactivates them. Their pages, reviews and records stay.'}
      </Text>
      <Group justify="flex-end" mt="lg">
        <Button variant="default" onClick={onCancel}>
          Cancel
        </Button>
        <Button color={active ? 'ink' : 'redline'} loading={loading} onClick={onConfirm}>
          {verb}
        </Button>
      </Group>
    </Modal>
  );
}
