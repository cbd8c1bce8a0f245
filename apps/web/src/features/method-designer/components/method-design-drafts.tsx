import { Anchor, Badge, Skeleton, Stack, Table, Text, Title } from '@mantine/core';
import { houseMethodPrefix } from '@limitbook/contracts';
import { Link } from 'react-router-dom';
import { PanelError } from '@/components/errors/panel-error';
import { paths } from '@/config/paths';
import { formatDateTime } from '@/lib/format';
import { useMethodDesigns } from '../api/get-method-designs';
import classes from './designer.module.css';

/** In-house methods with an open revision: drafts to finish and revisions waiting for review. */
export function MethodDesignDrafts() {
  const designs = useMethodDesigns();
  if (designs.isPending) return <Skeleton h={120} />;
  if (designs.isError) return <PanelError title="Open method revisions could not be loaded" error={designs.error} onRetry={() => void designs.refetch()} />;
  const open = designs.data.items.filter((design) => design.draft !== null);
  return (
    <section aria-labelledby="open-methods-title">
      <Title order={2} id="open-methods-title" size="h3" mb="xs">
        Open method revisions
      </Title>
      {open.length === 0 ? (
        <Text size="sm" c="dimmed">
          No in-house method is being drafted or reviewed.
        </Text>
      ) : (
        <Table verticalSpacing="xs" aria-label="Open method revisions" className={classes.sheet}>
          <Table.Thead>
            <Table.Tr>
              <Table.Th>Method</Table.Th>
              <Table.Th w={120}>State</Table.Th>
              <Table.Th w={120}>Released</Table.Th>
              <Table.Th w={200}>Last change</Table.Th>
              <Table.Th w={120} />
            </Table.Tr>
          </Table.Thead>
          <Table.Tbody>
            {open.map((design) => {
              const id = `${houseMethodPrefix}${design.slug}`;
              const inReview = design.draft?.state === 'in_review';
              return (
                <Table.Tr key={design.id}>
                  <Table.Td>
                    <Text size="sm" fw={600}>
                      {design.name}
                    </Text>
                    <Text className={classes.mono} c="dimmed">
                      {id}
                    </Text>
                  </Table.Td>
                  <Table.Td>
                    <Badge color={inReview ? 'blue' : 'gray'} variant="light" radius="xs" tt="none">
                      {inReview ? 'In review' : 'Draft'}
                    </Badge>
                  </Table.Td>
                  <Table.Td>
                    <Text size="sm">{design.latestVersion ? `v${design.latestVersion}` : 'Not yet'}</Text>
                  </Table.Td>
                  <Table.Td>
                    <Text size="sm">{formatDateTime(design.draft?.updatedAt)}</Text>
                  </Table.Td>
                  <Table.Td>
                    <Stack gap={2}>
                      <Anchor component={Link} to={paths.methods.design.getHref(id)} size="sm">
                        Open designer
                      </Anchor>
                      {inReview && (
                        <Anchor component={Link} to={paths.methods.review.getHref(id)} size="sm">
                          Review
                        </Anchor>
                      )}
                    </Stack>
                  </Table.Td>
                </Table.Tr>
              );
            })}
          </Table.Tbody>
        </Table>
      )}
    </section>
  );
}
