import { Alert, Anchor, Group, Loader, Table, Text } from '@mantine/core';
import type { ImpactReport } from '@limitbook/contracts';
import { IconAlertTriangle, IconChecks } from '@tabler/icons-react';
import { Link } from 'react-router-dom';
import { formatNumber } from '@/components/calculator';
import { paths } from '@/config/paths';
import { formatDateTime } from '@/lib/format';
import { useReleaseImpact } from '../api/get-release-impact';

type Outcome = ImpactReport['affected'][number]['before'];

function verdictWord(outcome: Outcome) {
  if (outcome.error) return 'not evaluated';
  return outcome.pass === null ? 'no verdict' : outcome.pass ? 'pass' : 'fail';
}

function keyOutputs(outcome: Outcome) {
  return Object.entries(outcome.keyOutputs)
    .map(([name, value]) => `${name} ${typeof value === 'number' ? formatNumber(value) : JSON.stringify(value)}`)
    .join(', ');
}

function ImpactTable({ report }: { report: ImpactReport }) {
  const captions = new Map(report.changedBlocks.map((block) => [block.blockId, block.caption]));
  return (
    <Table.ScrollContainer minWidth={640}>
      <Table verticalSpacing={6} fz="sm" aria-label="Records whose result changes">
        <Table.Thead>
          <Table.Tr>
            <Table.Th>Record</Table.Th>
            <Table.Th>Owner</Table.Th>
            <Table.Th>Calculator</Table.Th>
            <Table.Th>Before</Table.Th>
            <Table.Th>After</Table.Th>
          </Table.Tr>
        </Table.Thead>
        <Table.Tbody>
          {report.affected.map((entry) => (
            <Table.Tr key={entry.recordId}>
              <Table.Td>
                <Anchor component={Link} to={paths.records.record.getHref(entry.recordId)} ff="monospace" size="sm">
                  {entry.recordId.slice(0, 8)}
                </Anchor>
              </Table.Td>
              <Table.Td>{entry.owner?.name ?? 'a former user'}</Table.Td>
              <Table.Td>{captions.get(entry.blockId) ?? entry.blockId.slice(0, 8)}</Table.Td>
              <Table.Td>
                <Text size="sm" fw={600} c={entry.before.pass === false ? 'redline.8' : undefined}>
                  {verdictWord(entry.before)}
                </Text>
                <Text size="xs" c="dimmed">
                  {keyOutputs(entry.before)}
                </Text>
              </Table.Td>
              <Table.Td>
                <Text size="sm" fw={600} c={entry.after.pass === false || entry.after.error ? 'redline.8' : 'verdigris.8'}>
                  {verdictWord(entry.after)}
                </Text>
                <Text size="xs" c="dimmed">
                  {entry.after.error ?? keyOutputs(entry.after)}
                </Text>
              </Table.Td>
            </Table.Tr>
          ))}
        </Table.Tbody>
      </Table>
    </Table.ScrollContainer>
  );
}

type Props = {
  pageId: string;
  revisionId: string;
  revisionLetter: string | null;
  /** Tighter, for a line of the revision history. */
  compact?: boolean;
};

/**
 * The impact check a release runs after approval: the saved records of the previous release
 * whose verdict or key outputs change under the new calculator settings. Polls while it runs.
 */
export function ReleaseImpactPanel({ pageId, revisionId, revisionLetter, compact = false }: Props) {
  const { query: impact, gaveUp } = useReleaseImpact(pageId, revisionId);
  const label = revisionLetter ? `Rev. ${revisionLetter}` : 'this release';
  if (impact.isPending || impact.isError || impact.data.status === 'none') return null;

  if (impact.data.status === 'pending') {
    return (
      <Alert color="blue" variant="light" mb={compact ? 0 : 'lg'} title={compact ? undefined : 'Impact check'} role="status" data-testid="release-impact">
        <Group gap="xs" wrap="nowrap">
          {!gaveUp && <Loader size="xs" />}
          <Text size="sm">
            {gaveUp
              ? `The impact check of ${label} has not reported yet. Reload the page later.`
              : `Checking the records saved under the previous release against ${label}…`}
          </Text>
        </Group>
      </Alert>
    );
  }

  const report = impact.data.report!;
  const changed = report.affected.length;
  const summary =
    report.changedBlocks.length === 0
      ? `${label} changes no calculator setting: no saved record needs a second look.`
      : changed === 0
        ? `${report.recordsChecked} saved record${report.recordsChecked === 1 ? '' : 's'} re-run under ${label}: every verdict and key output stays the same.`
        : `${changed} of ${report.recordsChecked} saved record${report.recordsChecked === 1 ? '' : 's'} ${changed === 1 ? 'comes' : 'come'} out differently under ${label}. ${changed === 1 ? 'Its owner has' : 'Their owners have'} been sent a mail.`;

  return (
    <Alert
      color={changed > 0 ? 'amber' : 'verdigris'}
      variant="light"
      mb={compact ? 0 : 'lg'}
      icon={compact ? undefined : changed > 0 ? <IconAlertTriangle size={18} /> : <IconChecks size={18} />}
      title={compact ? undefined : 'Impact check'}
      role="note"
      data-testid="release-impact"
    >
      <Text size="sm">{summary}</Text>
      {!compact && report.changedBlocks.length > 0 && (
        <Text size="xs" c="dimmed" mt={4}>
          Changed calculators: {report.changedBlocks.map((block) => `${block.caption} (${block.changes.join(', ')})`).join('; ')}. Checked {formatDateTime(report.createdAt)}.
        </Text>
      )}
      {changed > 0 && (
        <div style={{ marginTop: 8 }}>
          <ImpactTable report={report} />
        </div>
      )}
    </Alert>
  );
}
