import { Button, Group, Modal, ScrollArea, Stack, Text } from '@mantine/core';
import { extractText } from '@limitbook/editor-schema';
import type { Page } from '@limitbook/contracts';
import type { JSONContent } from '@tiptap/core';
import { useState } from 'react';
import { formatRelative } from '../lib/format-time';
import classes from './page-editor.module.css';

type Props = {
  conflict: { message: string; latest: Page | null } | null;
  onReload: () => void;
  onKeepMine: () => void;
};

/** A save refused because someone else saved first: the author decides which copy wins. */
export function ConflictModal({ conflict, onReload, onKeepMine }: Props) {
  const [showLatest, setShowLatest] = useState(false);
  const latest = conflict?.latest?.revision;
  const by = latest?.createdBy?.name;

  return (
    <Modal
      opened={!!conflict}
      onClose={() => {}}
      withCloseButton={false}
      closeOnClickOutside={false}
      closeOnEscape={false}
      title="Someone else saved this draft"
      size="lg"
    >
      <Stack gap="md">
        {latest ? (
          <Text size="sm">
            While you were editing, the draft was saved again: it is now version {latest.version}, titled &ldquo;{latest.title}&rdquo;, saved{' '}
            {formatRelative(latest.updatedAt)}
            {by ? ` (draft started by ${by})` : ''}. Your changes are not saved yet.
          </Text>
        ) : (
          <Text size="sm">{conflict?.message}</Text>
        )}
        {latest && (
          <div>
            <Button variant="subtle" size="compact-sm" onClick={() => setShowLatest((open) => !open)} aria-expanded={showLatest}>
              {showLatest ? 'Hide the latest version' : 'Show the latest version'}
            </Button>
            {showLatest && (
              <ScrollArea.Autosize mah={260} mt="xs" className={classes.latestText} aria-label="Text of the latest version">
                <Text size="sm" style={{ whiteSpace: 'pre-wrap' }}>
                  {extractText(latest.document as JSONContent) || 'The latest version has no text.'}
                </Text>
              </ScrollArea.Autosize>
            )}
          </div>
        )}
        <Stack gap={6}>
          <Text size="sm">
            <b>Reload the latest</b> replaces your copy with the version on the server; your unsaved changes are lost.
          </Text>
          <Text size="sm">
            <b>Keep my copy</b> leaves your text as it is; your next save replaces their version.
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
