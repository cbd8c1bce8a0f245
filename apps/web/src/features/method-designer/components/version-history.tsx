import { Anchor, Badge, Button, Group, Modal, Skeleton, Stack, Table, Text, Title } from '@mantine/core';
import { notifications } from '@mantine/notifications';
import { houseMethodPrefix } from '@limitbook/contracts';
import { IconRestore } from '@tabler/icons-react';
import { useState } from 'react';
import { Link, useNavigate } from 'react-router-dom';
import { PanelError } from '@/components/errors/panel-error';
import { errorMessage } from '@/components/form/server-errors';
import { paths } from '@/config/paths';
import { formatDateTime } from '@/lib/format';
import { useMethodVersions } from '../api/get-method-versions';
import { useRestoreMethodVersion } from '../api/restore-method-version';
import classes from './designer.module.css';

const stateLabels = { draft: 'Draft', in_review: 'In review', released: 'Released', superseded: 'Superseded' } as const;
const stateColors = { draft: 'gray', in_review: 'blue', released: 'verdigris', superseded: 'gray' } as const;

/** Every version of an in-house method, newest first, with compare links and (admins) restore. */
export function VersionHistory({ slug, canRestore }: { slug: string; canRestore: boolean }) {
  const navigate = useNavigate();
  const methodId = `${houseMethodPrefix}${slug}`;
  const versions = useMethodVersions(slug);
  const restore = useRestoreMethodVersion(slug);
  const [restoring, setRestoring] = useState<number | null>(null);

  const confirmRestore = () => {
    if (restoring === null) return;
    restore.mutate(restoring, {
      onSuccess: () => {
        notifications.show({ color: 'verdigris', title: `v${restoring} restored`, message: 'It is the new draft; it goes through review before release.' });
        setRestoring(null);
        navigate(paths.methods.design.getHref(methodId));
      },
    });
  };

  return (
    <section className={classes.sheet} aria-labelledby="history-title">
      <Title order={2} id="history-title" className={classes.sectionTitle} mb="sm">
        Version history
      </Title>
      {versions.isPending ? (
        <Skeleton h={100} />
      ) : versions.isError ? (
        <PanelError title="The version history could not be loaded" error={versions.error} onRetry={() => void versions.refetch()} />
      ) : (
        <Table.ScrollContainer minWidth={640}>
          <Table verticalSpacing={6} aria-label="Versions">
            <Table.Thead>
              <Table.Tr>
                <Table.Th w={90}>Version</Table.Th>
                <Table.Th w={120}>State</Table.Th>
                <Table.Th>Name</Table.Th>
                <Table.Th w={220}>Released</Table.Th>
                <Table.Th w={200} />
              </Table.Tr>
            </Table.Thead>
            <Table.Tbody>
              {versions.data.items.map((entry, index) => {
                const older = versions.data.items.slice(index + 1).find((item) => item.methodVersion !== null);
                const self = entry.methodVersion !== null ? String(entry.methodVersion) : 'draft';
                return (
                  <Table.Tr key={entry.id}>
                    <Table.Td className={classes.numeric}>{entry.methodVersion !== null ? `v${entry.methodVersion}` : '—'}</Table.Td>
                    <Table.Td>
                      <Badge color={stateColors[entry.state]} variant="light" radius="xs" tt="none">
                        {stateLabels[entry.state]}
                      </Badge>
                    </Table.Td>
                    <Table.Td>
                      <Text size="sm">{entry.name}</Text>
                      {entry.restoredFromVersion !== null && (
                        <Text size="xs" c="dimmed">
                          Restored from v{entry.restoredFromVersion}
                        </Text>
                      )}
                    </Table.Td>
                    <Table.Td>
                      <Text size="sm">
                        {entry.releasedAt ? formatDateTime(entry.releasedAt) : '—'}
                        {entry.approvedBy ? `, approved by ${entry.approvedBy.name}` : ''}
                      </Text>
                    </Table.Td>
                    <Table.Td>
                      <Group gap="sm" justify="flex-end">
                        {older?.methodVersion && (
                          <Anchor component={Link} size="sm" to={paths.methods.compare.getHref(methodId, String(older.methodVersion), self)}>
                            Compare with v{older.methodVersion}
                          </Anchor>
                        )}
                        {canRestore && entry.methodVersion !== null && entry.state === 'superseded' && (
                          <Button size="compact-xs" variant="default" leftSection={<IconRestore size={12} />} onClick={() => setRestoring(entry.methodVersion)}>
                            Restore
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
      )}
      <Modal opened={restoring !== null} onClose={() => setRestoring(null)} title={`Restore v${restoring ?? ''} into a new draft?`}>
        <Stack gap="md">
          <Text size="sm">The old definition and test table become the method&rsquo;s draft. Readers keep the current release until the draft is reviewed and approved.</Text>
          {restore.isError && (
            <Text size="sm" c="redline.7" role="alert">
              {errorMessage(restore.error)}
            </Text>
          )}
          <Group justify="flex-end">
            <Button variant="default" onClick={() => setRestoring(null)}>
              Cancel
            </Button>
            <Button onClick={confirmRestore} loading={restore.isPending}>
              Restore as draft
            </Button>
          </Group>
        </Stack>
      </Modal>
    </section>
  );
}
