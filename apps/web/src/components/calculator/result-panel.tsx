import { Alert, Badge, Group, List, Stack, Table, Text } from '@mantine/core';
import type { AcceptanceRule, EvaluationResult, MethodSummary } from '@limitbook/contracts';
import { IconAlertTriangle, IconCheck, IconShieldExclamation, IconX } from '@tabler/icons-react';
import { lazy, Suspense, type ReactNode } from 'react';
import { outputPathLabel } from './lib/acceptance-words';
import { outputKeyLabel, outputKeyUnit } from './lib/field-meta';
import { formatNumber } from './lib/format-number';
import { OutputValue, Quantity } from './output-value';
import classes from './result-panel.module.css';

const ResultCharts = lazy(() => import('./result-charts').then((module) => ({ default: module.ResultCharts })));

// Shown as a chart or a table of their own rather than in the outputs table.
const separatelyShown = new Set(['sweep', 'bonusTable', 'contributions']);

export type ResultPanelProps = {
  result: EvaluationResult;
  method: MethodSummary | undefined;
  acceptance?: AcceptanceRule | null;
  /** The result is for earlier inputs: shown dimmed, never as current. */
  stale?: boolean;
  /** Hide the method's cautions (e.g. where the page shows them once). */
  hideCautions?: boolean;
};

export function VerdictBadge({ pass }: { pass: boolean }) {
  return (
    <Badge
      size="lg"
      radius="xs"
      variant="filled"
      color={pass ? 'verdigris.7' : 'redline.7'}
      leftSection={pass ? <IconCheck size={14} stroke={2.5} /> : <IconX size={14} stroke={2.5} />}
      className={classes.verdictBadge}
    >
      {pass ? 'Pass' : 'Fail'}
    </Badge>
  );
}

function valueAt(outputs: Record<string, unknown>, path: string): unknown {
  let current: unknown = outputs;
  for (const key of path.split('.')) {
    if (!current || typeof current !== 'object') return undefined;
    current = (current as Record<string, unknown>)[key];
  }
  return current;
}

function Headline({ result, method, acceptance }: { result: EvaluationResult; method: MethodSummary | undefined; acceptance?: AcceptanceRule | null }) {
  const path = acceptance?.output ?? method?.outputs.find((output) => output.kind === 'length' && typeof result.outputs[output.name] === 'number')?.name;
  if (!path) return null;
  const value = valueAt(result.outputs, path);
  const [head = path, ...rest] = path.split('.');
  const description = method?.outputs.find((output) => output.name === head);
  let unit = '';
  if (rest.length === 0 && description?.kind === 'length') unit = result.unit;
  else if (rest.length > 0) unit = outputKeyUnit(rest.at(-1) ?? '', result.unit);
  const number = typeof value === 'number' ? value : value && typeof value === 'object' && typeof (value as { value?: unknown }).value === 'number' ? (value as { value: number }).value : null;
  if (number === null) return null;
  return (
    <div className={classes.headline}>
      <Text className={classes.headlineLabel}>{outputPathLabel(path, method)}</Text>
      <Text className={classes.headlineValue} data-testid="headline-value">
        <Quantity value={number} unit={unit} />
      </Text>
    </div>
  );
}

function cellText(value: unknown): string {
  if (typeof value === 'number') return formatNumber(value);
  if (typeof value === 'boolean') return value ? 'Yes' : 'No';
  if (value === null || value === undefined) return '—';
  return typeof value === 'string' ? value : JSON.stringify(value);
}

function SimpleTable({ rows, unit, caption }: { rows: Record<string, unknown>[]; unit: string; caption: string }) {
  const keys = Object.keys(rows[0] ?? {});
  return (
    <Table.ScrollContainer minWidth={320}>
      <Table striped withTableBorder verticalSpacing={4} horizontalSpacing={6} className={classes.dataTable}>
        <caption className={classes.tableCaption}>{caption}</caption>
        <Table.Thead>
          <Table.Tr>
            {keys.map((key) => {
              const keyUnit = outputKeyUnit(key, unit);
              return (
                <Table.Th key={key} className={typeof rows[0]?.[key] === 'number' ? classes.numeric : undefined}>
                  {outputKeyLabel(key)}
                  {keyUnit ? ` (${keyUnit})` : ''}
                </Table.Th>
              );
            })}
          </Table.Tr>
        </Table.Thead>
        <Table.Tbody>
          {rows.map((row, index) => (
            <Table.Tr key={index}>
              {keys.map((key) => (
                <Table.Td key={key} className={typeof row[key] === 'number' ? classes.numeric : undefined} data-fails={row[key] === false || undefined}>
                  {cellText(row[key])}
                </Table.Td>
              ))}
            </Table.Tr>
          ))}
        </Table.Tbody>
      </Table>
    </Table.ScrollContainer>
  );
}

