import { Alert, Anchor, Badge, Button, Group, Paper, Skeleton, Stack, Table, Text, Title } from '@mantine/core';
import { notifications } from '@mantine/notifications';
import type { CalculationRecord } from '@limitbook/contracts';
import { IconAlertTriangle, IconFileTypeCsv, IconFileTypePdf, IconRuler2 } from '@tabler/icons-react';
import { useMemo, type ReactNode } from 'react';
import { Link } from 'react-router-dom';
import { DerivationSteps, ResultPanel, acceptanceInWords, describeInputs, useMethods } from '@/components/calculator';
import { PanelError } from '@/components/errors/panel-error';
import { errorMessage } from '@/components/form/server-errors';
import { paths } from '@/config/paths';
import { isApiError } from '@/lib/api-client';
import { formatDateTime } from '@/lib/format';
import { useDownloadRecordPdf, useExportRecords } from '../api/download-records';
import { useRecord } from '../api/get-record';
import { useRecordImpact } from '../api/get-record-impact';
import { useRecordRevision } from '../api/get-record-revision';
import { inputRows } from '../lib/input-rows';
import { VerdictLabel } from './verdict-label';
import classes from './records.module.css';

function outcomeWords(outcome: { pass: boolean | null; error?: string }) {
  if (outcome.error) return `not evaluated (${outcome.error})`;
  return outcome.pass === null ? 'no verdict' : outcome.pass ? 'pass' : 'fail';
}

/** Says so when a later release of the page would judge this record differently. */
function ImpactNote({ record }: { record: CalculationRecord }) {
  const impact = useRecordImpact(record.id);
  if (!impact.data || impact.data.items.length === 0) return null;
  return (
    <Alert color="amber" variant="light" icon={<IconAlertTriangle size={18} />} title="A later revision changes this result" role="note" data-testid="record-impact">
      <Stack gap={4}>
        {impact.data.items.map((item) => (
          <Text size="sm" key={item.reportId}>
            Under Rev. {item.toRevision.revisionLetter ?? '?'} of {record.page.documentNumber} (checked {formatDateTime(item.checkedAt)}) this record comes out{' '}
            <strong>{outcomeWords(item.after)}</strong> instead of {outcomeWords(item.before)}.{' '}
            <Anchor component={Link} to={paths.standards.page.getHref(record.page.documentNumber)} size="sm">
              Open the current revision
            </Anchor>{' '}
            to run it again.
          </Text>
        ))}
      </Stack>
    </Alert>
  );
}

type DocNode = { type?: string; attrs?: Record<string, unknown>; content?: DocNode[] };

/** The caption the block had in the revision the record was made under. */
function captionOf(node: DocNode | undefined, blockId: string): string | null {
  if (!node) return null;
  if (node.type === 'calculatorBlock' && node.attrs?.blockId === blockId) return typeof node.attrs.caption === 'string' && node.attrs.caption ? node.attrs.caption : null;
  for (const child of node.content ?? []) {
    const found = captionOf(child, blockId);
    if (found) return found;
  }
  return null;
}

function Fact({ label, children }: { label: string; children: ReactNode }) {
  return (
    <div>
      <dt>{label}</dt>
      <dd>{children}</dd>
    </div>
  );
}

