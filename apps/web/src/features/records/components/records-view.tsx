import { Anchor, Badge, Button, Checkbox, Group, Pagination, Skeleton, Stack, Table, Text } from '@mantine/core';
import { notifications } from '@mantine/notifications';
import type { CalculationRecord } from '@limitbook/contracts';
import { IconFileTypeCsv } from '@tabler/icons-react';
import { useMemo, useState } from 'react';
import { Link } from 'react-router-dom';
import { useMethods } from '@/components/calculator';
import { PanelError } from '@/components/errors/panel-error';
import { errorMessage } from '@/components/form/server-errors';
import { PageHeader } from '@/components/layout/page-header';
import { paths } from '@/config/paths';
import { formatDateTime } from '@/lib/format';
import { useExportRecords } from '../api/download-records';
import { useRecords, type RecordFilters } from '../api/get-records';
import { RecordFiltersForm } from './record-filters';
import { VerdictLabel } from './verdict-label';

const pageSize = 25;

function referenceText(record: CalculationRecord): string {
  const { partNumber, drawing, note } = record.reference;
  return [partNumber, drawing && `dwg ${drawing}`, note].filter(Boolean).join(' · ') || '—';
}

/** "My records": the signed-in user's saved calculations, filtered and paged, exported as CSV. */
export function RecordsView() {
  const [filters, setFilters] = useState<RecordFilters>({});
  const [page, setPage] = useState(1);
  const [selected, setSelected] = useState<Set<string>>(new Set());
  const records = useRecords({ ...filters, limit: pageSize, offset: (page - 1) * pageSize });
  const methods = useMethods();
  const exporter = useExportRecords();
  const methodOptions = useMemo(() => (methods.data?.items ?? []).map((method) => ({ value: method.id, label: method.title })), [methods.data]);

  const items = records.data?.items ?? [];
  const total = records.data?.total ?? 0;
  const pages = Math.max(1, Math.ceil(total / pageSize));
  const allOnPage = items.length > 0 && items.every((record) => selected.has(record.id));
  const someOnPage = items.some((record) => selected.has(record.id));

  const toggle = (id: string) =>
    setSelected((current) => {
      const next = new Set(current);
      if (next.has(id)) next.delete(id);
      else next.add(id);
      return next;
    });
  const togglePage = () =>
    setSelected((current) => {
      const next = new Set(current);
      for (const record of items) {
        if (allOnPage) next.delete(record.id);
        else next.add(record.id);
      }
      return next;
    });

  const exportCsv = (ids?: string[]) =>
    exporter.mutate(ids ? { ids } : { filters }, {
      onSuccess: () => notifications.show({ color: 'verdigris', title: 'CSV exported', message: ids ? `${ids.length} selected record${ids.length === 1 ? '' : 's'}.` : 'Every record the filters match.' }),
      onError: (error) => notifications.show({ color: 'redline', title: 'Export failed', message: errorMessage(error) }),
    });

  return (
    <Stack gap="lg">
      <PageHeader
        eyebrow="Records"
        title="My records"
        description="Calculations you saved from the standards, each citing the page revision and method version it ran under."
        actions={
          <>
            <Button variant="default" leftSection={<IconFileTypeCsv size={16} />} onClick={() => exportCsv([...selected])} disabled={selected.size === 0} loading={exporter.isPending && exporter.variables?.ids !== undefined}>
              Export selected ({selected.size})
            </Button>
            <Button variant="light" leftSection={<IconFileTypeCsv size={16} />} onClick={() => exportCsv()} disabled={total === 0} loading={exporter.isPending && exporter.variables?.ids === undefined}>
              Export all matching
            </Button>
          </>
        }
      />
      <RecordFiltersForm
        methods={methodOptions}
        onApply={(next) => {
          setFilters(next);
          setPage(1);
        }}
      />
      {records.isPending ? (
        <Skeleton h={300} />
      ) : records.isError ? (
        <PanelError error={records.error} onRetry={() => void records.refetch()} title="Records could not be loaded" />
      ) : items.length === 0 ? (
        <Text c="dimmed">
          {Object.values(filters).some(Boolean) ? 'No record matches these filters.' : 'No records yet. Open a released standard and use “Save record…” on a calculator’s result.'}
        </Text>
      ) : (
        <>
          <Table.ScrollContainer minWidth={860}>
            <Table verticalSpacing="sm" highlightOnHover aria-label="Calculation records">
              <Table.Thead>
                <Table.Tr>
                  <Table.Th w={36}>
                    <Checkbox aria-label="Select every record on this page" checked={allOnPage} indeterminate={someOnPage && !allOnPage} onChange={togglePage} />
                  </Table.Th>
                  <Table.Th w={130}>Saved</Table.Th>
                  <Table.Th>Standard</Table.Th>
                  <Table.Th>Method</Table.Th>
                  <Table.Th w={110}>Verdict</Table.Th>
                  <Table.Th>Reference</Table.Th>
                </Table.Tr>
              </Table.Thead>
              <Table.Tbody>
                {items.map((record) => (
                  <Table.Tr key={record.id} data-record={record.id}>
                    <Table.Td>
                      <Checkbox aria-label={`Select the record of ${formatDateTime(record.createdAt)}`} checked={selected.has(record.id)} onChange={() => toggle(record.id)} />
                    </Table.Td>
                    <Table.Td>
                      <Anchor component={Link} to={paths.records.record.getHref(record.id)} size="sm" fw={600}>
                        {formatDateTime(record.createdAt)}
                      </Anchor>
                    </Table.Td>
                    <Table.Td>
                      <Group gap={6} wrap="nowrap">
                        <Text size="sm" ff="monospace" fw={700}>
                          {record.page.documentNumber}
                        </Text>
                        {record.revision.revisionLetter && (
                          <Badge variant="outline" color="ink" radius="xs" size="sm">
                            Rev. {record.revision.revisionLetter}
                          </Badge>
                        )}
                      </Group>
                      <Text size="xs" c="dimmed" lineClamp={1}>
                        {record.page.title}
                      </Text>
                    </Table.Td>
                    <Table.Td>
                      <Text size="sm" ff="monospace" style={{ whiteSpace: 'nowrap' }}>
                        {record.method} v{record.methodVersion}
                      </Text>
                    </Table.Td>
                    <Table.Td>
                      <VerdictLabel verdict={record.verdict} />
                    </Table.Td>
                    <Table.Td>
                      <Text size="sm" lineClamp={2}>
                        {referenceText(record)}
                      </Text>
                    </Table.Td>
                  </Table.Tr>
                ))}
              </Table.Tbody>
            </Table>
          </Table.ScrollContainer>
          <Group justify="space-between">
            <Text size="sm" c="dimmed">
              {total} record{total === 1 ? '' : 's'}
              {selected.size > 0 ? `, ${selected.size} selected` : ''}
            </Text>
            {pages > 1 && <Pagination total={pages} value={page} onChange={setPage} size="sm" aria-label="Pages of records" />}
          </Group>
        </>
      )}
    </Stack>
  );
}