type FitSide = { designation: string; upperDeviation: number; lowerDeviation: number; maxSize: number; minSize: number; itGrade: string; toleranceValue: number };

function isFitSide(value: unknown): value is FitSide {
  return !!value && typeof value === 'object' && typeof (value as FitSide).designation === 'string' && typeof (value as FitSide).upperDeviation === 'number';
}

/** Hole and shaft side by side, as a limits-and-fits table is read. */
function FitTable({ hole, shaft, unit }: { hole: unknown; shaft: unknown; unit: string }) {
  const sides = [
    { title: 'Hole', symbols: ['ES', 'EI'], side: isFitSide(hole) ? hole : null },
    { title: 'Shaft', symbols: ['es', 'ei'], side: isFitSide(shaft) ? shaft : null },
  ].filter((entry) => entry.side !== null) as { title: string; symbols: string[]; side: FitSide }[];
  if (sides.length === 0) return null;
  const rows: { label: string; value: (side: FitSide, symbols: string[]) => ReactNode }[] = [
    { label: 'Tolerance class', value: (side) => <strong>{side.designation}</strong> },
    { label: 'Upper deviation', value: (side, symbols) => <>{symbols[0]} <Quantity value={side.upperDeviation} unit={unit} /></> },
    { label: 'Lower deviation', value: (side, symbols) => <>{symbols[1]} <Quantity value={side.lowerDeviation} unit={unit} /></> },
    { label: 'Largest size', value: (side) => <Quantity value={side.maxSize} unit={unit} /> },
    { label: 'Smallest size', value: (side) => <Quantity value={side.minSize} unit={unit} /> },
    { label: 'Tolerance', value: (side) => <>{side.itGrade} <Quantity value={side.toleranceValue} unit={unit} /></> },
  ];
  return (
    <Table withTableBorder withColumnBorders verticalSpacing={4} className={classes.dataTable} aria-label="Limits of hole and shaft">
      <Table.Thead>
        <Table.Tr>
          <Table.Th />
          {sides.map((entry) => (
            <Table.Th key={entry.title} className={classes.numeric}>
              {entry.title}
            </Table.Th>
          ))}
        </Table.Tr>
      </Table.Thead>
      <Table.Tbody>
        {rows.map((row) => (
          <Table.Tr key={row.label}>
            <Table.Th scope="row" className={classes.outputLabel}>
              {row.label}
            </Table.Th>
            {sides.map((entry) => (
              <Table.Td key={entry.title} className={classes.numeric}>
                {row.value(entry.side, entry.symbols)}
              </Table.Td>
            ))}
          </Table.Tr>
        ))}
      </Table.Tbody>
    </Table>
  );
}

function Section({ title, children }: { title: string; children: ReactNode }) {
  return (
    <section className={classes.section}>
      <Text className={classes.sectionTitle}>{title}</Text>
      {children}
    </section>
  );
}

