import { ActionIcon, Badge, Button, Group, Select, Stack, Table, Text, TextInput, Tooltip } from '@mantine/core';
import { designLimits, type DesignTestRow, type TestRowResult, type TestRun } from '@limitbook/contracts';
import { IconCheck, IconPlayerPlay, IconPlus, IconTrash, IconX } from '@tabler/icons-react';
import { formatNumber } from '@/components/calculator';
import { newTestRow, roundTo } from '../lib/definition';
import { errorAt, type DesignerSection } from './designer-context';
import { NumberTextInput } from './number-text-input';
import classes from './designer.module.css';

type Props = DesignerSection & {
  run: TestRun | null;
  /** The run is for an older definition than the one on screen. */
  runOutdated: boolean;
  running: boolean;
  onRun: () => void;
};

function RowResult({ result, outdated, decimals }: { result: TestRowResult | undefined; outdated: boolean; decimals: Record<string, number> }) {
  if (!result) return <Text size="xs" c="dimmed">Not run</Text>;
  return (
    <Stack gap={4} data-row-result={result.pass ? 'pass' : 'fail'} opacity={outdated ? 0.55 : 1}>
      <Badge color={result.pass ? 'verdigris' : 'redline'} variant="light" radius="xs" leftSection={result.pass ? <IconCheck size={12} /> : <IconX size={12} />}>
        {result.pass ? 'Pass' : 'Fail'}
      </Badge>
      {result.outputs.map((check) => (
        <Text key={check.output} size="xs" className={check.pass ? classes.pass : classes.fail}>
          <span className={classes.mono}>{check.output}</span>{' '}
          {check.actual === null ? 'not computed' : `${formatNumber(roundTo(check.actual, decimals[check.output]))}${check.unit ? ` ${check.unit}` : ''}`}
          {!check.pass && check.difference !== null ? ` (expected ${formatNumber(check.expected)}, off by ${formatNumber(roundTo(check.difference, (decimals[check.output] ?? 3) + 1))})` : ''}
        </Text>
      ))}
      {result.expectedVerdict && result.verdict !== result.expectedVerdict && (
        <Text size="xs" className={classes.fail}>
          Verdict {result.verdict ?? 'none'}, expected {result.expectedVerdict}
        </Text>
      )}
      {Object.entries(result.errors).map(([path, message]) => (
        <Text key={path} size="xs" className={classes.fail}>
          {message}
        </Text>
      ))}
    </Stack>
  );
}

