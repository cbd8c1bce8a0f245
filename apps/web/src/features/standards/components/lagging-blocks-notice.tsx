import { Alert, Anchor, Button, Group, List, Stack, Text } from '@mantine/core';
import { notifications } from '@mantine/notifications';
import type { LaggingBlock, Page } from '@limitbook/contracts';
import { IconArrowForwardUp } from '@tabler/icons-react';
import { useState } from 'react';
import { useNavigate } from 'react-router-dom';
import { useMethods } from '@/components/calculator';
import { useMoveBlocksForward } from '@/components/calculator/api/move-blocks-forward';
import { paths } from '@/config/paths';
import { isApiError } from '@/lib/api-client';
import { canAccess } from '@/lib/authorization';
import { useSessionUser } from '@/lib/session';
import { getLaggingBlocksQueryOptions, useLaggingBlocks } from '../api/get-lagging-blocks';

/** The server's message and, for a refused block, what it said about that block. */
function problemLines(error: unknown): string[] {
  if (!isApiError(error)) return [error instanceof Error && error.message ? error.message : 'Something went wrong. Try again.'];
  return [error.message, ...Object.values(error.fields)];
}

/**
 * For authors and admins: the page's calculator blocks pinned to an older release of their method,
 * each with a way to pin it to the latest one in the page's draft (which then goes through review).
 */
export function LaggingBlocksNotice({ page }: { page: Page }) {
  const editor = canAccess(useSessionUser().role, 'standards.edit');
  const lagging = useLaggingBlocks(page.id, { enabled: editor });
  const methods = useMethods();
  const navigate = useNavigate();
  const move = useMoveBlocksForward([getLaggingBlocksQueryOptions(page.id).queryKey, ['page']]);
  // Which button started the move: one block's id, or 'all'.
  const [pending, setPending] = useState<string | null>(null);

  if (!editor || !lagging.data || lagging.data.items.length === 0) return null;
  const items = lagging.data.items;
  const inReview = page.draft?.state === 'in_review';
  const editorHref = paths.standards.edit.getHref(page.documentNumber);

  const run = (key: string, blocks: LaggingBlock[]) => {
    setPending(key);
    move.mutate(
      { pageId: page.id, blockIds: blocks.map((block) => block.blockId) },
      {
        onSuccess: (result) => {
          const notificationId = `blocks-moved-${result.revisionId}-${result.version}`;
          notifications.show({
            id: notificationId,
            color: 'verdigris',
            title: result.moved.length === 1 ? 'Block moved forward in the draft' : `${result.moved.length} blocks moved forward in the draft`,
            message: (
              <Text size="sm">
                {result.moved.map((entry) => `v${entry.from} → v${entry.to}`).join(', ')} (draft version {result.version}). Check the results and submit the draft for review
                to release it.{' '}
                <Anchor
                  href={editorHref}
                  onClick={(event) => {
                    event.preventDefault();
                    notifications.hide(notificationId);
                    navigate(editorHref);
                  }}
                >
                  Open the draft
                </Anchor>
              </Text>
            ),
          });
        },
        onSettled: () => setPending(null),
      },
    );
  };

  return (
    <Alert color="amber" variant="light" icon={<IconArrowForwardUp size={18} />} mb="md" role="note" data-testid="lagging-blocks" title={items.length === 1 ? 'A calculator pins an older method version' : `${items.length} calculators pin an older method version`}>
      <Stack gap="xs">
        <Text size="sm">
          {lagging.data.state === 'released'
            ? 'The released text uses these versions. Moving forward changes them in a new draft, which goes through review.'
            : 'The open draft uses these versions. Moving forward changes them in that draft.'}
        </Text>
        <List size="sm" spacing={4} listStyleType="none" ml={0}>
          {items.map((block) => (
            <List.Item key={block.blockId}>
              <Group gap="xs" wrap="wrap">
                <Text size="sm" fw={600}>
                  {block.caption || 'Untitled calculator'}
                </Text>
                <Text size="sm" c="dimmed">
                  {methods.byId(block.method)?.title ?? block.method}: pinned v{block.pinnedVersion} → latest v{block.latestVersion}
                </Text>
                <Button size="compact-xs" variant="default" disabled={inReview || (move.isPending && pending !== block.blockId)} loading={pending === block.blockId} onClick={() => run(block.blockId, [block])} aria-label={`Move ${block.caption || 'calculator'} forward to v${block.latestVersion}`}>
                  Move forward
                </Button>
              </Group>
            </List.Item>
          ))}
        </List>
        {items.length > 1 && (
          <Group>
            <Button size="xs" color="amber" disabled={inReview || (move.isPending && pending !== 'all')} loading={pending === 'all'} onClick={() => run('all', items)}>
              Move all forward
            </Button>
          </Group>
        )}
        {inReview && (
          <Text size="sm" c="amber.9">
            The page has a revision in review. Withdraw it to draft, or wait for the reviewer, before moving blocks forward.
          </Text>
        )}
        {move.isError && (
          <Alert color="redline" variant="outline" title="Not moved forward" role="alert" p="xs">
            {problemLines(move.error).map((line, index) => (
              <Text key={index} size="sm">
                {line}
              </Text>
            ))}
          </Alert>
        )}
      </Stack>
    </Alert>
  );
}