/** A server result: the verdict with its checks, the outputs with their units, warnings and the method's cautions. */
export function ResultPanel({ result, method, acceptance, stale = false, hideCautions = false }: ResultPanelProps) {
  const describedOutputs = method?.outputs ?? [];
  const names = [
    ...describedOutputs.map((output) => output.name).filter((name) => name in result.outputs),
    ...Object.keys(result.outputs).filter((name) => !describedOutputs.some((output) => output.name === name)),
  ].filter((name) => !separatelyShown.has(name));
  const fit = isFitSide(result.outputs.hole) || isFitSide(result.outputs.shaft);
  // Other table outputs (a row per measured feature…) get a table of their own below the scalar results.
  const tableOutputs = describedOutputs.filter((output) => output.kind === 'table' && !separatelyShown.has(output.name) && Array.isArray(result.outputs[output.name]));
  const listed = (fit ? names.filter((name) => name !== 'hole' && name !== 'shaft') : names).filter((name) => !tableOutputs.some((output) => output.name === name));
  const bonusTable = Array.isArray(result.outputs.bonusTable) ? (result.outputs.bonusTable as Record<string, unknown>[]) : null;
  const contributions = Array.isArray(result.outputs.contributions) ? (result.outputs.contributions as Record<string, unknown>[]) : null;
  const hasChart = !!result.outputs.sweep || !!(result.outputs.monteCarlo as { histogram?: unknown } | undefined)?.histogram;

  return (
    <Stack gap="md" className={classes.panel} data-stale={stale || undefined} aria-live="polite">
      <div className={classes.summary}>
        <Headline result={result} method={method} acceptance={acceptance} />
        {result.verdict && (
          <div className={classes.verdict} data-verdict={result.verdict.pass ? 'pass' : 'fail'}>
            <Group gap="xs" wrap="nowrap">
              <VerdictBadge pass={result.verdict.pass} />
              <Text size="sm" fw={600}>
                {result.verdict.summary}
              </Text>
            </Group>
            <ul className={classes.checks}>
              {result.verdict.checks.map((check, index) => (
                <li key={index} data-pass={check.pass}>
                  {check.pass ? <IconCheck size={14} aria-label="Passes" /> : <IconX size={14} aria-label="Fails" />}
                  <span>
                    {check.label}
                    <span className={classes.checkDetail}> — {check.detail}</span>
                  </span>
                </li>
              ))}
            </ul>
          </div>
        )}
      </div>

      {result.warnings.length > 0 && (
        <Alert color="amber" variant="light" icon={<IconAlertTriangle size={18} />} p="sm" title="Warnings">
          <List size="sm" spacing={2}>
            {result.warnings.map((warning, index) => (
              <List.Item key={index}>{warning}</List.Item>
            ))}
          </List>
        </Alert>
      )}

      {fit && <FitTable hole={result.outputs.hole} shaft={result.outputs.shaft} unit={result.unit} />}

      <Table.ScrollContainer minWidth={300}>
        <Table verticalSpacing={6} className={classes.outputs} aria-label="Results">
          <Table.Tbody>
            {listed.map((name) => {
              const description = describedOutputs.find((output) => output.name === name);
              return (
                <Table.Tr key={name} data-output={name}>
                  <Table.Th scope="row" className={classes.outputLabel}>
                    {description?.label ?? outputKeyLabel(name)}
                  </Table.Th>
                  <Table.Td>
                    <OutputValue description={description} value={result.outputs[name]} unit={result.unit} />
                  </Table.Td>
                </Table.Tr>
              );
            })}
          </Table.Tbody>
        </Table>
      </Table.ScrollContainer>

      {tableOutputs.map((output) => {
        const rows = result.outputs[output.name] as Record<string, unknown>[];
        return rows.length > 0 ? (
          <Section key={output.name} title={output.label}>
            <SimpleTable rows={rows} unit={result.unit} caption={output.description} />
          </Section>
        ) : null;
      })}

      {contributions && contributions.length > 0 && (
        <Section title="Contribution to the variance">
          <SimpleTable rows={contributions} unit={result.unit} caption="Share of each contributor in the stack's variance" />
        </Section>
      )}

      {hasChart && (
        <Suspense fallback={<div className={classes.chartPlaceholder} aria-hidden />}>
          <ResultCharts result={result} acceptance={acceptance} />
        </Suspense>
      )}

      {bonusTable && bonusTable.length > 0 && (
        <Section title="Bonus tolerance across the size range">
          <SimpleTable rows={bonusTable} unit={result.unit} caption="Bonus and total position tolerance at each actual size" />
        </Section>
      )}

      {!hideCautions && method && method.cautions.length > 0 && (
        <div className={classes.cautions} role="note" aria-label="Scope and safety of this method">
          <IconShieldExclamation size={18} aria-hidden className={classes.cautionIcon} />
          <ul>
            {method.cautions.map((caution, index) => (
              <li key={index}>{caution}</li>
            ))}
          </ul>
        </div>
      )}
    </Stack>
  );
}
