import { Autocomplete, Button, Group, TextInput } from '@mantine/core';
import { useForm } from '@mantine/form';
import { IconFilter, IconX } from '@tabler/icons-react';
import type { AuditFilters } from '../api/get-audit-events';

type Values = { action: string; from: string; to: string };

/** A calendar day in the browser's time zone, as the ISO instants the API filters by. */
function startOfDay(day: string) {
  return day ? new Date(`${day}T00:00:00`).toISOString() : undefined;
}
function endOfDay(day: string) {
  return day ? new Date(`${day}T23:59:59.999`).toISOString() : undefined;
}

type Props = { knownActions: string[]; onApply: (filters: AuditFilters) => void };

export function AuditFiltersForm({ knownActions, onApply }: Props) {
  const form = useForm<Values>({
    mode: 'controlled',
    initialValues: { action: '', from: '', to: '' },
    validate: {
      to: (to, values) => (to && values.from && to < values.from ? 'The end date is before the start date' : null),
    },
  });

  const apply = (values: Values) =>
    onApply({ action: values.action.trim() || undefined, from: startOfDay(values.from), to: endOfDay(values.to) });

  const active = form.values.action !== '' || form.values.from !== '' || form.values.to !== '';

  return (
    <form onSubmit={form.onSubmit(apply)} aria-label="Filter audit events">
      <Group align="flex-start" gap="sm" wrap="wrap">
        <Autocomplete label="Action" placeholder="Any action" data={knownActions} w={{ base: '100%', xs: 240 }} {...form.getInputProps('action')} />
        <TextInput label="From" type="date" w={{ base: '47%', xs: 170 }} max={form.values.to || undefined} {...form.getInputProps('from')} />
        <TextInput label="To" type="date" w={{ base: '47%', xs: 170 }} min={form.values.from || undefined} {...form.getInputProps('to')} />
        <Group gap="xs" mt={{ base: 0, xs: 25 }}>
          <Button type="submit" variant="light" leftSection={<IconFilter size={16} />}>
            Apply
          </Button>
          {active && (
            <Button
              variant="subtle"
              color="gray"
              leftSection={<IconX size={16} />}
              onClick={() => {
                form.reset();
                onApply({});
              }}
            >
              Clear
            </Button>
          )}
        </Group>
      </Group>
    </form>
  );
}
