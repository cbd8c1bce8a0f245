import { Badge, Code, Group, Stack, Table, Text } from '@mantine/core';
import { useMediaQuery } from '@mantine/hooks';
import type { AuditEvent } from '@limitbook/contracts';
import { formatDateTime } from '@/lib/format';
import classes from './audit.module.css';

function detailText(detail: Record<string, unknown>): string {
  return Object.entries(detail)
    .map(([key, value]) => `${key}: ${typeof value === 'string' ? value : JSON.stringify(value)}`)
    .join(' · ');
}

function Subject({ event }: { event: AuditEvent }) {
  const detail = detailText(event.detail);
  return (
    <>
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
    </>
  );
}

function Action({ action }: { action: string }) {
  return (
    <Badge color="ink" variant="outline" className={classes.action}>
      {action}
    </Badge>
  );
}

export function AuditTable({ events }: { events: AuditEvent[] }) {
  const narrow = useMediaQuery('(max-width: 48em)', false, { getInitialValueInEffect: false });

  if (narrow) {
    return (
      <ul className={classes.entries} aria-label="Audit events">
        {events.map((event) => (
          <li key={event.id} className={classes.entry}>
            <Group justify="space-between" gap="xs" wrap="nowrap">
              <Action action={event.action} />
              <Text size="xs" c="dimmed" className={classes.when}>
                <time dateTime={event.at}>{formatDateTime(event.at)}</time>
              </Text>
            </Group>
            <Stack gap={2} mt={6}>
              <Text size="sm" className={classes.by}>
                {event.actorEmail ?? 'System'}
              </Text>
              <Subject event={event} />
            </Stack>
          </li>
        ))}
      </ul>
    );
  }

  return (
    <Table.ScrollContainer minWidth={820} type="native">
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
          {events.map((event) => (
            <Table.Tr key={event.id}>
              <Table.Td className={classes.when}>
                <time dateTime={event.at}>{formatDateTime(event.at)}</time>
              </Table.Td>
              <Table.Td>
                <Action action={event.action} />
              </Table.Td>
              <Table.Td>
                <Text size="sm" truncate>
                  {event.actorEmail ?? 'System'}
                </Text>
              </Table.Td>
              <Table.Td>
                <Subject event={event} />
              </Table.Td>
            </Table.Tr>
          ))}
        </Table.Tbody>
      </Table>
    </Table.ScrollContainer>
  );
}