/** Rows of input values with the outputs they must give; "Run tests" checks them on the server. */
export function TestTableEditor({ run, runOutdated, running, onRun, ...section }: Props) {
  const { form, readOnly } = section;
  const { inputs, outputs, tests } = form.values;
  const decimals = Object.fromEntries(outputs.map((output) => [output.name, output.decimals]));
  const setRow = (index: number, row: DesignTestRow) => form.setFieldValue(`tests.${index}`, row);
  const setInput = (index: number, row: DesignTestRow, name: string, value: number | null) => {
    const next = { ...row.inputs };
    if (value === null) delete next[name];
    else next[name] = value;
    setRow(index, { ...row, inputs: next });
  };
  const setExpected = (index: number, row: DesignTestRow, name: string, part: 'value' | 'tolerance', value: number | null) => {
    const next = { ...row.expected };
    const current = next[name];
    if (part === 'value' && value === null) delete next[name];
    else if (part === 'value') next[name] = { value: value ?? 0, tolerance: current?.tolerance ?? 0 };
    else if (current) next[name] = { ...current, tolerance: value ?? 0 };
    setRow(index, { ...row, expected: next });
  };

  return (
    <Stack gap="sm">
      <Group justify="space-between">
        <Text size="sm" c="dimmed" maw={560}>
          Values in each input&rsquo;s unit; an empty input takes its default. A tolerance of 0 compares at the output&rsquo;s decimals. Every row must pass before the method can go to review.
        </Text>
        <Button leftSection={<IconPlayerPlay size={16} />} onClick={onRun} loading={running} disabled={tests.length === 0} variant="filled" color="ink">
          Run tests
        </Button>
      </Group>
      {run && (
        <Text size="sm" fw={600} className={run.pass && !runOutdated ? classes.pass : classes.fail} role="status" data-testid="test-summary">
          {runOutdated
            ? 'The definition changed since the last run: run the tests again.'
            : run.pass
              ? `All ${run.passed} ${run.passed === 1 ? 'row passes' : 'rows pass'}.`
              : `${run.failed} of ${run.passed + run.failed} ${run.failed === 1 ? 'row fails' : 'rows fail'}.`}
        </Text>
      )}
      <Table.ScrollContainer minWidth={Math.max(640, 220 + inputs.length * 110 + outputs.length * 190)}>
        <Table withTableBorder withColumnBorders verticalSpacing={4} horizontalSpacing={6} className={classes.testTable} aria-label="Test table">
          <Table.Thead>
            <Table.Tr>
              <Table.Th w={36}>#</Table.Th>
              <Table.Th w={150}>Case</Table.Th>
              {inputs.map((input) => (
                <Table.Th key={`in-${input.name}`}>
                  <span className={classes.mono}>{input.name}</span>
                  {input.unit ? <Text span size="xs" c="dimmed"> ({input.unit})</Text> : null}
                </Table.Th>
              ))}
              {outputs.map((output) => (
                <Table.Th key={`out-${output.name}`}>
                  Expected <span className={classes.mono}>{output.name}</span>
                  {output.unit ? <Text span size="xs" c="dimmed"> ({output.unit})</Text> : null}
                </Table.Th>
              ))}
              <Table.Th w={110}>Verdict</Table.Th>
              <Table.Th w={190}>Result</Table.Th>
              {!readOnly && <Table.Th w={40} aria-label="Remove" />}
            </Table.Tr>
          </Table.Thead>
          <Table.Tbody>
            {tests.map((row, index) => {
              const rowError = errorAt(section, `tests.${index}`);
              return (
                <Table.Tr key={index} data-test-row={index}>
                  <Table.Td className={classes.numeric}>{index + 1}</Table.Td>
                  <Table.Td>
                    <TextInput size="xs" miw={130} aria-label={`Case ${index + 1}`} value={row.label} onChange={(event) => setRow(index, { ...row, label: event.currentTarget.value })} readOnly={readOnly} />
                    {rowError && (
                      <Text size="xs" className={classes.fail} mt={4} role="alert">
                        {rowError}
                      </Text>
                    )}
                  </Table.Td>
                  {inputs.map((input) => (
                    <Table.Td key={`in-${input.name}`}>
                      <NumberTextInput
                        size="xs"
                        miw={84}
                        aria-label={`${input.name}, row ${index + 1}`}
                        placeholder={input.default !== null ? formatNumber(input.default) : undefined}
                        value={row.inputs[input.name] ?? null}
                        onChange={(value) => setInput(index, row, input.name, value)}
                        error={errorAt(section, `tests.${index}.inputs.${input.name}`)}
                        readOnly={readOnly}
                      />
                    </Table.Td>
                  ))}
                  {outputs.map((output) => (
                    <Table.Td key={`out-${output.name}`}>
                      <Group gap={4} wrap="nowrap">
                        <NumberTextInput
                          size="xs"
                          miw={84}
                          aria-label={`Expected ${output.name}, row ${index + 1}`}
                          value={row.expected[output.name]?.value ?? null}
                          onChange={(value) => setExpected(index, row, output.name, 'value', value)}
                          error={errorAt(section, `tests.${index}.expected.${output.name}.value`)}
                          readOnly={readOnly}
                        />
                        <Text size="xs" c="dimmed">
                          ±
                        </Text>
                        <NumberTextInput
                          size="xs"
                          miw={64}
                          aria-label={`Tolerance of ${output.name}, row ${index + 1}`}
                          placeholder="0"
                          value={row.expected[output.name]?.tolerance || null}
                          onChange={(value) => setExpected(index, row, output.name, 'tolerance', value)}
                          error={errorAt(section, `tests.${index}.expected.${output.name}.tolerance`)}
                          readOnly={readOnly || !row.expected[output.name]}
                        />
                      </Group>
                    </Table.Td>
                  ))}
                  <Table.Td>
                    <Select
                      size="xs"
                      miw={90}
                      aria-label={`Expected verdict, row ${index + 1}`}
                      data={[
                        { value: 'any', label: 'Any' },
                        { value: 'pass', label: 'Pass' },
                        { value: 'fail', label: 'Fail' },
                      ]}
                      value={row.expectedVerdict ?? 'any'}
                      onChange={(value) => setRow(index, { ...row, expectedVerdict: value === 'pass' || value === 'fail' ? value : null })}
                      allowDeselect={false}
                      readOnly={readOnly}
                      comboboxProps={{ withinPortal: true }}
                    />
                  </Table.Td>
                  <Table.Td>
                    <RowResult result={run?.rows.find((result) => result.index === index)} outdated={runOutdated} decimals={decimals} />
                  </Table.Td>
                  {!readOnly && (
                    <Table.Td>
                      <Tooltip label="Remove this row">
                        <ActionIcon variant="subtle" color="redline" aria-label={`Remove test row ${index + 1}`} onClick={() => form.removeListItem('tests', index)}>
                          <IconTrash size={16} />
                        </ActionIcon>
                      </Tooltip>
                    </Table.Td>
                  )}
                </Table.Tr>
              );
            })}
          </Table.Tbody>
        </Table>
      </Table.ScrollContainer>
      {tests.length === 0 && (
        <Text size="sm" c="dimmed">
          No test rows yet. Add a case with values you have checked by hand or from a published example.
        </Text>
      )}
      {!readOnly && (
        <Button variant="light" size="compact-sm" w="fit-content" leftSection={<IconPlus size={14} />} onClick={() => form.insertListItem('tests', newTestRow())} disabled={tests.length >= designLimits.maxTestRows}>
          Add test row
        </Button>
      )}
    </Stack>
  );
}
