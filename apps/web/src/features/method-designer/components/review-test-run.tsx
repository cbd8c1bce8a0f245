import { Badge, Group, Skeleton, Table, Text } from '@mantine/core';
import type { MethodRevision } from '@limitbook/contracts';
import { useQuery } from '@tanstack/react-query';
import { formatNumber } from '@/components/calculator';
import { PanelError } from '@/components/errors/panel-error';
import { runMethodTestsQueryOptions } from '../api/run-method-tests';
import { roundTo } from '../lib/definition';
import classes from './designer.module.css';

/** The revision's test table, run again on the server as the reviewer opens it. */
export function ReviewTestRun({ slug, revision }: { slug: string; revision: MethodRevision }) {
  const run = useQuery(runMethodTestsQueryOptions(slug, revision.id, revision.version));
  const rows = revision.definition.tests;
  const decimals = Object.fromEntries(revision.definition.outputs.map((output) => [output.name, output.decimals]));
  if (rows.length === 0) return <Text size="sm" c="dimmed">This revision has no test rows.</Text>;
  if (run.isPending) return <Skeleton h={120} />;
  if (run.isError) return <PanelError title="The tests could not be run" error={run.error} onRetry={() => void run.refetch()} />;
  return (
    <>
      <Text size="sm" fw={600} mb="xs" className={run.data.pass ? classes.pass : classes.fail} role="status">
        {run.data.pass
          ? `${run.data.passed === 1 ? 'The row passes' : `All ${run.data.passed} rows pass`} on the server now.`
          : `${run.data.failed} of ${rows.length} ${rows.length === 1 ? 'row fails' : 'rows fail'} on the server now.`}
      </Text>
      <Table.ScrollContainer minWidth={560}>
        <Table withTableBorder verticalSpacing={6} aria-label="Test results">
          <Table.Thead>
            <Table.Tr>
              <Table.Th w={40}>#</Table.Th>
              <Table.Th>Case</Table.Th>
              <Table.Th>Inputs</Table.Th>
              <Table.Th>Outputs (expected → computed)</Table.Th>
              <Table.Th w={90}>Result</Table.Th>
            </Table.Tr>
          </Table.Thead>
          <Table.Tbody>
            {rows.map((row, index) => {
              const result = run.data.rows.find((item) => item.index === index);
              return (
                <Table.Tr key={index}>
                  <Table.Td className={classes.numeric}>{index + 1}</Table.Td>
                  <Table.Td>
                    <Text size="sm">{row.label || '—'}</Text>
                  </Table.Td>
                  <Table.Td>
                    <Text size="sm" className={classes.numeric}>
                      {Object.entries(row.inputs)
                        .map(([name, value]) => `${name} = ${formatNumber(value)}`)
                        .join(', ') || 'defaults'}
                    </Text>
                  </Table.Td>
                  <Table.Td>
                    {(result?.outputs ?? []).map((check) => (
                      <Text key={check.output} size="sm" className={check.pass ? undefined : classes.fail}>
                        <span className={classes.mono}>{check.output}</span> {formatNumber(check.expected)}
                        {check.tolerance ? ` ± ${formatNumber(check.tolerance)}` : ''} → {check.actual === null ? 'not computed' : formatNumber(roundTo(check.actual, decimals[check.output]))} {check.unit}
                      </Text>
                    ))}
                  </Table.Td>
                  <Table.Td>
                    <Group gap={4}>
                      <Badge color={result?.pass ? 'verdigris' : 'redline'} variant="light" radius="xs">
                        {result?.pass ? 'Pass' : 'Fail'}
                      </Badge>
                    </Group>
                  </Table.Td>
                </Table.Tr>
              );
            })}
          </Table.Tbody>
        </Table>
      </Table.ScrollContainer>
    </>
  );
}
