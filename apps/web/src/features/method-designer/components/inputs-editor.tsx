import { ActionIcon, Button, Group, Select, SimpleGrid, Stack, Text, TextInput, Tooltip } from '@mantine/core';
import { designLimits, quantityKinds, type QuantityKind } from '@limitbook/contracts';
import { IconPlus, IconTrash } from '@tabler/icons-react';
import { newInput, renameInTests } from '../lib/definition';
import { errorAt, type DesignerSection } from './designer-context';
import { NumberTextInput } from './number-text-input';
import classes from './designer.module.css';

const kindLabels: Record<QuantityKind, string> = {
  length: 'Length',
  area: 'Area',
  angle: 'Angle',
  force: 'Force',
  pressure: 'Pressure',
  stress: 'Stress',
  torque: 'Torque',
  mass: 'Mass',
  temperature: 'Temperature',
  dimensionless: 'Plain number',
};

/** The method's inputs: name used in formulas, label for readers, what it measures, its unit, default and range. */
export function InputsEditor(section: DesignerSection) {
  const { form, readOnly } = section;
  const inputs = form.values.inputs;

  const rename = (index: number, next: string) => {
    const previous = inputs[index]?.name ?? '';
    form.setFieldValue(`inputs.${index}.name`, next);
    form.setFieldValue('tests', renameInTests(form.values.tests, 'inputs', previous, next));
  };

  return (
    <Stack gap="sm">
      {inputs.length === 0 && (
        <Text size="sm" c="dimmed">
          No inputs yet. Each input is a number a reader types, in the unit you give it.
        </Text>
      )}
      {inputs.map((input, index) => (
        <div key={index} className={classes.row} data-input-row={index}>
          <Group justify="space-between" mb={4}>
            <Text size="sm" fw={600}>
              Input {index + 1}
              {input.label ? `: ${input.label}` : ''}
            </Text>
            {!readOnly && (
              <Tooltip label="Remove this input">
                <ActionIcon variant="subtle" color="redline" aria-label={`Remove input ${index + 1}`} onClick={() => form.removeListItem('inputs', index)}>
                  <IconTrash size={16} />
                </ActionIcon>
              </Tooltip>
            )}
          </Group>
          <SimpleGrid cols={{ base: 1, sm: 2, md: 4 }} spacing="sm" verticalSpacing="xs">
            <TextInput
              label="Name"
              description="Used in formulas"
              className={classes.code}
              value={input.name}
              onChange={(event) => rename(index, event.currentTarget.value)}
              error={errorAt(section, `inputs.${index}.name`)}
              readOnly={readOnly}
              spellCheck={false}
              data-path={`inputs.${index}.name`}
            />
            <TextInput label="Label" description="What readers see" {...form.getInputProps(`inputs.${index}.label`)} error={errorAt(section, `inputs.${index}.label`)} readOnly={readOnly} data-path={`inputs.${index}.label`} />
            <Select
              label="Quantity"
              description="What it measures"
              data={quantityKinds.map((kind) => ({ value: kind, label: kindLabels[kind] }))}
              value={input.kind}
              onChange={(value) => value && form.setFieldValue(`inputs.${index}.kind`, value as QuantityKind)}
              error={errorAt(section, `inputs.${index}.kind`)}
              allowDeselect={false}
              readOnly={readOnly}
              comboboxProps={{ withinPortal: true }}
              data-path={`inputs.${index}.kind`}
            />
            <TextInput
              label="Unit"
              description="mm, MPa, N m, deg…"
              className={classes.code}
              {...form.getInputProps(`inputs.${index}.unit`)}
              error={errorAt(section, `inputs.${index}.unit`)}
              readOnly={readOnly}
              spellCheck={false}
              data-path={`inputs.${index}.unit`}
            />
            <NumberTextInput
              label="Default"
              value={input.default}
              onChange={(value) => form.setFieldValue(`inputs.${index}.default`, value)}
              error={errorAt(section, `inputs.${index}.default`)}
              readOnly={readOnly}
              data-path={`inputs.${index}.default`}
            />
            <NumberTextInput label="Minimum" value={input.min} onChange={(value) => form.setFieldValue(`inputs.${index}.min`, value)} error={errorAt(section, `inputs.${index}.min`)} readOnly={readOnly} data-path={`inputs.${index}.min`} />
            <NumberTextInput label="Maximum" value={input.max} onChange={(value) => form.setFieldValue(`inputs.${index}.max`, value)} error={errorAt(section, `inputs.${index}.max`)} readOnly={readOnly} data-path={`inputs.${index}.max`} />
            <TextInput label="Help" description="Shown under the field" {...form.getInputProps(`inputs.${index}.help`)} error={errorAt(section, `inputs.${index}.help`)} readOnly={readOnly} data-path={`inputs.${index}.help`} />
          </SimpleGrid>
        </div>
      ))}
      {!readOnly && (
        <Button
          variant="light"
          size="compact-sm"
          w="fit-content"
          leftSection={<IconPlus size={14} />}
          onClick={() => form.insertListItem('inputs', newInput(inputs.length))}
          disabled={inputs.length >= designLimits.maxInputs}
        >
          Add input
        </Button>
      )}
      {errorAt(section, 'inputs') && (
        <Text size="sm" c="redline.7" role="alert">
          {errorAt(section, 'inputs')}
        </Text>
      )}
    </Stack>
  );
}
