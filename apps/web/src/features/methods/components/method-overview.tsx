import { Alert, Anchor, Badge, Breadcrumbs, Button, Group, List, Skeleton, Stack, Table, Text, Title, Tooltip } from '@mantine/core';
import { notifications } from '@mantine/notifications';
import type { DesignTestRow, MethodCatalogDetail, MethodSummary, MethodUsage } from '@limitbook/contracts';
import { IconArrowForwardUp, IconShieldExclamation } from '@tabler/icons-react';
import { useState, type ReactNode } from 'react';
import { Link } from 'react-router-dom';
import { describeInputs, formatNumber, type Field } from '@/components/calculator';
import { useMoveBlocksForward } from '@/components/calculator/api/move-blocks-forward';
import { PanelError } from '@/components/errors/panel-error';
import { errorMessage } from '@/components/form/server-errors';
import { paths } from '@/config/paths';
import { getMethodDetailQueryOptions, useMethodDetail } from '../api/get-method-detail';
import { methodSource } from '../lib/catalog-filter';
import { laggingUsages } from '../lib/usage';
import { SourceBadge } from './methods-catalog';
import classes from './methods.module.css';

const stateLabels = { draft: 'Draft', in_review: 'In review', released: 'Released', superseded: 'Superseded' } as const;

function flatten(fields: readonly Field[]): Field[] {
  return fields.flatMap((field) => (field.kind === 'object' ? flatten(field.fields) : [field]));
}

function Section({ title, children, id }: { title: string; children: ReactNode; id: string }) {
  return (
    <section aria-labelledby={id} className={classes.sheet}>
      <Title order={2} id={id} className={classes.sectionTitle}>
        {title}
      </Title>
      {children}
    </section>
  );
}

function InputsAndOutputs({ method }: { method: MethodSummary }) {
  const inputs = flatten(describeInputs(method.inputSchema, method.id));
  return (
    <Stack gap="md">
      <Table verticalSpacing={6} aria-label="Inputs">
        <Table.Thead>
          <Table.Tr>
            <Table.Th>Input</Table.Th>
            <Table.Th>What it is</Table.Th>
            <Table.Th w={110}>Required</Table.Th>
          </Table.Tr>
        </Table.Thead>
        <Table.Tbody>
          {inputs.map((field) => (
            <Table.Tr key={field.path}>
              <Table.Td>
                <Text size="sm" fw={600}>
                  {field.label}
                </Text>
                <Text className={classes.mono}>{field.path}</Text>
              </Table.Td>
              <Table.Td>
                <Text size="sm">
                  {field.kind === 'number' && field.length ? (field.description ? `${field.description} (length, mm or inch)` : 'A length, in mm or inch') : (field.description ?? '—')}
                </Text>
              </Table.Td>
              <Table.Td>
                <Text size="sm">{field.required && !field.nullable ? 'Yes' : 'No'}</Text>
              </Table.Td>
            </Table.Tr>
          ))}
        </Table.Tbody>
      </Table>
      <Table verticalSpacing={6} aria-label="Outputs">
        <Table.Thead>
          <Table.Tr>
            <Table.Th>Output</Table.Th>
            <Table.Th>What it is</Table.Th>
            <Table.Th w={110}>Kind</Table.Th>
          </Table.Tr>
        </Table.Thead>
        <Table.Tbody>
          {method.outputs.map((output) => (
            <Table.Tr key={output.name}>
              <Table.Td>
                <Text size="sm" fw={600}>
                  {output.label}
                </Text>
                <Text className={classes.mono}>{output.name}</Text>
              </Table.Td>
              <Table.Td>
                <Text size="sm">{output.description || '—'}</Text>
              </Table.Td>
              <Table.Td>
                <Text size="sm">{output.kind}</Text>
              </Table.Td>
            </Table.Tr>
          ))}
        </Table.Tbody>
      </Table>
    </Stack>
  );
}

/** The released version's test table, read-only. */
/** Name = value pairs that wrap between pairs, never inside one. */
function Assignments({ items, empty }: { items: string[]; empty: string }) {
  if (items.length === 0) return <Text size="sm">{empty}</Text>;
  return (
    <Text size="sm" component="div" className={classes.assignments}>
      {items.map((item) => (
        <span key={item}>{item}</span>
      ))}
    </Text>
  );
}

