import { Button, Group, Pagination, Paper, Skeleton, Stack, Text } from '@mantine/core';
import { notifications } from '@mantine/notifications';
import { IconDownload, IconListSearch } from '@tabler/icons-react';
import { useMemo, useState } from 'react';
import { PanelError } from '@/components/errors/panel-error';
import { errorMessage } from '@/components/form/server-errors';
import { useExportAudit } from '../api/export-audit';
import { useAuditEvents, type AuditFilters } from '../api/get-audit-events';
import { AuditFiltersForm } from './audit-filters';
import { AuditTable } from './audit-table';

const pageSize = 50;

// Offered even when the page shown has none of them: the revision lifecycle and records, the usual questions of a document audit.
const documentControlActions = [
  'page.created',
  'page.draft_started',
  'page.draft_deleted',
  'page.updated',
  'page.submitted',
  'page.review_withdrawn',
  'page.sent_back',
  'page.released',
  'page.restored',
  'page.obsoleted',
  'page.reinstated',
  'page.deleted',
  'record.created',
  'records.impact_checked',
];

export function AuditLog() {
  const [filters, setFilters] = useState<AuditFilters>({});
  const [page, setPage] = useState(1);
  const events = useAuditEvents({ ...filters, limit: pageSize, offset: (page - 1) * pageSize });
  const exportCsv = useExportAudit();

  const knownActions = useMemo(() => [...new Set([...documentControlActions, ...(events.data?.items.map((event) => event.action) ?? [])])].sort(), [events.data]);
  const total = events.data?.total ?? 0;
  const pages = Math.max(1, Math.ceil(total / pageSize));

  return (
    <Stack gap="md">
      <Paper p="md" bg="var(--lb-sheet)">
        <Group justify="space-between" align="flex-end" gap="md">
          <AuditFiltersForm
            knownActions={knownActions}
            onApply={(next) => {
              setFilters(next);
              setPage(1);
            }}
          />
          <Button
            variant="default"
            leftSection={<IconDownload size={16} />}
            loading={exportCsv.isPending}
            onClick={() =>
              exportCsv.mutate(filters, {
                onError: (error) => notifications.show({ color: 'redline', title: 'Export failed', message: errorMessage(error) }),
              })
            }
          >
            Export CSV
          </Button>
        </Group>
      </Paper>

      {events.isPending ? (
        <Stack gap={6} aria-busy="true">
          {[0, 1, 2, 3].map((row) => (
            <Skeleton key={row} h={44} />
          ))}
        </Stack>
      ) : events.isError ? (
        <PanelError error={events.error} onRetry={() => void events.refetch()} title="The audit log could not be loaded" />
      ) : events.data.items.length === 0 ? (
        <Paper p="xl" bg="var(--lb-sheet)">
          <Stack align="center" gap={6} ta="center">
            <IconListSearch size={28} stroke={1.5} color="var(--mantine-color-gray-5)" aria-hidden />
            <Text fw={600}>No events match these filters</Text>
            <Text size="sm" c="dimmed">
              Widen the date range or clear the action filter.
            </Text>
          </Stack>
        </Paper>
      ) : (
        <Paper style={{ overflow: 'hidden' }} aria-busy={events.isFetching}>
          <AuditTable events={events.data.items} />
        </Paper>
      )}

      {total > 0 && (
        <Group justify="space-between">
          <Text size="sm" c="dimmed">
            {total === 1 ? '1 event' : `${total} events`}
            {pages > 1 && `, page ${page} of ${pages}`}
          </Text>
          {pages > 1 && <Pagination total={pages} value={page} onChange={setPage} size="sm" />}
        </Group>
      )}
    </Stack>
  );
}
