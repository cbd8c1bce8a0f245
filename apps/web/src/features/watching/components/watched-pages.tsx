import { Anchor, Badge, Group, Skeleton, Table, Text } from '@mantine/core';
import { Link } from 'react-router-dom';
import { PanelError } from '@/components/errors/panel-error';
import { paths } from '@/config/paths';
import { formatDate } from '@/lib/format';
import { useWatchedPages } from '../api/get-watched-pages';

/** The pages the signed-in user watches, with their current release. */
export function WatchedPages() {
  const watched = useWatchedPages();
  if (watched.isPending) return <Skeleton h={80} />;
  if (watched.isError) return <PanelError error={watched.error} onRetry={() => void watched.refetch()} title="Watched pages could not be loaded" />;
  if (watched.data.items.length === 0) {
    return (
      <Text c="dimmed" size="sm">
        You watch no page yet. Use Watch on a standard to get a mail when a new revision is released.
      </Text>
    );
  }
  return (
    <Table verticalSpacing="xs" highlightOnHover aria-label="Watched pages">
      <Table.Thead>
        <Table.Tr>
          <Table.Th>Standard</Table.Th>
          <Table.Th>Collection</Table.Th>
          <Table.Th>Current revision</Table.Th>
        </Table.Tr>
      </Table.Thead>
      <Table.Tbody>
        {watched.data.items.map((page) => (
          <Table.Tr key={page.id}>
            <Table.Td>
              <Group gap="xs" wrap="nowrap">
                <Anchor component={Link} to={paths.standards.page.getHref(page.documentNumber)} ff="monospace" fw={700} size="sm">
                  {page.documentNumber}
                </Anchor>
                <Text size="sm">{page.title}</Text>
                {page.obsolete && (
                  <Badge color="redline" variant="light" radius="xs" size="sm">
                    Obsolete
                  </Badge>
                )}
              </Group>
            </Table.Td>
            <Table.Td>
              <Text size="sm">{page.collection.name}</Text>
            </Table.Td>
            <Table.Td>
              <Text size="sm">{page.revisionLetter ? `Rev. ${page.revisionLetter}, ${formatDate(page.releasedAt)}` : 'Not released yet'}</Text>
            </Table.Td>
          </Table.Tr>
        ))}
      </Table.Tbody>
    </Table>
  );
}