/** A record's permalink: what was computed, under which revision and method, by whom, with its derivation and downloads. */
export function RecordView({ recordId }: { recordId: string }) {
  const record = useRecord(recordId);
  const methods = useMethods();
  const pdf = useDownloadRecordPdf();
  const csv = useExportRecords();
  const method = record.data ? methods.byId(record.data.method) : undefined;
  const revision = useRecordRevision(record.data?.page.id, record.data?.revision.id);
  const rows = useMemo(() => (record.data ? inputRows(record.data.inputs, method ? describeInputs(method.inputSchema, method.id) : []) : []), [record.data, method]);

  if (record.isPending) return <Skeleton h={480} />;
  if (record.isError) {
    if (isApiError(record.error) && (record.error.status === 404 || record.error.status === 400)) {
      return (
        <Stack gap="sm" maw={640}>
          <Title order={1}>No such record</Title>
          <Text>
            This link does not lead to a calculation record. See <Anchor component={Link} to={paths.records.list.getHref()}>your records</Anchor>.
          </Text>
        </Stack>
      );
    }
    return <PanelError error={record.error} onRetry={() => void record.refetch()} title="This record could not be loaded" />;
  }

  const data = record.data;
  const letter = data.revision.revisionLetter;
  const caption = captionOf(revision.data?.document as DocNode | undefined, data.blockId);
  const reference = data.reference;

  return (
    <Stack gap="lg" className={classes.permalink}>
      <header className={classes.recordHeader}>
        <Group justify="space-between" align="flex-start" wrap="wrap" gap="md">
          <Stack gap={6}>
            <Text className={classes.eyebrow}>Calculation record</Text>
            <Group gap="sm" align="center">
              <Anchor component={Link} to={paths.standards.page.getHref(data.page.documentNumber)} className={classes.number}>
                {data.page.documentNumber}
              </Anchor>
              {letter && <Text className={classes.letter}>Rev. {letter}</Text>}
              <VerdictLabel verdict={data.verdict} />
            </Group>
            <Title order={1} className={classes.title}>
              {data.page.title}
            </Title>
            <Text className={classes.calculator}>
              <IconRuler2 size={16} aria-hidden /> {caption ?? `Calculator block ${data.blockId.slice(0, 8)}`}
            </Text>
          </Stack>
          <Group gap="xs">
            <Button
              leftSection={<IconFileTypePdf size={16} />}
              loading={pdf.isPending}
              onClick={() => pdf.mutate(data.id, { onError: (error) => notifications.show({ color: 'redline', title: 'PDF not downloaded', message: errorMessage(error) }) })}
            >
              Download PDF
            </Button>
            <Button
              variant="default"
              leftSection={<IconFileTypeCsv size={16} />}
              loading={csv.isPending}
              onClick={() => csv.mutate({ ids: [data.id] }, { onError: (error) => notifications.show({ color: 'redline', title: 'CSV not downloaded', message: errorMessage(error) }) })}
            >
              Download CSV
            </Button>
          </Group>
        </Group>
        <dl className={classes.facts}>
          <Fact label="Page revision">
            {letter ? `Rev. ${letter}` : `Revision ${data.revision.sequence}`} ({data.revision.state === 'superseded' ? 'since superseded' : 'the current release'}) ·{' '}
            <Anchor component={Link} to={paths.standards.history.getHref(data.page.documentNumber)} size="sm">
              history
            </Anchor>
          </Fact>
          <Fact label="Method">
            <span className={classes.mono}>
              {data.method} v{data.methodVersion}
            </span>
            {method ? ` · ${method.title}` : ''}
          </Fact>
          <Fact label="Unit">{data.unit}</Fact>
          <Fact label="Recorded by">{data.createdBy?.name ?? 'a former user'}</Fact>
          <Fact label="Recorded at">{formatDateTime(data.createdAt)}</Fact>
        </dl>
      </header>

      <ImpactNote record={data} />

      <Paper className={classes.section} p="md">
        <Title order={2} className={classes.sectionTitle}>
          Reference
        </Title>
        <dl className={classes.facts}>
          <Fact label="Part number">{reference.partNumber || '—'}</Fact>
          <Fact label="Drawing">{reference.drawing || '—'}</Fact>
          <Fact label="Note">{reference.note || '—'}</Fact>
        </dl>
      </Paper>

      {data.acceptance && (
        <Text size="sm" className={classes.rule}>
          <span className={classes.ruleLabel}>The standard required</span> {acceptanceInWords(data.acceptance, method, data.unit, data.unit)}
        </Text>
      )}

      <Paper className={classes.section} p="md">
        <Title order={2} className={classes.sectionTitle}>
          Inputs
        </Title>
        <Table verticalSpacing={6} aria-label="Inputs">
          <Table.Tbody>
            {rows.map((row) => (
              <Table.Tr key={row.path}>
                <Table.Td className={classes.inputLabel}>{row.label}</Table.Td>
                <Table.Td className={classes.mono}>
                  {row.value}
                  {row.length ? ` ${data.unit}` : ''}
                </Table.Td>
              </Table.Tr>
            ))}
          </Table.Tbody>
        </Table>
      </Paper>

      <Paper className={classes.section} p="md">
        <Title order={2} className={classes.sectionTitle}>
          Result
        </Title>
        <ResultPanel
          result={{ method: data.method, version: data.methodVersion, unit: data.unit, outputs: data.outputs, verdict: data.verdict ?? undefined, warnings: data.warnings, steps: data.steps }}
          method={method}
          acceptance={data.acceptance}
        />
      </Paper>

      {data.steps.length > 0 && (
        <Paper className={classes.section} p="md">
          <Title order={2} className={classes.sectionTitle}>
            Derivation
          </Title>
          <DerivationSteps steps={data.steps} references={method?.references} />
        </Paper>
      )}
      <Badge variant="transparent" color="gray" className={classes.idLine}>
        Record {data.id}
      </Badge>
    </Stack>
  );
}