export function ReleasedTests({ tests }: { tests: readonly DesignTestRow[] }) {
  if (tests.length === 0) return <Text size="sm" c="dimmed">This version has no test rows.</Text>;
  return (
    <Table.ScrollContainer minWidth={560}>
      <Table withTableBorder verticalSpacing={6} aria-label="Test table">
        <Table.Thead>
          <Table.Tr>
            <Table.Th w={40}>#</Table.Th>
            <Table.Th w="26%">Case</Table.Th>
            <Table.Th>Inputs</Table.Th>
            <Table.Th>Expected</Table.Th>
            <Table.Th w={90}>Verdict</Table.Th>
          </Table.Tr>
        </Table.Thead>
        <Table.Tbody>
          {tests.map((row, index) => (
            <Table.Tr key={index}>
              <Table.Td className={classes.numeric}>{index + 1}</Table.Td>
              <Table.Td>
                <Text size="sm">{row.label || '—'}</Text>
              </Table.Td>
              <Table.Td>
                <Assignments items={Object.entries(row.inputs).map(([name, value]) => `${name} = ${formatNumber(value)}`)} empty="defaults" />
              </Table.Td>
              <Table.Td>
                <Assignments
                  items={Object.entries(row.expected).map(([name, expected]) => `${name} = ${formatNumber(expected.value)}${expected.tolerance ? ` ± ${formatNumber(expected.tolerance)}` : ''}`)}
                  empty="—"
                />
              </Table.Td>
              <Table.Td>
                <Text size="sm">{row.expectedVerdict ?? '—'}</Text>
              </Table.Td>
            </Table.Tr>
          ))}
        </Table.Tbody>
      </Table>
    </Table.ScrollContainer>
  );
}

type MoveForward = { pending: string | null; run: (usage: MethodUsage) => void };

function UsageTable({ usages, latestVersion, moveForward }: { usages: readonly MethodUsage[]; latestVersion: number; moveForward?: MoveForward }) {
  if (usages.length === 0) return <Text size="sm" c="dimmed">No calculator block uses this method yet.</Text>;
  const lagging = new Set(laggingUsages(usages, latestVersion).map((usage) => `${usage.revisionId}:${usage.blockId}`));
  // A block already moved forward in the page's open revision needs no second move from the released one.
  const movedInDraft = new Set(usages.filter((usage) => (usage.state === 'draft' || usage.state === 'in_review') && (usage.methodVersion === null || usage.methodVersion >= latestVersion)).map((usage) => `${usage.pageId}:${usage.blockId}`));
  return (
    <Table.ScrollContainer minWidth={560}>
      <Table verticalSpacing={6} aria-label="Pages using this method">
        <Table.Thead>
          <Table.Tr>
            <Table.Th w={130}>Page</Table.Th>
            <Table.Th>Block</Table.Th>
            <Table.Th w={130}>Revision</Table.Th>
            <Table.Th w={170}>Pinned version</Table.Th>
            {moveForward && <Table.Th w={150} />}
          </Table.Tr>
        </Table.Thead>
        <Table.Tbody>
          {usages.map((usage) => {
            const behind = lagging.has(`${usage.revisionId}:${usage.blockId}`);
            return (
              <Table.Tr key={`${usage.revisionId}:${usage.blockId}`} data-lagging={behind || undefined}>
                <Table.Td>
                  <Anchor component={Link} to={paths.standards.page.getHref(usage.documentNumber)} className={classes.mono} fw={600}>
                    {usage.documentNumber}
                  </Anchor>
                </Table.Td>
                <Table.Td>
                  <Text size="sm">{usage.caption || usage.title}</Text>
                </Table.Td>
                <Table.Td>
                  <Text size="sm">
                    {usage.revisionLetter ? `Rev. ${usage.revisionLetter}` : stateLabels[usage.state]}
                    {usage.revisionLetter && usage.state !== 'released' ? ` (${stateLabels[usage.state].toLowerCase()})` : ''}
                  </Text>
                </Table.Td>
                <Table.Td>
                  {usage.methodVersion === null ? (
                    <Text size="sm">Follows the latest</Text>
                  ) : (
                    <Group gap={6}>
                      <Text size="sm" className={classes.numeric}>
                        v{usage.methodVersion}
                      </Text>
                      {behind && (
                        <Badge color="amber" variant="light" radius="xs" tt="none">
                          behind v{latestVersion}
                        </Badge>
                      )}
                    </Group>
                  )}
                </Table.Td>
                {moveForward && (
                  <Table.Td>
                    {behind && usage.state === 'released' && movedInDraft.has(`${usage.pageId}:${usage.blockId}`) ? (
                      <Text size="xs" c="dimmed">
                        Moved in the draft
                      </Text>
                    ) : behind && (usage.state === 'released' || usage.state === 'draft') && (
                      <Tooltip label={`Pins the block to v${latestVersion} in the page's draft; the page then goes through review`} multiline w={240}>
                        <Button size="compact-xs" variant="default" leftSection={<IconArrowForwardUp size={12} />} loading={moveForward.pending === `${usage.pageId}:${usage.blockId}`} onClick={() => moveForward.run(usage)}>
                          Move forward
                        </Button>
                      </Tooltip>
                    )}
                  </Table.Td>
                )}
              </Table.Tr>
            );
          })}
        </Table.Tbody>
      </Table>
    </Table.ScrollContainer>
  );
}

