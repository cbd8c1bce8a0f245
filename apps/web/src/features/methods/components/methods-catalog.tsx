import { Anchor, Badge, Button, Group, SegmentedControl, Skeleton, Stack, Table, Text, TextInput } from '@mantine/core';
import type { MethodSummary } from '@limitbook/contracts';
import { IconPlus, IconSearch } from '@tabler/icons-react';
import { useQueries } from '@tanstack/react-query';
import { Link, useSearchParams } from 'react-router-dom';
import { useMethods } from '@/components/calculator';
import { PanelError } from '@/components/errors/panel-error';
import { PageHeader } from '@/components/layout/page-header';
import { paths } from '@/config/paths';
import { getMethodDetailQueryOptions } from '../api/get-method-detail';
import { filterMethods, methodSource, shortDescription, type SourceFilter } from '../lib/catalog-filter';
import { pageCount } from '../lib/usage';
import classes from './methods.module.css';

const sourceOptions = [
  { value: 'all', label: 'All' },
  { value: 'built-in', label: 'Built-in' },
  { value: 'in-house', label: 'In-house' },
];

export function SourceBadge({ method }: { method: Pick<MethodSummary, 'id' | 'source'> }) {
  const source = methodSource(method);
  return (
    <Badge variant={source === 'in-house' ? 'light' : 'outline'} color={source === 'in-house' ? 'verdigris' : 'gray'} radius="xs" tt="none">
      {source === 'in-house' ? 'In-house' : 'Built-in'}
    </Badge>
  );
}

function UsageCell({ state }: { state: { isPending: boolean; isError: boolean; count: number | null } }) {
  if (state.isPending) return <Skeleton h={14} w={60} />;
  if (state.isError || state.count === null) return <Text size="sm" c="dimmed">—</Text>;
  return (
    <Text size="sm" c={state.count === 0 ? 'dimmed' : undefined}>
      {state.count === 0 ? 'Not used yet' : `${state.count} ${state.count === 1 ? 'page' : 'pages'}`}
    </Text>
  );
}

type Props = { canDesign: boolean };

/** Every method the server runs, built-in and in-house, filtered by source and text. */
export function MethodsCatalog({ canDesign }: Props) {
  const [params, setParams] = useSearchParams();
  const source = (['built-in', 'in-house'].includes(params.get('kind') ?? '') ? params.get('kind') : 'all') as SourceFilter;
  const text = params.get('q') ?? '';
  const methods = useMethods();
  const items = methods.data?.items ?? [];
  const shown = filterMethods(items, { source, text });
  const usage = useQueries({
    queries: shown.map((method) => getMethodDetailQueryOptions(method.id)),
    combine: (results) => results.map((result) => ({ isPending: result.isPending, isError: result.isError, count: result.data ? pageCount(result.data.usages) : null })),
  });

  const setParam = (key: string, value: string) => {
    const next = new URLSearchParams(params);
    if (value && value !== 'all') next.set(key, value);
    else next.delete(key);
    setParams(next, { replace: true });
  };

  return (
    <Stack gap="lg">
      <PageHeader
        eyebrow="Methods"
        title="Method catalog"
        description="The computations behind every calculator block: the built-in methods of the trade and the formula methods your team designed, reviewed and released."
        actions={
          canDesign && (
            <Button component={Link} to={paths.methods.create.getHref()} leftSection={<IconPlus size={16} />}>
              New method
            </Button>
          )
        }
      />

      <Group gap="md" align="flex-end" wrap="wrap">
        <TextInput
          label="Find a method"
          placeholder="Title, id, reference…"
          leftSection={<IconSearch size={16} />}
          value={text}
          onChange={(event) => setParam('q', event.currentTarget.value)}
          w={320}
        />
        <div>
          <Text component="span" size="sm" fw={500} id="method-source-label" display="block" mb={4}>
            Kind
          </Text>
          <SegmentedControl aria-labelledby="method-source-label" data={sourceOptions} value={source} onChange={(value) => setParam('kind', value)} />
        </div>
      </Group>

      {methods.isPending ? (
        <Skeleton h={320} />
      ) : methods.isError ? (
        <PanelError title="The method catalog could not be loaded" error={methods.error} onRetry={() => void methods.refetch()} />
      ) : shown.length === 0 ? (
        <Text c="dimmed">{items.length === 0 ? 'The server lists no methods.' : 'No method matches these filters.'}</Text>
      ) : (
        <Table.ScrollContainer minWidth={760}>
          <Table className={classes.catalog} verticalSpacing="sm" aria-label="Methods">
            <Table.Thead>
              <Table.Tr>
                <Table.Th>Method</Table.Th>
                <Table.Th w={110}>Kind</Table.Th>
                <Table.Th w={80}>Version</Table.Th>
                <Table.Th w={240}>References</Table.Th>
                <Table.Th w={120}>Used on</Table.Th>
              </Table.Tr>
            </Table.Thead>
            <Table.Tbody>
              {shown.map((method, index) => (
                <Table.Tr key={method.id} data-method={method.id}>
                  <Table.Td>
                    <Anchor component={Link} to={paths.methods.method.getHref(method.id)} className={classes.methodTitle}>
                      {method.title}
                    </Anchor>
                    <Text className={classes.methodId}>{method.id}</Text>
                    {method.description && (
                      <Text size="sm" c="gray.7" mt={2}>
                        {shortDescription(method.description)}
                      </Text>
                    )}
                  </Table.Td>
                  <Table.Td>
                    <SourceBadge method={method} />
                  </Table.Td>
                  <Table.Td className={classes.numeric}>v{method.version}</Table.Td>
                  <Table.Td>
                    {method.references.length === 0 ? (
                      <Text size="sm" c="dimmed">
                        —
                      </Text>
                    ) : (
                      <Text size="sm" lineClamp={2} title={method.references.join('\n')}>
                        {method.references[0]}
                        {method.references.length > 1 && <span className={classes.more}> +{method.references.length - 1}</span>}
                      </Text>
                    )}
                  </Table.Td>
                  <Table.Td>
                    <UsageCell state={usage[index] ?? { isPending: true, isError: false, count: null }} />
                  </Table.Td>
                </Table.Tr>
              ))}
            </Table.Tbody>
          </Table>
        </Table.ScrollContainer>
      )}
    </Stack>
  );
}
