import { Alert, Button, FileButton, Group, List, SegmentedControl, Text } from '@mantine/core';
import { importableTables, maxTableImportBytes, type LengthUnit, type TableImportProblem } from '@limitbook/contracts';
import { IconAlertTriangle, IconFileImport } from '@tabler/icons-react';
import { useMutation } from '@tanstack/react-query';
import { useRef, useState } from 'react';
import { isApiError } from '@/lib/api-client';
import { importTableCsv } from './api/import-table';
import classes from './table-csv-import.module.css';

export type ImportMode = 'replace' | 'append';

export type TableCsvImportProps = {
  method: string;
  /** The table input's name, e.g. `features`. */
  input: string;
  /** Label of the table, for the button's accessible name. */
  label: string;
  unit: LengthUnit;
  onRows: (rows: Record<string, unknown>[], mode: ImportMode) => void;
};

/** Whether a method's table input can be filled from CSV. */
export function canImportTable(method: string | undefined, input: string): boolean {
  return !!method && Object.hasOwn(importableTables, method) && Object.hasOwn(importableTables[method]!, input);
}

const limitText = `${maxTableImportBytes / (1024 * 1024)} MB`;
const shownProblems = 20;

/** "Import CSV…" beside a table input: the server reads the file; good rows fill the table, bad ones are listed by line. */
export function TableCsvImport({ method, input, label, unit, onRows }: TableCsvImportProps) {
  const [mode, setMode] = useState<ImportMode>('replace');
  // Cleared after each pick, so choosing the same file again (after fixing it) imports it again.
  const resetFile = useRef<() => void>(null);
  const [report, setReport] = useState<{ file: string; imported: number; problems: TableImportProblem[] } | null>(null);
  const columns = importableTables[method]?.[input] ?? [];
  const importing = useMutation({
    mutationFn: (file: File) => importTableCsv(method, input, file, unit),
    onSuccess: (result, file) => {
      if (result.rows.length > 0) onRows(result.rows, mode);
      setReport({ file: file.name, imported: result.rows.length, problems: result.problems });
    },
    onError: () => setReport(null),
  });
  const error = importing.error ? (isApiError(importing.error) ? (importing.error.fields.file ?? importing.error.message) : 'The file could not be sent; try again.') : null;

  return (
    <div className={classes.root}>
      <Group gap="xs" wrap="wrap">
        <FileButton
          resetRef={resetFile}
          accept=".csv,text/csv,text/plain"
          onChange={(file) => {
            if (file) importing.mutate(file);
            resetFile.current?.();
          }}
        >
          {(props) => (
            <Button {...props} variant="light" size="compact-sm" leftSection={<IconFileImport size={14} />} loading={importing.isPending} aria-label={`Import CSV into ${label}`}>
              Import CSV…
            </Button>
          )}
        </FileButton>
        <SegmentedControl
          size="xs"
          value={mode}
          onChange={(value) => setMode(value as ImportMode)}
          data={[
            { value: 'replace', label: 'Replace rows' },
            { value: 'append', label: 'Append rows' },
          ]}
          aria-label="What an import does with the rows already in the table"
        />
        <Text size="xs" c="dimmed">
          Columns: {columns.map((column) => column.field).join(', ')}; optional unit column or [mm]/[in] in a header. Up to {limitText}.
        </Text>
      </Group>
      {error && (
        <Alert color="redline" variant="light" p="xs" mt={6} role="alert" title="Import refused">
          <Text size="sm">{error}</Text>
        </Alert>
      )}
      {report && (
        <div className={classes.report} role="status">
          <Text size="sm">
            {report.imported === 0 ? 'No rows imported' : `${report.imported} ${report.imported === 1 ? 'row' : 'rows'} imported`} from {report.file}
            {report.imported > 0 ? (mode === 'append' ? ' (appended)' : ' (table replaced)') : ''}
            {report.problems.length > 0 ? `; ${new Set(report.problems.map((problem) => problem.line)).size} left out:` : '.'}
          </Text>
          {report.problems.length > 0 && (
            <Alert color="amber" variant="light" p="xs" mt={4} icon={<IconAlertTriangle size={16} />} aria-label="Rows left out of the import">
              <List size="sm" spacing={2}>
                {report.problems.slice(0, shownProblems).map((problem, index) => (
                  <List.Item key={index}>
                    <span className={classes.line}>Line {problem.line}</span>
                    {problem.field ? <span className={classes.field}>{problem.field}</span> : null}
                    {problem.message}
                  </List.Item>
                ))}
              </List>
              {report.problems.length > shownProblems && (
                <Text size="xs" c="dimmed" mt={4}>
                  and {report.problems.length - shownProblems} more problems
                </Text>
              )}
            </Alert>
          )}
        </div>
      )}
    </div>
  );
}
