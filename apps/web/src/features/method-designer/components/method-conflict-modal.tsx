import { Button, Group, Modal, Stack, Text } from '@mantine/core';
import { formatDateTime } from '@/lib/format';
import type { MethodConflict } from '../hooks/use-method-draft-session';

type Props = { conflict: MethodConflict | null; onReload: () => void; onKeepMine: () => void };

/** A save refused because someone saved the method's draft first: the author decides which copy wins. */
export function MethodConflictModal({ conflict, onReload, onKeepMine }: Props) {
  const latest = conflict?.latest;
  return (
    <Modal opened={!!conflict} onClose={() => {}} withCloseButton={false} closeOnClickOutside={false} closeOnEscape={false} title="Someone else saved this method">
      <Stack gap="md">
        <Text size="sm">
          {latest
            ? `While you were editing, the draft was saved again: it is now version ${latest.version}, saved ${formatDateTime(latest.updatedAt)}${latest.updatedBy ? ` by ${latest.updatedBy.name}` : ''}. Your changes are not saved yet.`
            : conflict?.message}
        </Text>
        <Stack gap={6}>
          <Text size="sm">
            <b>Reload the latest</b> replaces your copy with the version on the server; your unsaved changes are lost.
          </Text>
          <Text size="sm">
            <b>Keep my copy</b> leaves your definition as it is; your next save replaces theirs.
          </Text>
        </Stack>
        <Group justify="flex-end">
          <Button variant="default" onClick={onKeepMine}>
            Keep my copy
          </Button>
          <Button onClick={onReload}>Reload the latest</Button>
        </Group>
      </Stack>
    </Modal>
  );
}
