import { Button, Group, Select, TextInput } from '@mantine/core';
import { useForm } from '@mantine/form';
import { IconFilter, IconX } from '@tabler/icons-react';
import type { RecordFilters } from '../api/get-records';

type Values = { documentNumber: string; method: string | null; verdict: string | null; reference: string; from: string; to: string };

const empty: Values = { documentNumber: '', method: null, verdict: null, reference: '', from: '', to: '' };

/** A calendar day in the browser's time zone, as the ISO instants the API filters by. */
function startOfDay(day: string) {
  return day ? new Date(`${day}T00:00:00`).toISOString() : undefined;
}
function endOfDay(day: string) {
  return day ? new Date(`${day}T23:59:59.999`).toISOString() : undefined;
}

type Props = { methods: { value: string; label: string }[]; onApply: (filters: RecordFilters) => void };

export function RecordFiltersForm({ methods, onApply }: Props) {
  const form = useForm<Values>({
    mode: 'controlled',
    initialValues: empty,
    validate: { to: (to, values) => (to && values.from && to < values.from ? 'The end date is before the start date' : null) },
  });

  const apply = (values: Values) =>
    onApply({
      documentNumber: values.documentNumber.trim() || undefined,
      method: values.method || undefined,
      verdict: (values.verdict || undefined) as RecordFilters['verdict'],
      reference: values.reference.trim() || undefined,
      from: startOfDay(values.from),
      to: endOfDay(values.to),
    });

  const active = Object.values(form.values).some((value) => value !== '' && value !== null);

  return (
    <form onSubmit={form.onSubmit(apply)} aria-label="Filter records">
      <Group align="flex-start" gap="sm" wrap="wrap">
        <TextInput label="Document number" placeholder="e.g. BW-STD" w={{ base: '100%', xs: 150 }} {...form.getInputProps('documentNumber')} />
        <Select label="Method" placeholder="Any method" data={methods} clearable searchable w={{ base: '100%', xs: 210 }} {...form.getInputProps('method')} />
        <Select
          label="Verdict"
          placeholder="Any"
          data={[
            { value: 'pass', label: 'Pass' },
            { value: 'fail', label: 'Fail' },
            { value: 'none', label: 'No verdict' },
          ]}
          clearable
          w={{ base: '100%', xs: 125 }}
          {...form.getInputProps('verdict')}
        />
        <TextInput label="Reference contains" placeholder="Part, drawing or note" w={{ base: '100%', xs: 180 }} {...form.getInputProps('reference')} />
        <TextInput label="From" type="date" w={{ base: '47%', xs: 140 }} max={form.values.to || undefined} {...form.getInputProps('from')} />
        <TextInput label="To" type="date" w={{ base: '47%', xs: 140 }} min={form.values.from || undefined} {...form.getInputProps('to')} />
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
