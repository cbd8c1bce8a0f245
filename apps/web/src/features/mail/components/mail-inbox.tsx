import { Button, Group, Paper, Skeleton, Stack, Text } from '@mantine/core';
import { IconMailOff, IconRefresh } from '@tabler/icons-react';
import { useSearchParams } from 'react-router-dom';
import { ErrorBoundary } from '@/components/errors/error-boundary';
import { PanelError } from '@/components/errors/panel-error';
import { useMails } from '../api/get-mails';
import { MailList } from './mail-list';
import { MailReader } from './mail-reader';
import classes from './mail-inbox.module.css';

export function MailInbox() {
  const [params, setParams] = useSearchParams();
  const selectedId = params.get('id');
  const mails = useMails();
  const select = (id: string | null) => setParams(id ? { id } : {}, { replace: false });

  if (mails.isPending) {
    return (
      <Stack gap="xs" aria-busy="true">
        {[0, 1, 2].map((row) => (
          <Skeleton key={row} h={56} />
        ))}
      </Stack>
    );
  }
  if (mails.isError) return <PanelError error={mails.error} onRetry={() => void mails.refetch()} title="Captured mail could not be loaded" />;

  const items = mails.data.items;
  return (
    <div className={classes.layout} data-has-selection={selectedId ? true : undefined}>
      <Paper className={classes.listPane}>
        <Group justify="space-between" px="md" py="xs" className={classes.listHeader}>
          <Text size="sm" c="dimmed">
            {items.length < mails.data.total
              ? `Newest ${items.length} of ${mails.data.total} messages`
              : mails.data.total === 1
                ? '1 message'
                : `${mails.data.total} messages`}
          </Text>
          <Button variant="subtle" size="compact-sm" leftSection={<IconRefresh size={14} />} loading={mails.isFetching} onClick={() => void mails.refetch()}>
            Refresh
          </Button>
        </Group>
        {items.length === 0 ? (
          <Stack align="center" gap={6} p="xl" ta="center">
            <IconMailOff size={28} stroke={1.5} color="var(--mantine-color-gray-5)" aria-hidden />
            <Text fw={600}>No mail captured yet</Text>
            <Text size="sm" c="dimmed">
              Invitations and password resets sent by Limitbook show up here.
            </Text>
          </Stack>
        ) : (
          <MailList mails={items} selectedId={selectedId} onSelect={select} />
        )}
      </Paper>
      <Paper className={classes.readerPane}>
        {selectedId ? (
          <ErrorBoundary resetKeys={[selectedId]} fallback={({ error }) => <PanelError error={error} />}>
            <MailReader id={selectedId} onBack={() => select(null)} />
          </ErrorBoundary>
        ) : (
          <Stack align="center" justify="center" h="100%" mih={240} p="xl" ta="center" gap={4}>
            <Text fw={600}>Select a message</Text>
            <Text size="sm" c="dimmed">
              Its text appears here, with links you can follow.
            </Text>
          </Stack>
        )}
      </Paper>
    </div>
  );
}