type Props = {
  method: MethodSummary;
  /** In-house methods: the definition with its formulas, from the designer (replaces the generic inputs/outputs list). */
  definition?: ReactNode;
  /** Beside the title: the designer's actions (edit, review). */
  actions?: ReactNode;
  /** Below everything: version history. */
  history?: ReactNode;
  /** The run panel. */
  run: ReactNode;
  /** Authors and admins may move blocks pinned to older versions forward (through the page's review). */
  canMoveForward?: boolean;
};

/** A method's own page: what it computes, from which sources, where it is used, and a panel to run it. */
export function MethodOverview({ method, definition, actions, history, run, canMoveForward = false }: Props) {
  const detail = useMethodDetail(method.id);
  const source = methodSource(method);
  return (
    <Stack gap="lg">
      <Breadcrumbs separator="›">
        <Anchor component={Link} to={paths.methods.catalog.getHref()} size="sm">
          Methods
        </Anchor>
        <Text size="sm">{method.title}</Text>
      </Breadcrumbs>
      <header className={classes.header}>
        <Group justify="space-between" align="flex-end" wrap="wrap" gap="md">
          <Stack gap={6} maw={760}>
            <Text className={classes.eyebrow}>{source === 'in-house' ? 'In-house method' : 'Built-in method'}</Text>
            <Title order={1}>{method.title}</Title>
            <Group gap="xs">
              <Text className={classes.mono}>{method.id}</Text>
              <Badge variant="filled" color="ink" radius="xs" tt="none">
                v{method.version}
              </Badge>
              <SourceBadge method={method} />
            </Group>
          </Stack>
          {actions && <Group gap="sm">{actions}</Group>}
        </Group>
        {method.description && (
          <Text mt="md" maw={820} className={classes.description}>
            {method.description}
          </Text>
        )}
      </header>

      {method.cautions.length > 0 && (
        <Alert color="amber" variant="light" icon={<IconShieldExclamation size={18} />} title="Scope and safety" role="note">
          <List size="sm" spacing={4}>
            {method.cautions.map((caution, index) => (
              <List.Item key={index}>{caution}</List.Item>
            ))}
          </List>
        </Alert>
      )}

      {run}

      <Section title={definition ? 'Definition' : 'Inputs and outputs'} id="definition-title">
        {definition ?? <InputsAndOutputs method={method} />}
      </Section>

      <Section title="References" id="references-title">
        {method.references.length === 0 ? (
          <Text size="sm" c="dimmed">
            No published source is named.
          </Text>
        ) : (
          <List size="sm" spacing={4}>
            {method.references.map((reference, index) => (
              <List.Item key={index}>{reference}</List.Item>
            ))}
          </List>
        )}
      </Section>

      <DetailSections detail={detail} source={source} methodId={method.id} canMoveForward={canMoveForward} />
      {history}
    </Stack>
  );
}

function DetailSections({ detail, source, methodId, canMoveForward }: { detail: ReturnType<typeof useMethodDetail>; source: string; methodId: string; canMoveForward: boolean }) {
  const move = useMoveBlocksForward([getMethodDetailQueryOptions(methodId).queryKey]);
  const [pending, setPending] = useState<string | null>(null);
  const moveForward: MoveForward = {
    pending,
    run: (usage) => {
      setPending(`${usage.pageId}:${usage.blockId}`);
      move.mutate(
        { pageId: usage.pageId, blockIds: [usage.blockId] },
        {
          onSuccess: (result) =>
            notifications.show({
              color: 'verdigris',
              title: `${usage.documentNumber}: block moved forward`,
              message: `${result.moved.map((entry) => `v${entry.from} → v${entry.to}`).join(', ')} in the page's draft (version ${result.version}). Submit the draft for review to release it.`,
            }),
          onError: (error) => notifications.show({ color: 'redline', title: `${usage.documentNumber} not changed`, message: errorMessage(error) }),
          onSettled: () => setPending(null),
        },
      );
    },
  };
  if (detail.isPending) return <Skeleton h={160} />;
  if (detail.isError) return <PanelError title="Where this method is used could not be loaded" error={detail.error} onRetry={() => void detail.refetch()} />;
  const data: MethodCatalogDetail = detail.data;
  return (
    <>
      {source === 'in-house' && (
        <Section title={`Test table of v${data.latestVersion}`} id="tests-title">
          <ReleasedTests tests={data.tests} />
        </Section>
      )}
      <Section title="Used on" id="usage-title">
        <UsageTable usages={data.usages} latestVersion={data.latestVersion} moveForward={canMoveForward ? moveForward : undefined} />
      </Section>
    </>
  );
}
