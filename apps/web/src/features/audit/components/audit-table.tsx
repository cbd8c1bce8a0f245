import { Badge, Code, Table, Text } from '@mantine/core';
import type { AuditEvent } from '@limitbook/contracts';
import { formatDateTime } from '@/lib/format';
import classes from './audit.module.css';

function detailText(detail: Record<string, unknown>): string {
  return Object.entries(detail)
    .map(([key, value]) => `${key}: ${typeof value === 'string' ? value : JSON.stringify(value)}`)
    .join(' · ');
}

export function AuditTable({ events }: { events: AuditEvent[] }) {
  return (
    <Table.ScrollContainer minWidth={820}>
      <Table className={classes.table} highlightOnHover>
        <Table.Thead>
          <Table.Tr>
            <Table.Th w={190}>When</Table.Th>
            <Table.Th w={200}>Action</Table.Th>
            <Table.Th w={230}>By</Table.Th>
            <Table.Th>Subject and detail</Table.Th>
          </Table.Tr>
        </Table.Thead>
        <Table.Tbody>
          {events.map((event) => {
            const detail = detailText(event.detail);
            return (
              <Table.Tr key={event.id}>
                <Table.Td className={classes.when}>
                  <time dateTime={event.at}>{formatDateTime(event.at)}</time>
                </Table.Td>
                <Table.Td>
                  <Badge color="ink" variant="outline" className={classes.action}>
                    {event.action}
                  </Badge>
                </Table.Td>
                <Table.Td>
                  <Text size="sm" truncate>
                    {event.actorEmail ?? 'System'}
                  </Text>
                </Table.Td>
                <Table.Td>
                  <Text size="sm">
                    {event.subjectType}
                    {event.subjectId && (
                      <Code ml={6} className={classes.id} title={event.subjectId}>
                        {event.subjectId.slice(0, 8)}
                      </Code>
                    )}
                  </Text>
                  {detail && (
                    <Text size="xs" c="dimmed" className={classes.detail} title={detail}>
                      {detail}
                    </Text>
                  )}
                </Table.Td>
              </Table.Tr>
            );
          })}
        </Table.Tbody>
      </Table>
    </Table.ScrollContainer>
  );
}
