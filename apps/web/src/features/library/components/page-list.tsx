import { Anchor, Badge, Group, Table, Text } from '@mantine/core';
import { useMediaQuery } from '@mantine/hooks';
import type { PageSummary } from '@limitbook/contracts';
import { Link } from 'react-router-dom';
import { paths } from '@/config/paths';
import { formatDate } from '@/lib/format';
import classes from './library.module.css';

function Tags({ tags, max = 4 }: { tags: string[]; max?: number }) {
  if (tags.length === 0) return null;
  return (
    <Group gap={4} wrap="wrap">
      {tags.slice(0, max).map((tag) => (
        <Badge key={tag} variant="light" color="gray" radius="xs" className={classes.tag} component={Link} to={paths.library.tagged.getHref(tag)}>
          {tag}
        </Badge>
      ))}
      {tags.length > max && (
        <Text size="xs" c="dimmed">
          +{tags.length - max}
        </Text>
      )}
    </Group>
  );
}

export { Tags };

/** Standards as a table on wide screens and a list of entries on phones. */
export function PageList({ pages, showCollection = false, label }: { pages: PageSummary[]; showCollection?: boolean; label: string }) {
  const phone = useMediaQuery('(max-width: 48em)', false, { getInitialValueInEffect: false });

  if (phone) {
    return (
      <ul className={classes.cardList} aria-label={label}>
        {pages.map((page) => (
          <li key={page.id} className={classes.pageCard}>
            <Text className={classes.docNumber}>{page.documentNumber}</Text>
            <Anchor component={Link} to={paths.standards.page.getHref(page.documentNumber)} className={classes.pageTitle}>
              {page.title}
            </Anchor>
            <Text size="xs" c="dimmed">
              {showCollection ? `${page.collection.name} · ` : ''}Released {formatDate(page.publishedAt ?? page.updatedAt)}
            </Text>
            <Tags tags={page.tags} max={3} />
          </li>
        ))}
      </ul>
    );
  }

  return (
    <Table.ScrollContainer minWidth={640}>
      <Table highlightOnHover className={classes.pageTable} aria-label={label}>
        <Table.Thead>
          <Table.Tr>
            <Table.Th w={130}>Number</Table.Th>
            <Table.Th>Title</Table.Th>
            {showCollection && <Table.Th>Collection</Table.Th>}
            <Table.Th>Tags</Table.Th>
            <Table.Th w={120}>Released</Table.Th>
          </Table.Tr>
        </Table.Thead>
        <Table.Tbody>
          {pages.map((page) => (
            <Table.Tr key={page.id}>
              <Table.Td className={classes.docNumber}>{page.documentNumber}</Table.Td>
              <Table.Td>
                <Anchor component={Link} to={paths.standards.page.getHref(page.documentNumber)} className={classes.pageTitle}>
                  {page.title}
                </Anchor>
                {page.owner && (
                  <Text size="xs" c="dimmed">
                    Owner {page.owner.name}
                  </Text>
                )}
              </Table.Td>
              {showCollection && (
                <Table.Td>
                  <Anchor component={Link} to={paths.library.collection.getHref(page.collection.key)} size="sm" c="gray.8">
                    {page.collection.name}
                  </Anchor>
                </Table.Td>
              )}
              <Table.Td>
                <Tags tags={page.tags} />
              </Table.Td>
              <Table.Td className={classes.date}>{formatDate(page.publishedAt ?? page.updatedAt)}</Table.Td>
            </Table.Tr>
          ))}
        </Table.Tbody>
      </Table>
    </Table.ScrollContainer>
  );
}
